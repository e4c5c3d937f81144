import { Injectable, NotFoundException } from '@nestjs/common';
import { InjectConnection, InjectModel } from '@nestjs/sequelize';
import type { Transaction } from 'sequelize';
import type { Sequelize } from 'sequelize-typescript';
import { AuditService } from '../audit/audit.service';
import { ViewCache } from '../cache/view-cache';
import type { Actor } from '../common/access/actor';
import { chapterScope, within } from '../common/access/scope';
import type { SignedInContext } from '../common/context/request-context';
import { asTakenField, invalidField, refuseIfTaken } from '../common/validation/field-errors';
import { Region } from '../regions/models/region.model';
import type { ChapterDto } from './dto/chapter.dto';
import type { ListChaptersQuery } from './dto/list-chapters.query';
import type { SaveChapterDto, UpdateChapterDto } from './dto/save-chapter.dto';
import { Chapter } from './models/chapter.model';

const TAKEN = { name: { field: 'name', message: 'Another chapter already has this name.' } };

@Injectable()
export class ChaptersService {
  constructor(
    @InjectConnection() private readonly sequelize: Sequelize,
    @InjectModel(Chapter) private readonly chapters: typeof Chapter,
    @InjectModel(Region) private readonly regions: typeof Region,
    private readonly audit: AuditService,
    private readonly views: ViewCache,
  ) {}

  /** Chapters in the person's scope; a region filter outside scope simply finds nothing. */
  async list(actor: Actor, query: ListChaptersQuery): Promise<ChapterDto[]> {
    const rows = await this.chapters.findAll({
      where: within(chapterScope(actor), query.regionId ? { regionId: query.regionId } : {}),
      include: [{ model: Region, attributes: ['name'] }],
      order: [
        [{ model: Region, as: 'region' }, 'name', 'ASC'],
        ['name', 'ASC'],
      ],
    });
    return rows.map(toChapterDto);
  }

  async get(actor: Actor, id: number): Promise<ChapterDto> {
    const row = await this.chapters.findOne({
      where: within(chapterScope(actor), { id }),
      include: [{ model: Region, attributes: ['name'] }],
    });
    if (!row) throw new NotFoundException('No such chapter.');
    return toChapterDto(row);
  }

  async create(context: SignedInContext, body: SaveChapterDto): Promise<ChapterDto> {
    const fields = {
      name: body.name,
      regionId: body.regionId,
      reportingDueDay: body.reportingDueDay,
      activeFrom: body.activeFrom,
      activeTo: body.activeTo ?? null,
    };
    const chapter = await this.sequelize
      .transaction(async (transaction) => {
        await this.check(fields, body, null, transaction);
        const created = await this.chapters.create(fields, { transaction });
        await this.audit.record(
          context,
          {
            action: 'chapter.created',
            entityType: 'chapter',
            entityId: created.id,
            after: auditableChapter(created),
          },
          transaction,
        );
        return created;
      })
      .catch((error: unknown) => {
        throw asTakenField(error, TAKEN);
      });
    // Dashboards list every chapter by name: drop the cached ones.
    await this.views.invalidate();
    return this.get(context.actor, chapter.id);
  }

  async update(context: SignedInContext, id: number, body: UpdateChapterDto): Promise<ChapterDto> {
    await this.sequelize
      .transaction(async (transaction) => {
        const chapter = await this.chapters.findByPk(id, { transaction, lock: true });
        if (!chapter) throw new NotFoundException('No such chapter.');
        const before = auditableChapter(chapter);
        const fields = {
          name: body.name ?? chapter.name,
          regionId: body.regionId ?? chapter.regionId,
          reportingDueDay: body.reportingDueDay ?? chapter.reportingDueDay,
          activeFrom: body.activeFrom ?? chapter.activeFrom,
          activeTo: body.activeTo !== undefined ? body.activeTo : chapter.activeTo,
        };
        await this.check(fields, body, id, transaction);
        await chapter.update(fields, { transaction });
        const after = auditableChapter(chapter);
        await this.audit.recordChange(
          context,
          { action: 'chapter.updated', entityType: 'chapter', entityId: id, before, after },
          transaction,
        );
      })
      .catch((error: unknown) => {
        throw asTakenField(error, TAKEN);
      });
    await this.views.invalidate();
    return this.get(context.actor, id);
  }

  /** The rules a chapter keeps once the fields are merged: its region exists, its dates run forward. */
  private async check(
    fields: { name: string; regionId: number; activeFrom: string; activeTo: string | null },
    sent: Partial<SaveChapterDto>,
    exceptId: number | null,
    transaction: Transaction,
  ): Promise<void> {
    if (
      sent.regionId !== undefined &&
      !(await this.regions.findByPk(fields.regionId, { transaction }))
    )
      throw invalidField('regionId', 'No such region.');
    if (fields.activeTo !== null && fields.activeTo < fields.activeFrom) {
      // Name the field that was sent: a new start date can overtake a stored end date.
      const field = sent.activeTo === undefined ? 'activeFrom' : 'activeTo';
      throw invalidField(
        field,
        field === 'activeTo'
          ? `activeTo must be on or after activeFrom (${fields.activeFrom}).`
          : `activeFrom must be on or before the chapter's activeTo (${fields.activeTo}).`,
      );
    }
    if (sent.name !== undefined)
      await refuseIfTaken(this.chapters, { name: fields.name }, exceptId, transaction, TAKEN.name);
  }
}

function toChapterDto(chapter: Chapter): ChapterDto {
  return {
    id: chapter.id,
    name: chapter.name,
    regionId: chapter.regionId,
    regionName: chapter.region?.name ?? '',
    reportingDueDay: chapter.reportingDueDay,
    activeFrom: chapter.activeFrom,
    activeTo: chapter.activeTo ?? null,
  };
}

function auditableChapter(chapter: Chapter): Record<string, unknown> {
  return {
    name: chapter.name,
    regionId: chapter.regionId,
    reportingDueDay: chapter.reportingDueDay,
    activeFrom: chapter.activeFrom,
    activeTo: chapter.activeTo ?? null,
  };
}
