import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import {
  ArrayMaxSize,
  IsArray,
  IsIn,
  IsOptional,
  IsString,
  MaxLength,
  IsNotEmpty,
  ValidateNested,
} from 'class-validator';
import {
  FINDING_BODY_MAX,
  FINDING_LINK_KINDS,
  FINDING_LINKS_MAX,
  FINDING_SEVERITIES,
  FINDING_TITLE_MAX,
  type CloseFindingRequest,
  type CreateFindingRequest,
  type FindingLink,
  type FindingLinkKind,
  type FindingResponseRequest,
  type FindingSeverity,
  type UpdateFindingRequest,
} from '@tallyloom/core';
import { OptionalTextField, TextField, WholeNumberField } from '../../common/validation/fields';

const LINK_KIND_MESSAGE = `$property must be one of: ${FINDING_LINK_KINDS.join(', ')}`;
const SEVERITY_MESSAGE = `$property must be one of: ${FINDING_SEVERITIES.join(', ')}`;
const LINKS_MESSAGE = `$property must be a list of at most ${FINDING_LINKS_MAX} links`;

/** The shape only; whether the reference parses or names a real row is the service's check. */
export class FindingLinkDto implements FindingLink {
  @ApiProperty({ enum: FINDING_LINK_KINDS })
  @IsIn(FINDING_LINK_KINDS, { message: LINK_KIND_MESSAGE })
  kind: FindingLinkKind;

  @ApiProperty({
    maxLength: 100,
    example: 'region:3:2026-Q1',
    description:
      "By kind: a trace reference, a sample id, 'sampleId:itemId', a monthly tally id or a parcel receipt id",
  })
  @IsString({ message: '$property must be text' })
  @IsNotEmpty({ message: '$property is required' })
  @MaxLength(100, { message: '$property must be at most 100 characters' })
  reference: string;
}

export class CreateFindingDto implements CreateFindingRequest {
  @TextField(FINDING_TITLE_MAX, 'Receipts behind March panels not all scanned') title: string;

  @TextField(FINDING_BODY_MAX) body: string;

  @ApiProperty({ enum: FINDING_SEVERITIES })
  @IsIn(FINDING_SEVERITIES, { message: SEVERITY_MESSAGE })
  severity: FindingSeverity;

  @ApiPropertyOptional({ type: [FindingLinkDto], maxItems: FINDING_LINKS_MAX })
  @IsOptional()
  @IsArray({ message: LINKS_MESSAGE })
  @ArrayMaxSize(FINDING_LINKS_MAX, { message: LINKS_MESSAGE })
  @ValidateNested({ each: true })
  @Type(() => FindingLinkDto)
  links?: FindingLinkDto[];
}

export class UpdateFindingDto implements UpdateFindingRequest {
  @WholeNumberField(1, 4294967295, { description: 'The version read; 409 when stale' })
  version: number;

  @OptionalTextField(FINDING_TITLE_MAX) title?: string;

  @OptionalTextField(FINDING_BODY_MAX) body?: string;

  @ApiPropertyOptional({ enum: FINDING_SEVERITIES })
  @IsOptional()
  @IsIn(FINDING_SEVERITIES, { message: SEVERITY_MESSAGE })
  severity?: FindingSeverity;

  @ApiPropertyOptional({
    type: [FindingLinkDto],
    maxItems: FINDING_LINKS_MAX,
    description: 'Added to the links; one already there is skipped',
  })
  @IsOptional()
  @IsArray({ message: LINKS_MESSAGE })
  @ArrayMaxSize(FINDING_LINKS_MAX, { message: LINKS_MESSAGE })
  @ValidateNested({ each: true })
  @Type(() => FindingLinkDto)
  addLinks?: FindingLinkDto[];
}

export class FindingResponseDto implements FindingResponseRequest {
  @TextField(FINDING_BODY_MAX, 'Scans for the three receipts are now attached.') body: string;
}

export class CloseFindingDto implements CloseFindingRequest {
  @WholeNumberField(1, 4294967295, { description: 'The version read; 409 when stale' })
  version: number;
}
