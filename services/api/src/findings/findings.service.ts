import {
  ConflictException,
  ForbiddenException,
  Injectable,
  NotFoundException,
} from '@nestjs/common';
import { InjectConnection, InjectModel } from '@nestjs/sequelize';
import { ROLE_SCOPE, type FindingLink } from '@tallyloom/core';
import { fn, col, type Transaction, type WhereOptions } from 'sequelize';
import type { Sequelize } from 'sequelize-typescript';
import { AuditService } from '../audit/audit.service';
import type { Actor } from '../common/access/actor';
import { within } from '../common/access/scope';
import type { SignedInContext } from '../common/context/request-context';
import { User } from '../users/models/user.model';
import type {
  CloseFindingDto,
  CreateFindingDto,
  FindingResponseDto,
  UpdateFindingDto,
} from './dto/finding-requests.dto';
import type { FindingDto, FindingPageDto } from './dto/finding-view.dto';
import type { ListFindingsQuery } from './dto/list-findings.query';
import { FindingLinks } from './finding-links';
import { auditableFinding, toFindingView, toLinkView, toSummaryView } from './finding.mappers';
import { AuditFindingLink } from './models/audit-finding-link.model';
import { AuditFindingResponse } from './models/audit-finding-response.model';
import { AuditFinding } from './models/audit-finding.model';
import { StaleFindingException } from './stale-finding.exception';

export const FINDING_ENTITY = 'audit_finding';

const AUTHOR = { model: User, as: 'author', attributes: ['id', 'displayName'] };
const RESPONDER = { model: User, as: 'responder', attributes: ['id', 'displayName'] };

/**
 * Findings a person may see. Every role holding `findings.read` sees the whole network; a narrower
 * role (none today) would see none rather than findings about places outside its scope.
 */
function findingScope(actor: Actor): WhereOptions {
  return ROLE_SCOPE[actor.role] === 'network' ? {} : { id: -1 };
}

const notFound = () => new NotFoundException('No such finding.');
const closedAlready = () =>
  new ConflictException('This finding is closed: it can no longer be changed or answered.');

/**
 * Findings: open → responded (a response is added) → closed (by an auditor). The author edits
 * while it is not closed; any auditor may close it. Every write locks the finding row, checks the
 * version where one is sent, and writes its audit entry in the same transaction.
 */
@Injectable()
export class FindingsService {
  constructor(
    @InjectConnection() private readonly sequelize: Sequelize,
    @InjectModel(AuditFinding) private readonly findings: typeof AuditFinding,
    @InjectModel(AuditFindingLink) private readonly links: typeof AuditFindingLink,
    @InjectModel(AuditFindingResponse) private readonly responses: typeof AuditFindingResponse,
    private readonly linkChecks: FindingLinks,
    private readonly audit: AuditService,
  ) {}

  async list(actor: Actor, query: ListFindingsQuery): Promise<FindingPageDto> {
    const page = query.page ?? 1;
    const pageSize = query.pageSize ?? 25;
    const filters: WhereOptions = {
      ...(query.status ? { status: query.status } : {}),
      ...(query.severity ? { severity: query.severity } : {}),
    };
    const { rows, count } = await this.findings.findAndCountAll({
      where: within(findingScope(actor), filters),
      include: [AUTHOR],
      order: [
        ['createdAt', 'DESC'],
        ['id', 'DESC'],
      ],
      limit: pageSize,
      offset: (page - 1) * pageSize,
      distinct: true,
    });
    const counts = await this.responseCounts(rows.map((finding) => finding.id));
    return {
      items: rows.map((finding) => toSummaryView(finding, counts.get(finding.id) ?? 0)),
      total: count,
      page,
      pageSize,
    };
  }

  async get(actor: Actor, id: number, transaction?: Transaction): Promise<FindingDto> {
    const finding = await this.findings.findOne({
      where: within(findingScope(actor), { id }),
      include: [AUTHOR],
      transaction,
    });
    if (!finding) throw notFound();
    const links = await this.links.findAll({
      where: { findingId: id },
      order: [['id', 'ASC']],
      transaction,
    });
    const responses = await this.responses.findAll({
      where: { findingId: id },
      include: [RESPONDER],
      order: [['id', 'ASC']],
      transaction,
    });
    return toFindingView(finding, links, responses);
  }

  async create(context: SignedInContext, body: CreateFindingDto): Promise<FindingDto> {
    const id = await this.sequelize.transaction(async (transaction) => {
      const links = await this.linkChecks.resolve(body.links ?? [], 'links', transaction);
      const finding = await this.findings.create(
        {
          title: body.title,
          body: body.body,
          severity: body.severity,
          status: 'open',
          createdBy: context.actor.id,
          version: 1,
        },
        { transaction },
      );
      await this.addLinks(finding.id, links, transaction);
      await this.audit.record(
        context,
        {
          action: 'finding.created',
          entityType: FINDING_ENTITY,
          entityId: finding.id,
          after: auditableFinding(finding, links),
        },
        transaction,
      );
      return finding.id;
    });
    return this.get(context.actor, id);
  }

  /** The author's edit. Links are only added; one the finding already has is skipped. */
  async update(context: SignedInContext, id: number, body: UpdateFindingDto): Promise<FindingDto> {
    await this.sequelize.transaction(async (transaction) => {
      const finding = await this.lockFor(context, id, body.version, transaction);
      if (finding.createdBy !== context.actor.id) {
        throw new ForbiddenException('Only the auditor who wrote this finding may edit it.');
      }
      const existing = (
        await this.links.findAll({ where: { findingId: id }, order: [['id', 'ASC']], transaction })
      ).map(toLinkView);
      const added = (
        await this.linkChecks.resolve(body.addLinks ?? [], 'addLinks', transaction)
      ).filter(
        (link) =>
          !existing.some((old) => old.kind === link.kind && old.reference === link.reference),
      );
      const before = auditableFinding(finding, existing);
      const changes = {
        ...(body.title !== undefined ? { title: body.title } : {}),
        ...(body.body !== undefined ? { body: body.body } : {}),
        ...(body.severity !== undefined ? { severity: body.severity } : {}),
      };
      finding.set(changes);
      // An edit that changes nothing keeps its version and leaves no audit entry.
      if (!finding.changed() && added.length === 0) return;
      finding.set({ version: finding.version + 1 });
      await finding.save({ transaction });
      await this.addLinks(id, added, transaction);
      await this.audit.record(
        context,
        {
          action: 'finding.updated',
          entityType: FINDING_ENTITY,
          entityId: id,
          before,
          after: auditableFinding(finding, [...existing, ...added]),
        },
        transaction,
      );
    });
    return this.get(context.actor, id);
  }

  /**
   * Adds a response; an open finding becomes "responded". No version is asked for: responses
   * are only ever added, so two at once are both kept, in the order they were saved.
   */
  async respond(
    context: SignedInContext,
    id: number,
    body: FindingResponseDto,
  ): Promise<FindingDto> {
    await this.sequelize.transaction(async (transaction) => {
      const finding = await this.lockFor(context, id, null, transaction);
      const response = await this.responses.create(
        {
          findingId: id,
          body: body.body,
          respondedBy: context.actor.id,
          respondedAt: new Date(),
        },
        { transaction },
      );
      const statusBefore = finding.status;
      await finding.update({ status: 'responded', version: finding.version + 1 }, { transaction });
      await this.audit.record(
        context,
        {
          action: 'finding.responded',
          entityType: FINDING_ENTITY,
          entityId: id,
          before: { status: statusBefore },
          after: { status: finding.status, responseId: response.id, body: response.body },
        },
        transaction,
      );
    });
    return this.get(context.actor, id);
  }

  async close(context: SignedInContext, id: number, body: CloseFindingDto): Promise<FindingDto> {
    await this.sequelize.transaction(async (transaction) => {
      const finding = await this.lockFor(context, id, body.version, transaction);
      const statusBefore = finding.status;
      await finding.update(
        {
          status: 'closed',
          closedBy: context.actor.id,
          closedAt: new Date(),
          version: finding.version + 1,
        },
        { transaction },
      );
      await this.audit.record(
        context,
        {
          action: 'finding.closed',
          entityType: FINDING_ENTITY,
          entityId: id,
          before: { status: statusBefore },
          after: { status: 'closed' },
        },
        transaction,
      );
    });
    return this.get(context.actor, id);
  }

  /**
   * Locks the finding for a write: 404 when it is not there (or out of scope), 409 with the
   * finding as it is now when `version` is stale, 409 when it is closed.
   */
  private async lockFor(
    context: SignedInContext,
    id: number,
    version: number | null,
    transaction: Transaction,
  ): Promise<AuditFinding> {
    const finding = await this.findings.findOne({
      where: within(findingScope(context.actor), { id }),
      transaction,
      lock: transaction.LOCK.UPDATE,
    });
    if (!finding) throw notFound();
    if (version !== null && finding.version !== version) {
      throw new StaleFindingException(await this.get(context.actor, id, transaction));
    }
    if (finding.status === 'closed') throw closedAlready();
    return finding;
  }

  private async addLinks(
    findingId: number,
    links: readonly FindingLink[],
    transaction: Transaction,
  ): Promise<void> {
    if (links.length === 0) return;
    await this.links.bulkCreate(
      links.map((link) => ({ findingId, kind: link.kind, reference: link.reference })),
      { transaction },
    );
  }

  private async responseCounts(findingIds: number[]): Promise<Map<number, number>> {
    if (findingIds.length === 0) return new Map();
    const rows = (await this.responses.findAll({
      attributes: ['findingId', [fn('COUNT', col('id')), 'n']],
      where: { findingId: findingIds },
      group: ['findingId'],
      raw: true,
    })) as unknown as { findingId: number; n: unknown }[];
    return new Map(rows.map((row) => [Number(row.findingId), Number(row.n)]));
  }
}
