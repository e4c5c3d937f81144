import { ApiPropertyOptional } from '@nestjs/swagger';
import {
  FINDING_SEVERITIES,
  FINDING_STATUSES,
  type FindingSeverity,
  type FindingStatus,
  type ListFindingsParams,
} from '@tallyloom/core';
import { IsIn, IsOptional } from 'class-validator';
import { WholeNumberField } from '../../common/validation/fields';

export class ListFindingsQuery implements ListFindingsParams {
  @ApiPropertyOptional({ enum: FINDING_STATUSES })
  @IsOptional()
  @IsIn(FINDING_STATUSES, { message: `status must be one of: ${FINDING_STATUSES.join(', ')}` })
  status?: FindingStatus;

  @ApiPropertyOptional({ enum: FINDING_SEVERITIES })
  @IsOptional()
  @IsIn(FINDING_SEVERITIES, {
    message: `severity must be one of: ${FINDING_SEVERITIES.join(', ')}`,
  })
  severity?: FindingSeverity;

  @WholeNumberField(1, 100000, { presence: 'optional', query: true, example: 1 }) page?: number;
  @WholeNumberField(1, 100, { presence: 'optional', query: true, example: 25 }) pageSize?: number;
}
