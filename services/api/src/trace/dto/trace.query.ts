import { ApiPropertyOptional } from '@nestjs/swagger';
import { TRACE_MEASURES, type TraceMeasure, type TraceParams } from '@tallyloom/core';
import { IsIn, IsOptional } from 'class-validator';

export class TraceQuery implements TraceParams {
  @ApiPropertyOptional({
    enum: TRACE_MEASURES,
    description: 'The measure to trace; without it, every measure',
  })
  @IsOptional()
  @IsIn(TRACE_MEASURES, { message: `measure must be one of: ${TRACE_MEASURES.join(', ')}` })
  measure?: TraceMeasure;
}
