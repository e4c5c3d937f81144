import { ApiProperty, PartialType } from '@nestjs/swagger';
import type { CampaignView, SaveCampaignRequest } from '@tallyloom/core';
import { Transform } from 'class-transformer';
import { IsString, Matches } from 'class-validator';
import { IsoDateField, TextField, WholeNumberField } from '../../common/validation/fields';

export class CampaignDto implements CampaignView {
  @ApiProperty({ example: 4 }) id: number;

  @ApiProperty({ example: 'DWD26', description: 'Upper-case code written on parcel labels' })
  code: string;

  @ApiProperty({ example: 'Deep Winter Drive' }) name: string;
  @ApiProperty({ example: 4000 }) goalPanels: number;
  @ApiProperty({ example: '2025-11-01', format: 'date' }) startsOn: string;
  @ApiProperty({ example: '2026-02-28', format: 'date' }) endsOn: string;

  @ApiProperty({ nullable: true, type: Number, description: 'Null for a network-wide campaign' })
  regionId: number | null;

  @ApiProperty({ nullable: true, type: String }) regionName: string | null;
}

/** How a code is written on a label and how it is stored: trimmed, upper-case. */
export function normaliseCampaignCode(value: string): string {
  return value.trim().toUpperCase();
}

export class SaveCampaignDto implements SaveCampaignRequest {
  @ApiProperty({
    example: 'DWD26',
    pattern: '^[A-Z0-9-]{2,24}$',
    description: 'Trimmed and upper-cased; 2–24 letters A–Z, digits or hyphens; unique',
  })
  @Transform(({ value }: { value: unknown }) =>
    typeof value === 'string' ? normaliseCampaignCode(value) : value,
  )
  @Matches(/^[A-Z0-9-]{2,24}$/, {
    message: 'code must be 2 to 24 letters A–Z, digits or hyphens',
  })
  @IsString({ message: 'code must be text' })
  code: string;

  @TextField(120, 'Deep Winter Drive')
  name: string;

  @WholeNumberField(1, 10_000_000, { example: 4000, description: 'Panels the drive asks for' })
  goalPanels: number;

  @IsoDateField({ example: '2025-11-01' })
  startsOn: string;

  @IsoDateField({ example: '2026-02-28', description: 'Last day; on or after startsOn' })
  endsOn: string;

  @WholeNumberField(1, 4294967295, {
    presence: 'nullable',
    example: null,
    description: 'The region the drive is limited to; null or left out for the whole network',
  })
  regionId?: number | null;
}

/** A change to a campaign: only the fields sent change; `regionId: null` makes it network-wide. */
export class UpdateCampaignDto
  extends PartialType(SaveCampaignDto, { skipNullProperties: false })
  implements Partial<SaveCampaignRequest> {}

export class ListCampaignsQuery {
  @IsoDateField({
    presence: 'optional',
    example: '2026-01-15',
    description: 'Only campaigns running on this day (start and end days included)',
  })
  activeOn?: string;
}
