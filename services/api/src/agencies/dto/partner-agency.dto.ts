import { ApiProperty, ApiPropertyOptional, PartialType } from '@nestjs/swagger';
import {
  AGENCY_KINDS,
  type AgencyKind,
  type PartnerAgencyView,
  type SavePartnerAgencyRequest,
} from '@tallyloom/core';
import {
  ArrayMaxSize,
  ArrayNotEmpty,
  IsArray,
  IsBoolean,
  IsIn,
  IsInt,
  Max,
  Min,
  ValidateIf,
} from 'class-validator';
import { TextField, WholeNumberField } from '../../common/validation/fields';

export class AgencyChapterDto {
  @ApiProperty({ example: 12 }) id: number;
  @ApiProperty({ example: 'Alder Falls' }) name: string;
}

export class PartnerAgencyDto implements PartnerAgencyView {
  @ApiProperty({ example: 3 }) id: number;
  @ApiProperty({ example: 'Maple Street Family Shelter' }) name: string;
  @ApiProperty({ enum: AGENCY_KINDS }) kind: AgencyKind;
  @ApiProperty() active: boolean;

  @ApiProperty({
    type: [AgencyChapterDto],
    description: 'The chapters that serve the agency (of those in your scope), by name',
  })
  chapters: AgencyChapterDto[];
}

const CHAPTER_IDS = 'chapterIds must list one or more chapter ids (whole numbers)';

export class SavePartnerAgencyDto implements SavePartnerAgencyRequest {
  @TextField(160, 'Maple Street Family Shelter')
  name: string;

  @ApiProperty({ enum: AGENCY_KINDS })
  @IsIn(AGENCY_KINDS, { message: `kind must be one of: ${AGENCY_KINDS.join(', ')}` })
  kind: AgencyKind;

  @ApiProperty({ type: [Number], example: [12, 15], description: 'The chapters that serve it' })
  // Checked from the property outwards: a list first, then its length, then each id.
  @Max(4294967295, { each: true, message: CHAPTER_IDS })
  @Min(1, { each: true, message: CHAPTER_IDS })
  @IsInt({ each: true, message: CHAPTER_IDS })
  @ArrayMaxSize(200, { message: 'chapterIds may list at most 200 chapters' })
  @ArrayNotEmpty({ message: CHAPTER_IDS })
  @IsArray({ message: CHAPTER_IDS })
  chapterIds: number[];

  @ApiPropertyOptional({ default: true })
  @ValidateIf((_, value) => value !== undefined)
  @IsBoolean({ message: 'active must be true or false' })
  active?: boolean;
}

/** A change to an agency: only the fields sent change; `chapterIds` replaces the whole list. */
export class UpdatePartnerAgencyDto
  extends PartialType(SavePartnerAgencyDto, { skipNullProperties: false })
  implements Partial<SavePartnerAgencyRequest> {}

export class ListAgenciesQuery {
  @WholeNumberField(1, 4294967295, {
    presence: 'optional',
    query: true,
    example: 12,
    description: 'Only the agencies this chapter serves',
  })
  chapterId?: number;
}
