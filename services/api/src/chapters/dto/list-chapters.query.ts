import { ApiPropertyOptional } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import { IsInt, IsOptional, Max, Min } from 'class-validator';

export class ListChaptersQuery {
  @ApiPropertyOptional({ description: 'Only the chapters of this region', example: 7 })
  @IsOptional()
  @Type(() => Number)
  // class-validator checks the decorator nearest the property first; stopAtFirstError keeps that one.
  @Max(4294967295)
  @Min(1)
  @IsInt({ message: 'regionId must be a whole number' })
  regionId?: number;
}
