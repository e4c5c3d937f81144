import {
  BadRequestException,
  ForbiddenException,
  HttpException,
  HttpStatus,
  Injectable,
  Logger,
  UnauthorizedException,
} from '@nestjs/common';
import { InjectConnection, InjectModel } from '@nestjs/sequelize';
import type { OneTimeLinkInfo, SessionResponse } from '@tallyloom/core';
import type { Transaction } from 'sequelize';
import type { Sequelize } from 'sequelize-typescript';
import { AuditService } from '../audit/audit.service';
import type { RequestContext, SignedInContext } from '../common/context/request-context';
import { AppConfig } from '../config/app-config';
import { MailSender } from '../mail/mail-sender';
import { User } from '../users/models/user.model';
import { toSessionUser } from '../users/user.mappers';
import { WITH_SCOPE_NAMES } from '../users/models/user-scope.include';
import { passwordResetMail } from './auth-mails';
import { OneTimeLinkService } from './links/one-time-link.service';
import { decoyPasswordHash, hashPassword, verifyPassword } from './passwords/password-hasher';
import { PasswordPolicyService } from './passwords/password-policy.service';
import { AccessTokenService } from './tokens/access-token.service';
import { RefreshTokenService, type IssuedRefreshToken } from './tokens/refresh-token.service';

/** A new session: the JSON answer and the refresh secret for the cookie. */
export interface IssuedSession {
  response: SessionResponse;
  refresh: IssuedRefreshToken;
}

const WRONG_CREDENTIALS = 'E-mail or password is incorrect.';

@Injectable()
export class AuthService {
  private readonly logger = new Logger('Auth');

  constructor(
    @InjectConnection() private readonly sequelize: Sequelize,
    @InjectModel(User) private readonly users: typeof User,
    private readonly config: AppConfig,
    private readonly audit: AuditService,
    private readonly accessTokens: AccessTokenService,
    private readonly refreshTokens: RefreshTokenService,
    private readonly links: OneTimeLinkService,
    private readonly passwordPolicy: PasswordPolicyService,
    private readonly mail: MailSender,
  ) {}

  async signIn(email: string, password: string, context: RequestContext): Promise<IssuedSession> {
    const outcome = await this.sequelize.transaction(async (transaction) => {
      const user = await this.users.findOne({
        where: { email },
        transaction,
        lock: transaction.LOCK.UPDATE,
      });
      // Unknown address or no password yet: spend the same bcrypt time, give the same answer.
      if (!user || !user.passwordHash) {
        await verifyPassword(password, await decoyPasswordHash());
        await this.audit.record(
          context,
          {
            action: 'auth.sign_in_failed',
            entityType: 'user',
            actorEmail: email,
            after: { reason: 'unknown_account' },
          },
          transaction,
        );
        return { kind: 'refused' as const, error: new UnauthorizedException(WRONG_CREDENTIALS) };
      }
      const passwordMatches = await verifyPassword(password, user.passwordHash);
      const now = new Date();
      if (user.lockedUntil && user.lockedUntil > now) {
        await this.audit.record(
          context,
          {
            action: 'auth.sign_in_refused_locked',
            entityType: 'user',
            entityId: user.id,
            actorEmail: email,
          },
          transaction,
        );
        return { kind: 'refused' as const, error: lockedError(user.lockedUntil) };
      }
      if (!passwordMatches) {
        const attempts = user.failedAttempts + 1;
        const locks = attempts >= this.config.signInLockAfter;
        const lockedUntil = locks
          ? new Date(now.getTime() + this.config.signInLockMinutes * 60_000)
          : null;
        await user.update({ failedAttempts: locks ? 0 : attempts, lockedUntil }, { transaction });
        await this.audit.record(
          context,
          {
            action: locks ? 'auth.locked' : 'auth.sign_in_failed',
            entityType: 'user',
            entityId: user.id,
            actorEmail: email,
            after: { failedAttempts: attempts },
          },
          transaction,
        );
        return {
          kind: 'refused' as const,
          error:
            locks && lockedUntil
              ? lockedError(lockedUntil)
              : new UnauthorizedException(WRONG_CREDENTIALS),
        };
      }
      if (!user.active) {
        await this.audit.record(
          context,
          {
            action: 'auth.sign_in_refused_inactive',
            entityType: 'user',
            entityId: user.id,
            actorEmail: email,
          },
          transaction,
        );
        return {
          kind: 'refused' as const,
          error: new ForbiddenException(
            'This account has been deactivated. Ask a network admin if you need it again.',
          ),
        };
      }
      await user.update(
        { failedAttempts: 0, lockedUntil: null, lastSignInAt: now },
        { transaction },
      );
      const session = await this.openSession(user.id, transaction);
      await this.audit.record(
        { ...context, actor: null },
        { action: 'auth.sign_in', entityType: 'user', entityId: user.id, actorEmail: email },
        transaction,
      );
      return { kind: 'signed_in' as const, session };
    });
    // Refusals commit their counters and audit entries first, then answer.
    if (outcome.kind === 'refused') throw outcome.error;
    return outcome.session;
  }

  async refresh(secret: string | undefined, context: RequestContext): Promise<IssuedSession> {
    if (!secret) throw new UnauthorizedException('No session to continue; please sign in.');
    const outcome = await this.sequelize.transaction(async (transaction) => {
      const rotation = await this.refreshTokens.rotate(secret, transaction);
      if (rotation.kind === 'reused') {
        await this.audit.record(
          context,
          {
            action: 'auth.refresh_reuse',
            entityType: 'user',
            entityId: rotation.userId,
            after: { revokedFamily: rotation.familyId },
          },
          transaction,
        );
        return null;
      }
      const user = await this.loadUser(rotation.userId, transaction);
      if (!user.active || !user.passwordHash) return null;
      const access = await this.accessTokens.issue(user.id, user.role);
      return {
        response: {
          accessToken: access.token,
          accessTokenExpiresAt: access.expiresAt.toISOString(),
          user: toSessionUser(user),
        },
        refresh: rotation.next,
      };
    });
    if (!outcome)
      throw new UnauthorizedException('This session was ended for safety; please sign in again.');
    return outcome;
  }

  async signOut(secret: string | undefined, context: RequestContext): Promise<void> {
    if (!secret) return;
    await this.sequelize.transaction(async (transaction) => {
      const userId = await this.refreshTokens.revokeBySecret(secret, transaction);
      if (userId)
        await this.audit.record(
          context,
          { action: 'auth.sign_out', entityType: 'user', entityId: userId },
          transaction,
        );
    });
  }

  async me(context: SignedInContext) {
    return toSessionUser(await this.loadUser(context.actor.id));
  }

  async changePassword(
    context: SignedInContext,
    currentPassword: string,
    newPassword: string,
    currentRefresh: string | undefined,
  ): Promise<void> {
    const user = await this.loadUser(context.actor.id);
    if (!user.passwordHash || !(await verifyPassword(currentPassword, user.passwordHash))) {
      throw new BadRequestException({
        message: 'Invalid input: currentPassword',
        fields: [{ field: 'currentPassword', messages: ['Current password is incorrect.'] }],
      });
    }
    this.passwordPolicy.assertAcceptable(newPassword, 'newPassword', [
      user.email,
      user.displayName,
    ]);
    const hash = await hashPassword(newPassword);
    await this.sequelize.transaction(async (transaction) => {
      await user.update({ passwordHash: hash, passwordChangedAt: new Date() }, { transaction });
      // Other devices must sign in again; the session that changed the password goes on.
      await this.refreshTokens.revokeAllForUser(
        user.id,
        'password_changed',
        transaction,
        currentRefresh,
      );
      await this.audit.record(
        context,
        { action: 'auth.password_changed', entityType: 'user', entityId: user.id },
        transaction,
      );
    });
  }

  async linkInfo(token: string): Promise<OneTimeLinkInfo> {
    const link = await this.links.find(token, null);
    const user = await this.loadUser(link.userId);
    return {
      purpose: link.purpose,
      email: user.email,
      displayName: user.displayName,
      expiresAt: link.expiresAt.toISOString(),
    };
  }

  async acceptInvitation(
    token: string,
    password: string,
    context: RequestContext,
  ): Promise<IssuedSession> {
    return this.sequelize.transaction(async (transaction) => {
      const link = await this.links.find(token, 'invitation', transaction);
      const user = await this.loadUser(link.userId, transaction);
      if (!user.active)
        throw new ForbiddenException(
          'This account has been deactivated. Ask a network admin if you need it again.',
        );
      this.passwordPolicy.assertAcceptable(password, 'password', [user.email, user.displayName]);
      const now = new Date();
      await user.update(
        { passwordHash: await hashPassword(password), passwordChangedAt: now, lastSignInAt: now },
        { transaction },
      );
      await this.links.consume(link, transaction);
      await this.audit.record(
        { ...context, actor: null },
        {
          action: 'auth.invitation_accepted',
          entityType: 'user',
          entityId: user.id,
          actorEmail: user.email,
        },
        transaction,
      );
      return this.openSession(user.id, transaction);
    });
  }

  /** Always answers the same way; a mail goes out only for an active account with a password. */
  async requestPasswordReset(email: string, context: RequestContext): Promise<void> {
    const mail = await this.sequelize.transaction(async (transaction) => {
      const user = await this.users.findOne({ where: { email }, transaction });
      await this.audit.record(
        context,
        {
          action: 'auth.password_reset_requested',
          entityType: 'user',
          entityId: user?.id ?? null,
          actorEmail: email,
        },
        transaction,
      );
      if (!user || !user.active || !user.passwordHash) return null;
      const link = await this.links.issue(user.id, 'password_reset', transaction);
      return passwordResetMail(user.email, user.displayName, link.url, link.expiresAt);
    });
    if (mail) {
      // After commit: a mail must never announce a link the database does not hold.
      await this.mail
        .send(mail)
        .catch((error: Error) =>
          this.logger.error(`reset mail to ${email} failed: ${error.message}`),
        );
    }
  }

  async completePasswordReset(
    token: string,
    password: string,
    context: RequestContext,
  ): Promise<void> {
    await this.sequelize.transaction(async (transaction) => {
      const link = await this.links.find(token, 'password_reset', transaction);
      const user = await this.loadUser(link.userId, transaction);
      this.passwordPolicy.assertAcceptable(password, 'password', [user.email, user.displayName]);
      await user.update(
        {
          passwordHash: await hashPassword(password),
          passwordChangedAt: new Date(),
          failedAttempts: 0,
          lockedUntil: null,
        },
        { transaction },
      );
      await this.links.consume(link, transaction);
      await this.refreshTokens.revokeAllForUser(user.id, 'password_reset', transaction);
      await this.audit.record(
        { ...context, actor: null },
        {
          action: 'auth.password_reset',
          entityType: 'user',
          entityId: user.id,
          actorEmail: user.email,
        },
        transaction,
      );
    });
  }

  private async openSession(userId: number, transaction: Transaction): Promise<IssuedSession> {
    const user = await this.loadUser(userId, transaction);
    const access = await this.accessTokens.issue(user.id, user.role);
    const refresh = await this.refreshTokens.issue(user.id, transaction);
    return {
      response: {
        accessToken: access.token,
        accessTokenExpiresAt: access.expiresAt.toISOString(),
        user: toSessionUser(user),
      },
      refresh,
    };
  }

  private async loadUser(id: number, transaction?: Transaction): Promise<User> {
    const user = await this.users.findByPk(id, {
      include: WITH_SCOPE_NAMES,
      transaction,
    });
    if (!user) throw new UnauthorizedException('Your account no longer exists.');
    return user;
  }
}

function lockedError(until: Date): HttpException {
  const minutes = Math.max(1, Math.ceil((until.getTime() - Date.now()) / 60_000));
  return new HttpException(
    {
      message: `Too many failed sign-ins: this account is locked for ${minutes} more minute${minutes === 1 ? '' : 's'}. Try again later or reset your password.`,
    },
    HttpStatus.LOCKED,
  );
}
