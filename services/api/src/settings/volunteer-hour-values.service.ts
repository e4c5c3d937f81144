import { Injectable, NotFoundException } from '@nestjs/common';
import { InjectConnection, InjectModel } from '@nestjs/sequelize';
import type { Sequelize } from 'sequelize-typescript';
import { AuditService } from '../audit/audit.service';
import type { SignedInContext } from '../common/context/request-context';
import { asTakenField, refuseIfTaken } from '../common/validation/field-errors';
import type {
  SaveVolunteerHourValueDto,
  UpdateVolunteerHourValueDto,
  VolunteerHourValueDto,
} from './dto/volunteer-hour-value.dto';
import { VolunteerHourValue } from './models/volunteer-hour-value.model';
import { auditableHourValue, toVolunteerHourValueDto } from './settings.mappers';

const TAKEN = {
  data_year: { field: 'dataYear', message: 'There is already a value for this data year.' },
};

@Injectable()
export class VolunteerHourValuesService {
  constructor(
    @InjectConnection() private readonly sequelize: Sequelize,
    @InjectModel(VolunteerHourValue) private readonly values: typeof VolunteerHourValue,
    private readonly audit: AuditService,
  ) {}

  /** Every data year's value, newest first. */
  async list(): Promise<VolunteerHourValueDto[]> {
    const rows = await this.values.findAll({ order: [['dataYear', 'DESC']] });
    return rows.map(toVolunteerHourValueDto);
  }

  async create(
    context: SignedInContext,
    body: SaveVolunteerHourValueDto,
  ): Promise<VolunteerHourValueDto> {
    const value = await this.sequelize
      .transaction(async (transaction) => {
        await refuseIfTaken(
          this.values,
          { dataYear: body.dataYear },
          null,
          transaction,
          TAKEN.data_year,
        );
        const created = await this.values.create(
          {
            dataYear: body.dataYear,
            hourlyValue: body.hourlyValue.toFixed(2),
            currency: body.currency ?? 'USD',
            source: body.source,
          },
          { transaction },
        );
        await this.audit.record(
          context,
          {
            action: 'volunteer_hour_value.created',
            entityType: 'volunteer_hour_value',
            entityId: created.id,
            after: auditableHourValue(created),
          },
          transaction,
        );
        return created;
      })
      .catch((error: unknown) => {
        throw asTakenField(error, TAKEN);
      });
    return toVolunteerHourValueDto(value);
  }

  async update(
    context: SignedInContext,
    id: number,
    body: UpdateVolunteerHourValueDto,
  ): Promise<VolunteerHourValueDto> {
    const value = await this.sequelize
      .transaction(async (transaction) => {
        const found = await this.values.findByPk(id, { transaction, lock: true });
        if (!found) throw new NotFoundException('No such volunteer hour value.');
        if (body.dataYear !== undefined)
          await refuseIfTaken(
            this.values,
            { dataYear: body.dataYear },
            id,
            transaction,
            TAKEN.data_year,
          );
        const before = auditableHourValue(found);
        await found.update(
          {
            ...(body.dataYear !== undefined ? { dataYear: body.dataYear } : {}),
            ...(body.hourlyValue !== undefined ? { hourlyValue: body.hourlyValue.toFixed(2) } : {}),
            ...(body.currency !== undefined ? { currency: body.currency } : {}),
            ...(body.source !== undefined ? { source: body.source } : {}),
          },
          { transaction },
        );
        const after = auditableHourValue(found);
        await this.audit.recordChange(
          context,
          {
            action: 'volunteer_hour_value.updated',
            entityType: 'volunteer_hour_value',
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
    return toVolunteerHourValueDto(value);
  }
}
