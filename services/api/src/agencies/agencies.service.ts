import { Injectable, NotFoundException } from '@nestjs/common';
import { InjectConnection, InjectModel } from '@nestjs/sequelize';
import { ROLE_SCOPE } from '@tallyloom/core';
import type { Includeable, Transaction } from 'sequelize';
import type { Sequelize } from 'sequelize-typescript';
import { AuditService } from '../audit/audit.service';
import { Chapter } from '../chapters/models/chapter.model';
import type { Actor } from '../common/access/actor';
import { chapterScope, within } from '../common/access/scope';
import type { SignedInContext } from '../common/context/request-context';
import { asTakenField, invalidField, refuseIfTaken } from '../common/validation/field-errors';
import type {
  ListAgenciesQuery,
  PartnerAgencyDto,
  SavePartnerAgencyDto,
  UpdatePartnerAgencyDto,
} from './dto/partner-agency.dto';
import { AgencyChapter } from './models/agency-chapter.model';
import { PartnerAgency } from './models/partner-agency.model';

const TAKEN = { name: { field: 'name', message: 'Another partner agency already has this name.' } };

@Injectable()
export class AgenciesService {
  constructor(
    @InjectConnection() private readonly sequelize: Sequelize,
    @InjectModel(PartnerAgency) private readonly agencies: typeof PartnerAgency,
    @InjectModel(AgencyChapter) private readonly links: typeof AgencyChapter,
    @InjectModel(Chapter) private readonly chapters: typeof Chapter,
    private readonly audit: AuditService,
  ) {}

  /**
   * Agencies served by at least one chapter in the person's scope, by name. Regional roles see
   * only the serving chapters in their scope; a chapter filter outside scope finds nothing.
   */
  async list(actor: Actor, query: ListAgenciesQuery): Promise<PartnerAgencyDto[]> {
    let ids: number[] | undefined;
    if (query.chapterId !== undefined) {
      const inScope = await this.chapters.count({
        where: within(chapterScope(actor), { id: query.chapterId }),
      });
      if (!inScope) return [];
      const links = await this.links.findAll({ where: { chapterId: query.chapterId } });
      ids = links.map((link) => link.agencyId);
      if (!ids.length) return [];
    }
    const rows = await this.agencies.findAll({
      where: ids ? { id: ids } : {},
      include: [servingChapters(actor)],
      order: [
        ['name', 'ASC'],
        [{ model: Chapter, as: 'chapters' }, 'name', 'ASC'],
      ],
    });
    return rows.map(toPartnerAgencyDto);
  }

  /** One agency in scope; out of scope is reported exactly like one that does not exist. */
  async get(actor: Actor, id: number): Promise<PartnerAgencyDto> {
    const [row] = await this.agencies.findAll({
      where: { id },
      include: [servingChapters(actor)],
      order: [[{ model: Chapter, as: 'chapters' }, 'name', 'ASC']],
    });
    if (!row) throw new NotFoundException('No such partner agency.');
    return toPartnerAgencyDto(row);
  }

  async create(context: SignedInContext, body: SavePartnerAgencyDto): Promise<PartnerAgencyDto> {
    const agency = await this.sequelize
      .transaction(async (transaction) => {
        const chapterIds = await this.existingChapters(body.chapterIds, transaction);
        await refuseIfTaken(this.agencies, { name: body.name }, null, transaction, TAKEN.name);
        const created = await this.agencies.create(
          { name: body.name, kind: body.kind, active: body.active ?? true },
          { transaction },
        );
        await this.links.bulkCreate(
          chapterIds.map((chapterId) => ({ agencyId: created.id, chapterId })),
          { transaction },
        );
        await this.audit.record(
          context,
          {
            action: 'partner_agency.created',
            entityType: 'partner_agency',
            entityId: created.id,
            after: auditableAgency(created, chapterIds),
          },
          transaction,
        );
        return created;
      })
      .catch((error: unknown) => {
        throw asTakenField(error, TAKEN);
      });
    return this.get(context.actor, agency.id);
  }

  async update(
    context: SignedInContext,
    id: number,
    body: UpdatePartnerAgencyDto,
  ): Promise<PartnerAgencyDto> {
    await this.sequelize
      .transaction(async (transaction) => {
        const agency = await this.agencies.findByPk(id, { transaction, lock: true });
        if (!agency) throw new NotFoundException('No such partner agency.');
        const stored = await this.chapterIdsOf(id, transaction);
        const before = auditableAgency(agency, stored);
        const chapterIds =
          body.chapterIds !== undefined
            ? await this.existingChapters(body.chapterIds, transaction)
            : stored;
        if (body.name !== undefined)
          await refuseIfTaken(this.agencies, { name: body.name }, id, transaction, TAKEN.name);
        await agency.update(
          {
            ...(body.name !== undefined ? { name: body.name } : {}),
            ...(body.kind !== undefined ? { kind: body.kind } : {}),
            ...(body.active !== undefined ? { active: body.active } : {}),
          },
          { transaction },
        );
        if (chapterIds.join() !== stored.join()) {
          await this.links.destroy({ where: { agencyId: id }, transaction });
          await this.links.bulkCreate(
            chapterIds.map((chapterId) => ({ agencyId: id, chapterId })),
            { transaction },
          );
        }
        const after = auditableAgency(agency, chapterIds);
        await this.audit.recordChange(
          context,
          {
            action: 'partner_agency.updated',
            entityType: 'partner_agency',
            entityId: id,
            before,
            after,
          },
          transaction,
        );
      })
      .catch((error: unknown) => {
        throw asTakenField(error, TAKEN);
      });
    return this.get(context.actor, id);
  }

  /** The ids sent, once each and sorted, if every one is a chapter; else 400 naming chapterIds. */
  private async existingChapters(ids: number[], transaction: Transaction): Promise<number[]> {
    const wanted = [...new Set(ids)].sort((a, b) => a - b);
    const found = new Set(
      (await this.chapters.findAll({ attributes: ['id'], where: { id: wanted }, transaction })).map(
        (chapter) => chapter.id,
      ),
    );
    const missing = wanted.filter((id) => !found.has(id));
    if (missing.length) {
      throw invalidField(
        'chapterIds',
        `No such chapter: ${missing.join(', ')}. An agency must be served by existing chapters.`,
      );
    }
    return wanted;
  }

  private async chapterIdsOf(agencyId: number, transaction: Transaction): Promise<number[]> {
    const links = await this.links.findAll({ where: { agencyId }, transaction });
    return links.map((link) => link.chapterId).sort((a, b) => a - b);
  }
}

/**
 * The serving chapters a person may see. For regional roles the join is required, so an agency
 * none of whose chapters is in scope is not found at all.
 */
function servingChapters(actor: Actor): Includeable {
  return {
    model: Chapter,
    attributes: ['id', 'name'],
    through: { attributes: [] },
    where: chapterScope(actor),
    required: ROLE_SCOPE[actor.role] !== 'network',
  };
}

function toPartnerAgencyDto(agency: PartnerAgency): PartnerAgencyDto {
  return {
    id: agency.id,
    name: agency.name,
    kind: agency.kind,
    active: agency.active,
    chapters: (agency.chapters ?? []).map((chapter) => ({ id: chapter.id, name: chapter.name })),
  };
}

function auditableAgency(agency: PartnerAgency, chapterIds: number[]): Record<string, unknown> {
  return { name: agency.name, kind: agency.kind, active: agency.active, chapterIds };
}
