import { ApiProperty } from '@nestjs/swagger';
import type { ChapterView } from '@tallyloom/core';

export class ChapterDto implements ChapterView {
  @ApiProperty({ example: 12 })
  id: number;

  @ApiProperty({ example: 'Alder Falls' })
  name: string;

  @ApiProperty({ example: 7 })
  regionId: number;

  @ApiProperty({ example: 'North Ridge' })
  regionName: string;

  @ApiProperty({
    example: 10,
    description: 'Day of the following month by which the monthly tally is due',
  })
  reportingDueDay: number;

  @ApiProperty({ example: '2022-09-01', format: 'date' })
  activeFrom: string;

  @ApiProperty({ example: null, format: 'date', nullable: true, type: String })
  activeTo: string | null;
}
