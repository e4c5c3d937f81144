import { ApiProperty } from '@nestjs/swagger';
import type { RegionView } from '@tallyloom/core';

export class RegionDto implements RegionView {
  @ApiProperty({ example: 7 })
  id: number;

  @ApiProperty({ example: 'North Ridge' })
  name: string;

  @ApiProperty({ example: 'NR', description: 'Short code used in exports and URLs' })
  code: string;

  @ApiProperty({ example: 4 })
  chapterCount: number;
}
