import { ApiPropertyOptional } from '@nestjs/swagger';
import type { AuditLogListParams } from '@tallyloom/core';
import { Transform } from 'class-transformer';
import { IsOptional, IsString, MaxLength } from 'class-validator';
import { IsoDateField, WholeNumberField } from '../../common/validation/fields';
import { applyDecorators } from '@nestjs/common';

/** An optional query filter: trimmed, blank means "no filter", with a length ceiling. */
const FilterText = (maxLength: number, description: string) =>
  applyDecorators(
    ApiPropertyOptional({ maxLength, description }),
    Transform(({ value }: { value: unknown }) => {
      if (typeof value !== 'string') return value;
      const trimmed = value.trim();
      return trimmed === '' ? undefined : trimmed;
    }),
    IsOptional(),
    IsString({ message: '$property must be text' }),
    MaxLength(maxLength, { message: `$property must be at most ${maxLength} characters` }),
  );

/** The viewer's filters; also what the xlsx export takes (its paging is ignored). */
export class ListAuditLogQuery implements AuditLogListParams {
  @WholeNumberField(1, 100000, { presence: 'optional', query: true, example: 1 }) page?: number;
  @WholeNumberField(1, 100, { presence: 'optional', query: true, example: 50 }) pageSize?: number;

  @FilterText(254, "An actor's e-mail (part of it) or user id")
  who?: string;

  @FilterText(64, "An action or its start, e.g. 'tally.'")
  what?: string;

  @FilterText(64, "e.g. 'monthly_tally'")
  entityType?: string;

  @FilterText(64, 'The entity id, exactly')
  entityId?: string;

  @IsoDateField({ presence: 'optional', description: 'On or after this UTC day' })
  from?: string;
  @IsoDateField({ presence: 'optional', description: 'On or before this UTC day' })
  to?: string;
}
