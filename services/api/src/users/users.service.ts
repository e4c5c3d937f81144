import {
  BadRequestException,
  ConflictException,
  Injectable,
  Logger,
  NotFoundException,
} from '@nestjs/common';
import { InjectConnection, InjectModel } from '@nestjs/sequelize';
import { ROLE_SCOPE, type Role, type UserStatus } from '@tallyloom/core';
import { Op, UniqueConstraintError, type Transaction, type WhereOptions } from 'sequelize';
import type { Sequelize } from 'sequelize-typescript';
import { AuditService } from '../audit/audit.service';
import { invitationMail } from '../auth/auth-mails';
import { OneTimeLinkService } from '../auth/links/one-time-link.service';
import { RefreshTokenService } from '../auth/tokens/refresh-token.service';
import { Chapter } from '../chapters/models/chapter.model';
import type { SignedInContext } from '../common/context/request-context';
import { MailSender, type OutgoingMail } from '../mail/mail-sender';
import { Region } from '../regions/models/region.model';
import type {
  InviteUserDto,
  ListUsersQuery,
  UpdateUserDto,
  UserDto,
  UserPageDto,
} from './dto/user.dto';
import { User } from './models/user.model';
import { WITH_SCOPE_NAMES } from './models/user-scope.include';
import { auditableUser, toUserView } from './user.mappers';

function emailInUse(): ConflictException {
  return new ConflictException({
    message: 'Someone with this e-mail address is already in Tallyloom.',
    fields: [{ field: 'email', messages: ['This e-mail address is already in use.'] }],
  });
}

function fieldError(field: string, message: string): BadRequestException {
  return new BadRequestException({
    message: `Invalid input: ${field}`,
    fields: [{ field, messages: [message] }],
  });
}

@Injectable()
export class UsersService {
  private readonly logger = new Logger('Users');

  constructor(
    @InjectConnection() private readonly sequelize: Sequelize,
    @InjectModel(User) private readonly users: typeof User,
    @InjectModel(Region) private readonly regions: typeof Region,
    @InjectModel(Chapter) private readonly chapters: typeof Chapter,
    private readonly links: OneTimeLinkService,
    private readonly refreshTokens: RefreshTokenService,
    private readonly audit: AuditService,
    private readonly mail: MailSender,
  ) {}

  async list(query: ListUsersQuery): Promise<UserPageDto> {
    const page = query.page ?? 1;
    const pageSize = query.pageSize ?? 25;
    const filters: WhereOptions[] = [];
    if (query.search) {
      const like = `%${query.search.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
      filters.push({
        [Op.or]: [{ email: { [Op.like]: like } }, { displayName: { [Op.like]: like } }],
      });
    }
    if (query.role) filters.push({ role: query.role });
    if (query.status) filters.push(statusWhere(query.status));
    const { rows, count } = await this.users.findAndCountAll({
      where: { [Op.and]: filters },
      include: WITH_SCOPE_NAMES,
      order: [
        ['displayName', 'ASC'],
        ['id', 'ASC'],
      ],
      limit: pageSize,
      offset: (page - 1) * pageSize,
      distinct: true,
    });
    return { items: rows.map(toUserView), total: count, page, pageSize };
  }

  async get(id: number): Promise<UserDto> {
    return toUserView(await this.find(id));
  }

  async invite(context: SignedInContext, body: InviteUserDto): Promise<UserDto> {
    const scope = await this.resolveScope(body.role, body.regionId ?? null, body.chapterId ?? null);
    const { user, mail } = await this.sequelize
      .transaction(async (transaction) => {
        if (await this.users.findOne({ where: { email: body.email }, transaction }))
          throw emailInUse();
        const created = await this.users.create(
          {
            email: body.email,
            displayName: body.displayName,
            role: body.role,
            ...scope,
            active: true,
            invitedAt: new Date(),
          },
          { transaction },
        );
        await this.audit.record(
          context,
          {
            action: 'user.invited',
            entityType: 'user',
            entityId: created.id,
            after: auditableUser(created),
          },
          transaction,
        );
        return { user: created, mail: await this.invitationFor(created, context, transaction) };
      })
      .catch((error: unknown) => {
        // Two invitations for one address at the same moment: the unique index decides.
        throw error instanceof UniqueConstraintError ? emailInUse() : error;
      });
    await this.sendAfterCommit(mail);
    return this.get(user.id);
  }

  async update(context: SignedInContext, id: number, body: UpdateUserDto): Promise<UserDto> {
    const user = await this.find(id);
    if (
      id === context.actor.id &&
      (body.active === false || (body.role && body.role !== user.role))
    ) {
      throw new BadRequestException(
        'You cannot deactivate yourself or change your own role; ask another network admin.',
      );
    }
    const role = body.role ?? user.role;
    const roleOrScopeChanges =
      body.role !== undefined || body.regionId !== undefined || body.chapterId !== undefined;
    const scope = roleOrScopeChanges
      ? await this.resolveScope(
          role,
          body.regionId !== undefined ? body.regionId : user.regionId,
          body.chapterId !== undefined ? body.chapterId : user.chapterId,
        )
      : { regionId: user.regionId, chapterId: user.chapterId };
    const changes = {
      ...(body.displayName !== undefined ? { displayName: body.displayName } : {}),
      role,
      ...scope,
      ...(body.active !== undefined ? { active: body.active } : {}),
    };
    const before = auditableUser(user);
    await this.sequelize.transaction(async (transaction) => {
      await user.update(changes, { transaction });
      // A deactivated person's sessions end for good; reactivation does not bring them back.
      if (body.active === false) {
        await this.refreshTokens.revokeAllForUser(user.id, 'deactivated', transaction);
      }
      const after = auditableUser(user);
      const action =
        body.active === false && before.active
          ? 'user.deactivated'
          : body.active === true && !before.active
            ? 'user.reactivated'
            : 'user.updated';
      await this.audit.recordChange(
        context,
        { action, entityType: 'user', entityId: user.id, before, after },
        transaction,
      );
    });
    return this.get(id);
  }

  async resendInvitation(context: SignedInContext, id: number): Promise<void> {
    const user = await this.find(id);
    if (user.passwordHash)
      throw new ConflictException('This person has already accepted the invitation.');
    if (!user.active)
      throw new ConflictException('This person is deactivated; reactivate them first.');
    const mail = await this.sequelize.transaction(async (transaction) => {
      await user.update({ invitedAt: new Date() }, { transaction });
      await this.audit.record(
        context,
        { action: 'user.invitation_resent', entityType: 'user', entityId: user.id },
        transaction,
      );
      return this.invitationFor(user, context, transaction);
    });
    await this.sendAfterCommit(mail);
  }

  private async invitationFor(
    user: User,
    context: SignedInContext,
    transaction: Transaction,
  ): Promise<OutgoingMail> {
    const link = await this.links.issue(user.id, 'invitation', transaction);
    return invitationMail(
      user.email,
      user.displayName,
      context.actor.email,
      link.url,
      link.expiresAt,
    );
  }

  private async sendAfterCommit(mail: OutgoingMail): Promise<void> {
    await this.mail
      .send(mail)
      .catch((error: Error) =>
        this.logger.error(`invitation mail to ${mail.to} failed: ${error.message}`),
      );
  }

  private async find(id: number): Promise<User> {
    const user = await this.users.findByPk(id, { include: WITH_SCOPE_NAMES });
    if (!user) throw new NotFoundException('No such person.');
    return user;
  }

  /** A role's scope must name exactly what the role needs, and it must exist. */
  private async resolveScope(
    role: Role,
    regionId: number | null,
    chapterId: number | null,
  ): Promise<{ regionId: number | null; chapterId: number | null }> {
    switch (ROLE_SCOPE[role]) {
      case 'network':
        return { regionId: null, chapterId: null };
      case 'region':
        if (!regionId) throw fieldError('regionId', 'A regional coordinator needs a region.');
        if (!(await this.regions.findByPk(regionId)))
          throw fieldError('regionId', 'No such region.');
        return { regionId, chapterId: null };
      case 'chapter':
        if (!chapterId) throw fieldError('chapterId', 'A chapter lead needs a chapter.');
        if (!(await this.chapters.findByPk(chapterId)))
          throw fieldError('chapterId', 'No such chapter.');
        return { regionId: null, chapterId };
    }
  }
}

function statusWhere(status: UserStatus): WhereOptions {
  const now = new Date();
  switch (status) {
    case 'deactivated':
      return { active: false };
    case 'invited':
      return { active: true, passwordHash: { [Op.is]: null } };
    case 'locked':
      return { active: true, passwordHash: { [Op.ne]: null }, lockedUntil: { [Op.gt]: now } };
    case 'active':
      return {
        active: true,
        passwordHash: { [Op.ne]: null },
        [Op.or]: [{ lockedUntil: { [Op.is]: null } }, { lockedUntil: { [Op.lte]: now } }],
      };
  }
}
