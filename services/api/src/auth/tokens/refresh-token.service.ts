import { Injectable, UnauthorizedException } from '@nestjs/common';
import { InjectModel } from '@nestjs/sequelize';
import { randomUUID } from 'node:crypto';
import { Op, type Transaction } from 'sequelize';
import { AppConfig } from '../../config/app-config';
import { RefreshToken } from '../models/refresh-token.model';
import { hashSecret, newSecret } from './token-hash';

export interface IssuedRefreshToken {
  secret: string;
  expiresAt: Date;
}

export type RotationOutcome =
  | { kind: 'rotated'; userId: number; next: IssuedRefreshToken }
  | { kind: 'reused'; userId: number; familyId: string };

/**
 * Refresh tokens rotate: each use revokes the token and issues its successor in the same family.
 * A revoked token presented again means a copy exists elsewhere, so the whole family is revoked.
 */
@Injectable()
export class RefreshTokenService {
  constructor(
    @InjectModel(RefreshToken) private readonly tokens: typeof RefreshToken,
    private readonly config: AppConfig,
  ) {}

  async issue(
    userId: number,
    transaction: Transaction,
    familyId: string = randomUUID(),
  ): Promise<IssuedRefreshToken & { id: number }> {
    const secret = newSecret();
    const expiresAt = new Date(Date.now() + this.config.refreshTokenDays * 86_400_000);
    const row = await this.tokens.create(
      { userId, familyId, tokenHash: hashSecret(secret), expiresAt },
      { transaction },
    );
    return { id: row.id, secret, expiresAt };
  }

  async rotate(secret: string, transaction: Transaction): Promise<RotationOutcome> {
    const current = await this.tokens.findOne({
      where: { tokenHash: hashSecret(secret) },
      transaction,
      lock: transaction.LOCK.UPDATE,
    });
    if (!current) throw new UnauthorizedException('Your session has ended; please sign in again.');
    if (current.revokedAt) {
      await this.revokeFamily(current.familyId, 'reuse', transaction);
      return { kind: 'reused', userId: current.userId, familyId: current.familyId };
    }
    if (current.expiresAt.getTime() <= Date.now()) {
      throw new UnauthorizedException('Your session has expired; please sign in again.');
    }
    const next = await this.issue(current.userId, transaction, current.familyId);
    await current.update(
      { revokedAt: new Date(), revokedReason: 'rotated', replacedById: next.id },
      { transaction },
    );
    return { kind: 'rotated', userId: current.userId, next };
  }

  /** Sign-out: revokes the family the presented token belongs to. Returns its user, if any. */
  async revokeBySecret(secret: string, transaction: Transaction): Promise<number | null> {
    const current = await this.tokens.findOne({
      where: { tokenHash: hashSecret(secret) },
      transaction,
    });
    if (!current) return null;
    await this.revokeFamily(current.familyId, 'signed_out', transaction);
    return current.userId;
  }

  /** Revokes every live token of a person, except the family of `keepSecret` when given. */
  async revokeAllForUser(
    userId: number,
    reason: string,
    transaction: Transaction,
    keepSecret?: string,
  ): Promise<void> {
    const kept = keepSecret
      ? await this.tokens.findOne({
          where: { tokenHash: hashSecret(keepSecret), userId },
          transaction,
        })
      : null;
    await this.tokens.update(
      { revokedAt: new Date(), revokedReason: reason },
      {
        where: {
          userId,
          revokedAt: { [Op.is]: null },
          ...(kept ? { familyId: { [Op.ne]: kept.familyId } } : {}),
        },
        transaction,
      },
    );
  }

  private async revokeFamily(
    familyId: string,
    reason: string,
    transaction: Transaction,
  ): Promise<void> {
    await this.tokens.update(
      { revokedAt: new Date(), revokedReason: reason },
      { where: { familyId, revokedAt: { [Op.is]: null } }, transaction },
    );
  }
}
