import { Injectable, NotFoundException } from '@nestjs/common';
import { InjectConnection, InjectModel } from '@nestjs/sequelize';
import { col, fn, type Transaction } from 'sequelize';
import type { Sequelize } from 'sequelize-typescript';
import { AuditService } from '../audit/audit.service';
import { ViewCache } from '../cache/view-cache';
import { Chapter } from '../chapters/models/chapter.model';
import type { Actor } from '../common/access/actor';
import { regionScope, within } from '../common/access/scope';
import type { SignedInContext } from '../common/context/request-context';
import { asTakenField, refuseIfTaken } from '../common/validation/field-errors';
import type { RegionDto } from './dto/region.dto';
import type { SaveRegionDto, UpdateRegionDto } from './dto/save-region.dto';
import { Region } from './models/region.model';

const TAKEN = {
  name: { field: 'name', message: 'Another region already has this name.' },
  code: { field: 'code', message: 'Another region already has this code.' },
};

@Injectable()
export class RegionsService {
  constructor(
    @InjectConnection() private readonly sequelize: Sequelize,
    @InjectModel(Region) private readonly regions: typeof Region,
    private readonly audit: AuditService,
    private readonly views: ViewCache,
  ) {}

  /** The regions the person may see, by name, with their chapter counts. */
  async list(actor: Actor): Promise<RegionDto[]> {
    const rows = await this.regions.findAll({
      attributes: ['id', 'name', 'code', [fn('COUNT', col('chapters.id')), 'chapterCount']],
      where: regionScope(actor),
      include: [{ model: Chapter, attributes: [] }],
      group: ['Region.id'],
      order: [['name', 'ASC']],
    });
    return rows.map((row) => toRegionDto(row, Number(row.get('chapterCount'))));
  }

  /** One region in scope; out of scope is reported exactly like a region that does not exist. */
  async get(actor: Actor, id: number): Promise<RegionDto> {
    const row = await this.regions.findOne({
      attributes: ['id', 'name', 'code', [fn('COUNT', col('chapters.id')), 'chapterCount']],
      where: within(regionScope(actor), { id }),
      include: [{ model: Chapter, attributes: [] }],
      group: ['Region.id'],
      // findOne adds LIMIT 1; without this Sequelize would push it into a subquery the COUNT cannot see.
      subQuery: false,
    });
    if (!row) throw new NotFoundException('No such region.');
    return toRegionDto(row, Number(row.get('chapterCount')));
  }

  async create(context: SignedInContext, body: SaveRegionDto): Promise<RegionDto> {
    const region = await this.sequelize
      .transaction(async (transaction) => {
        await this.refuseTaken(body, null, transaction);
        const created = await this.regions.create(
          { name: body.name, code: body.code },
          { transaction },
        );
        await this.audit.record(
          context,
          {
            action: 'region.created',
            entityType: 'region',
            entityId: created.id,
            after: auditableRegion(created),
          },
          transaction,
        );
        return created;
      })
      .catch((error: unknown) => {
        throw asTakenField(error, TAKEN);
      });
    // Dashboards list every region by name: drop the cached ones.
    await this.views.invalidate();
    return this.get(context.actor, region.id);
  }

  async update(context: SignedInContext, id: number, body: UpdateRegionDto): Promise<RegionDto> {
    await this.sequelize
      .transaction(async (transaction) => {
        const region = await this.regions.findByPk(id, { transaction, lock: true });
        if (!region) throw new NotFoundException('No such region.');
        await this.refuseTaken(body, id, transaction);
        const before = auditableRegion(region);
        await region.update(
          {
            ...(body.name !== undefined ? { name: body.name } : {}),
            ...(body.code !== undefined ? { code: body.code } : {}),
          },
          { transaction },
        );
        const after = auditableRegion(region);
        await this.audit.recordChange(
          context,
          { action: 'region.updated', entityType: 'region', entityId: id, before, after },
          transaction,
        );
      })
      .catch((error: unknown) => {
        throw asTakenField(error, TAKEN);
      });
    await this.views.invalidate();
    return this.get(context.actor, id);
  }

  /** Names and codes are unique whatever their case (the column collation ignores case). */
  private async refuseTaken(
    body: Partial<SaveRegionDto>,
    exceptId: number | null,
    transaction: Transaction,
  ): Promise<void> {
    if (body.name !== undefined)
      await refuseIfTaken(this.regions, { name: body.name }, exceptId, transaction, TAKEN.name);
    if (body.code !== undefined)
      await refuseIfTaken(this.regions, { code: body.code }, exceptId, transaction, TAKEN.code);
  }
}

function toRegionDto(region: Region, chapterCount: number): RegionDto {
  return { id: region.id, name: region.name, code: region.code, chapterCount };
}

function auditableRegion(region: Region): Record<string, unknown> {
  return { name: region.name, code: region.code };
}
