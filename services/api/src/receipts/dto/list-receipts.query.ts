import { ApiPropertyOptional } from '@nestjs/swagger';
import { Transform, Type } from 'class-transformer';
import { IsBoolean, IsIn, IsInt, IsOptional, Max, Min } from 'class-validator';
import type { ReceiptListParams } from '@tallyloom/core';
import { DateField, IdField } from './receipt-fields';

const SORTS = ['receivedOn', 'panelsAccepted', 'chapterName'] as const;
const DIRECTIONS = ['asc', 'desc'] as const;

export class ListReceiptsQuery implements ReceiptListParams {
  @ApiPropertyOptional({ default: 1 })
  @IsOptional()
  @Type(() => Number)
  @Max(100000)
  @Min(1, { message: 'page must be 1 or more' })
  @IsInt({ message: 'page must be a whole number' })
  page?: number;

  @ApiPropertyOptional({ default: 25, maximum: 100 })
  @IsOptional()
  @Type(() => Number)
  @Max(100, { message: 'pageSize must be at most 100' })
  @Min(1, { message: 'pageSize must be 1 or more' })
  @IsInt({ message: 'pageSize must be a whole number' })
  pageSize?: number;

  @DateField({ optional: true, description: 'Received on or after' }) from?: string;
  @DateField({ optional: true, description: 'Received on or before' }) to?: string;
  @IdField({ optional: true }) regionId?: number;
  @IdField({ optional: true }) chapterId?: number;
  @IdField({ optional: true }) campaignId?: number;

  @ApiPropertyOptional({ description: 'Only receipts with (true) or without (false) scans' })
  @IsOptional()
  @Transform(({ value }: { value: unknown }) =>
    value === 'true' ? true : value === 'false' ? false : value,
  )
  @IsBoolean({ message: 'hasScan must be true or false' })
  hasScan?: boolean;

  @ApiPropertyOptional({ enum: SORTS, default: 'receivedOn' })
  @IsOptional()
  @IsIn(SORTS, { message: `sort must be one of: ${SORTS.join(', ')}` })
  sort?: ReceiptListParams['sort'];

  @ApiPropertyOptional({ enum: DIRECTIONS, default: 'desc' })
  @IsOptional()
  @IsIn(DIRECTIONS, { message: 'direction must be asc or desc' })
  direction?: ReceiptListParams['direction'];
}
