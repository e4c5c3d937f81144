import { ApiPropertyOptional } from '@nestjs/swagger';
import type { DashboardParams } from '@tallyloom/core';
import { IsOptional, IsString } from 'class-validator';
import { DASHBOARD_PERIOD_KINDS, MAX_CUSTOM_MONTHS } from '../dashboard-period';

/** Which period a dashboard shows; the keys are checked by resolvePeriod, which names the field. */
export class DashboardQuery implements Partial<DashboardParams> {
  @ApiPropertyOptional({
    enum: DASHBOARD_PERIOD_KINDS,
    description: 'Without it, the shape of `period` decides (or custom when from/to are sent)',
  })
  @IsOptional()
  @IsString({ message: '$property must be text' })
  periodKind?: DashboardParams['periodKind'];

  @ApiPropertyOptional({
    example: '2026-03',
    description:
      "'YYYY-MM', 'YYYY-Qn' or 'FY2026'; default: the period holding the last complete month",
  })
  @IsOptional()
  @IsString({ message: '$property must be text' })
  period?: string;

  @ApiPropertyOptional({ example: '2025-10', description: 'First month of a custom range' })
  @IsOptional()
  @IsString({ message: '$property must be text' })
  from?: string;

  @ApiPropertyOptional({
    example: '2026-03',
    description: `Last month of a custom range (at most ${MAX_CUSTOM_MONTHS} months)`,
  })
  @IsOptional()
  @IsString({ message: '$property must be text' })
  to?: string;
}
