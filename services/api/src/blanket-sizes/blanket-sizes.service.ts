import { Injectable, NotFoundException } from '@nestjs/common';
import { InjectConnection, InjectModel } from '@nestjs/sequelize';
import { can } from '@tallyloom/core';
import type { Sequelize } from 'sequelize-typescript';
import { AuditService } from '../audit/audit.service';
import type { Actor } from '../common/access/actor';
import type { SignedInContext } from '../common/context/request-context';
import { asTakenField, refuseIfTaken } from '../common/validation/field-errors';
import type {
  BlanketSizeDto,
  ListBlanketSizesQuery,
  SaveBlanketSizeDto,
  UpdateBlanketSizeDto,
} from './dto/blanket-size.dto';
import { auditableSize, toBlanketSizeDto } from './blanket-size.mappers';
import { BlanketSize } from './models/blanket-size.model';

const TAKEN = { name: { field: 'name', message: 'Another blanket size already has this name.' } };

@Injectable()
export class BlanketSizesService {
  constructor(
    @InjectConnection() private readonly sequelize: Sequelize,
    @InjectModel(BlanketSize) private readonly sizes: typeof BlanketSize,
    private readonly audit: AuditService,
  ) {}

  /** The catalogue in list order. Retired sizes only for those who manage it, and only on request. */
  async list(actor: Actor, query: ListBlanketSizesQuery): Promise<BlanketSizeDto[]> {
    const withInactive = query.includeInactive === true && can(actor.role, 'network.manage');
    const rows = await this.sizes.findAll({
      where: withInactive ? {} : { active: true },
      order: [
        ['sortOrder', 'ASC'],
        ['name', 'ASC'],
      ],
    });
    return rows.map(toBlanketSizeDto);
  }

  async create(context: SignedInContext, body: SaveBlanketSizeDto): Promise<BlanketSizeDto> {
    const size = await this.sequelize
      .transaction(async (transaction) => {
        await refuseIfTaken(this.sizes, { name: body.name }, null, transaction, TAKEN.name);
        const created = await this.sizes.create(
          {
            name: body.name,
            columns: body.columns,
            rows: body.rows,
            active: body.active ?? true,
            sortOrder: body.sortOrder ?? 0,
            sourceNote: body.sourceNote ?? null,
          },
          { transaction },
        );
        await this.audit.record(
          context,
          {
            action: 'blanket_size.created',
            entityType: 'blanket_size',
            entityId: created.id,
            after: auditableSize(created),
          },
          transaction,
        );
        return created;
      })
      .catch((error: unknown) => {
        throw asTakenField(error, TAKEN);
      });
    return toBlanketSizeDto(size);
  }

  async update(
    context: SignedInContext,
    id: number,
    body: UpdateBlanketSizeDto,
  ): Promise<BlanketSizeDto> {
    const size = await this.sequelize
      .transaction(async (transaction) => {
        const found = await this.sizes.findByPk(id, { transaction, lock: true });
        if (!found) throw new NotFoundException('No such blanket size.');
        if (body.name !== undefined)
          await refuseIfTaken(this.sizes, { name: body.name }, id, transaction, TAKEN.name);
        const before = auditableSize(found);
        await found.update(
          {
            ...(body.name !== undefined ? { name: body.name } : {}),
            ...(body.columns !== undefined ? { columns: body.columns } : {}),
            ...(body.rows !== undefined ? { rows: body.rows } : {}),
            ...(body.active !== undefined ? { active: body.active } : {}),
            ...(body.sortOrder !== undefined ? { sortOrder: body.sortOrder } : {}),
            ...(body.sourceNote !== undefined ? { sourceNote: body.sourceNote } : {}),
          },
          { transaction },
        );
        const after = auditableSize(found);
        await this.audit.recordChange(
          context,
          {
            action: 'blanket_size.updated',
            entityType: 'blanket_size',
            entityId: id,
            before,
            after,
          },
          transaction,
        );
        return found;
      })
      .catch((error: unknown) => {
        throw asTakenField(error, TAKEN);
      });
    return toBlanketSizeDto(size);
  }
}
