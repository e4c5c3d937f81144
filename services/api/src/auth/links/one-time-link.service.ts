import { Injectable, NotFoundException } from '@nestjs/common';
import { InjectModel } from '@nestjs/sequelize';
import { Op, type Transaction } from 'sequelize';
import { AppConfig } from '../../config/app-config';
import { OneTimeLink, type LinkPurpose } from '../models/one-time-link.model';
import { hashSecret, newSecret } from '../tokens/token-hash';

const LINK_GONE =
  'This link is no longer valid: it was used already, replaced by a newer one, or it expired. Ask for a new one.';

/** Single-use, expiring links for invitations and password resets; only their hash is stored. */
@Injectable()
export class OneTimeLinkService {
  constructor(
    @InjectModel(OneTimeLink) private readonly links: typeof OneTimeLink,
    private readonly config: AppConfig,
  ) {}

  /** Issues a new link and retires the person's earlier unused links of the same purpose. */
  async issue(
    userId: number,
    purpose: LinkPurpose,
    transaction: Transaction,
  ): Promise<{ url: string; expiresAt: Date }> {
    await this.links.update(
      { usedAt: new Date() },
      { where: { userId, purpose, usedAt: { [Op.is]: null } }, transaction },
    );
    const secret = newSecret();
    const lifetimeMs =
      purpose === 'invitation'
        ? this.config.invitationDays * 86_400_000
        : this.config.passwordResetMinutes * 60_000;
    const expiresAt = new Date(Date.now() + lifetimeMs);
    await this.links.create(
      { userId, purpose, tokenHash: hashSecret(secret), expiresAt },
      { transaction },
    );
    const page = purpose === 'invitation' ? 'accept-invitation' : 'reset-password';
    return { url: `${this.config.appUrl}/${page}?token=${secret}`, expiresAt };
  }

  /** The live link for a token, or 404. `consume` marks it used (inside the caller's transaction). */
  async find(
    token: string,
    purpose: LinkPurpose | null,
    transaction?: Transaction,
  ): Promise<OneTimeLink> {
    const link = await this.links.findOne({
      where: { tokenHash: hashSecret(token), ...(purpose ? { purpose } : {}) },
      transaction,
      lock: transaction ? transaction.LOCK.UPDATE : undefined,
    });
    if (!link || link.usedAt || link.expiresAt.getTime() <= Date.now())
      throw new NotFoundException(LINK_GONE);
    return link;
  }

  async consume(link: OneTimeLink, transaction: Transaction): Promise<void> {
    await link.update({ usedAt: new Date() }, { transaction });
  }
}
