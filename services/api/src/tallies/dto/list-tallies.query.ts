import { ApiPropertyOptional } from '@nestjs/swagger';
import { TALLY_STATES, type TallyListParams, type TallyState } from '@tallyloom/core';
import { IsIn, IsOptional } from 'class-validator';
import { WholeNumberField } from '../../common/validation/fields';
import { IdField, MonthField } from './tally-fields';

const SORTS = ['month', 'chapterName', 'state', 'submittedAt'] as const;
const DIRECTIONS = ['asc', 'desc'] as const;

export class ListTalliesQuery implements TallyListParams {
  @WholeNumberField(1, 100_000, { presence: 'optional', query: true, example: 1 })
  page?: number;

  @WholeNumberField(1, 100, { presence: 'optional', query: true, example: 25 })
  pageSize?: number;

  @ApiPropertyOptional({ enum: TALLY_STATES })
  @IsOptional()
  @IsIn(TALLY_STATES, { message: `state must be one of: ${TALLY_STATES.join(', ')}` })
  state?: TallyState;

  @IdField({ optional: true, query: true }) regionId?: number;
  @IdField({ optional: true, query: true }) chapterId?: number;
  @MonthField({ optional: true, description: 'Exactly this month' }) month?: string;
  @MonthField({ optional: true, description: 'This month or later' }) from?: string;
  @MonthField({ optional: true, description: 'This month or earlier' }) to?: string;

  @ApiPropertyOptional({ enum: SORTS, default: 'month' })
  @IsOptional()
  @IsIn(SORTS, { message: `sort must be one of: ${SORTS.join(', ')}` })
  sort?: TallyListParams['sort'];

  @ApiPropertyOptional({ enum: DIRECTIONS, default: 'desc' })
  @IsOptional()
  @IsIn(DIRECTIONS, { message: 'direction must be asc or desc' })
  direction?: TallyListParams['direction'];
}

export class TallyCalendarQuery {
  @IdField({ optional: true, query: true }) chapterId?: number;
}
