import { applyDecorators } from '@nestjs/common';
import { ApiProperty } from '@nestjs/swagger';
import {
  PEOPLE_GROUPS,
  type BlanketCountLine,
  type BlanketsGivenLine,
  type MassUnit,
  type PeopleGroup,
  type PeopleServedLine,
  type SetAsideReason,
  type TallyValues,
} from '@tallyloom/core';
import { Type } from 'class-transformer';
import { ArrayMaxSize, IsArray, IsIn, IsObject, IsOptional, ValidateNested } from 'class-validator';
import { NullableTextField } from '../../common/validation/fields';
import {
  DecimalField,
  IdField,
  TallyCountField,
  VOLUNTEER_HOURS_CEILING,
  YARN_CEILING,
} from './tally-fields';

const MAX_LINES = 500;

/** A nested object: validated inside, and named when it is missing or not an object. */
const Nested = (type: () => new () => object, description: string) =>
  applyDecorators(
    IsObject({ message: `$property must be an object with ${description}` }),
    ValidateNested(),
    Type(type),
  );

/** A list of nested lines, at most MAX_LINES long. */
const Lines = (type: () => new () => object) =>
  applyDecorators(
    IsArray({ message: '$property must be a list' }),
    ArrayMaxSize(MAX_LINES, { message: `$property may hold at most ${MAX_LINES} lines` }),
    ValidateNested({ each: true }),
    Type(type),
  );

export class SetAsideCountsDto implements Record<SetAsideReason, number> {
  @TallyCountField('Off-size panels') offSize: number;
  @TallyCountField('Panels in hard-care yarn') hardCareYarn: number;
  @TallyCountField('Soiled or damaged panels') soiledOrDamaged: number;
  @TallyCountField('Set aside for another reason') other: number;
}

export class PanelFlowDto {
  @TallyCountField("Last month's closing stock; typed in only in a chapter's first tally")
  opening: number;

  @TallyCountField('Prefilled from the month’s parcel receipts') accepted: number;

  @ApiProperty({ type: SetAsideCountsDto })
  @Nested(() => SetAsideCountsDto, 'offSize, hardCareYarn, soiledOrDamaged and other')
  setAside: SetAsideCountsDto;

  @TallyCountField() usedInAssembly: number;
  @TallyCountField() closing: number;
}

export class BlanketCountLineDto implements BlanketCountLine {
  @IdField() blanketSizeId: number;
  @TallyCountField() count: number;
}

export class BlanketsGivenLineDto implements BlanketsGivenLine {
  @IdField() blanketSizeId: number;
  @IdField() partnerAgencyId: number;
  @TallyCountField() count: number;
}

export class PeopleServedLineDto implements PeopleServedLine {
  @IdField() partnerAgencyId: number;

  @ApiProperty({ enum: PEOPLE_GROUPS })
  @IsIn(PEOPLE_GROUPS, { message: `$property must be one of: ${PEOPLE_GROUPS.join(', ')}` })
  group: PeopleGroup;

  @TallyCountField() count: number;
}

export class BlanketFlowDto {
  @TallyCountField("Last month's closing stock; typed in only in a chapter's first tally")
  opening: number;

  @ApiProperty({ type: [BlanketCountLineDto] })
  @Lines(() => BlanketCountLineDto)
  assembled: BlanketCountLineDto[];

  @TallyCountField('Finished blankets that arrived in parcels') received: number;

  @ApiProperty({ type: [BlanketsGivenLineDto] })
  @Lines(() => BlanketsGivenLineDto)
  given: BlanketsGivenLineDto[];

  @TallyCountField() closing: number;
}

const YARN_MESSAGE = `$property must be a weight above 0 and at most ${YARN_CEILING.toLocaleString('en-US')}, with at most 3 decimals`;

export class YarnDonatedDto {
  @DecimalField(YARN_CEILING, 3, YARN_MESSAGE, 'Leave yarnDonated null when no yarn came in', 0.001)
  value: number;

  @ApiProperty({ enum: ['kg', 'lb'] })
  @IsIn(['kg', 'lb'], { message: "$property must be 'kg' or 'lb'" })
  unit: MassUnit;
}

const HOURS_MESSAGE = `$property must be a number of hours from 0 to ${VOLUNTEER_HOURS_CEILING.toLocaleString('en-US')}, with at most 2 decimals`;

/** Every figure of a tally, as the form sends it whole. */
export class TallyValuesDto implements TallyValues {
  @ApiProperty({ type: PanelFlowDto })
  @Nested(() => PanelFlowDto, 'opening, accepted, setAside, usedInAssembly and closing')
  panels: PanelFlowDto;

  @NullableTextField(2000, undefined, 'Why accepted panels differ from the month’s receipts')
  receiptsDifferenceReason: string | null;

  @ApiProperty({ type: BlanketFlowDto })
  @Nested(() => BlanketFlowDto, 'opening, assembled, received, given and closing')
  blankets: BlanketFlowDto;

  @ApiProperty({ type: [PeopleServedLineDto] })
  @Lines(() => PeopleServedLineDto)
  peopleServed: PeopleServedLineDto[];

  @DecimalField(VOLUNTEER_HOURS_CEILING, 2, HOURS_MESSAGE) volunteerHours: number;

  @ApiProperty({ type: YarnDonatedDto, nullable: true })
  @IsOptional()
  @Nested(() => YarnDonatedDto, 'value and unit')
  yarnDonated: YarnDonatedDto | null;

  @NullableTextField(5000) notes: string | null;
}
