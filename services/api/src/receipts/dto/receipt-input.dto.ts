import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { Transform, Type } from 'class-transformer';
import {
  ArrayMaxSize,
  IsArray,
  IsIn,
  IsNotEmpty,
  IsNumber,
  IsObject,
  IsOptional,
  IsString,
  Max,
  MaxLength,
  Min,
  ValidateIf,
  ValidateNested,
} from 'class-validator';
import type {
  ParcelReceiptInput,
  SamplePanelMeasurement,
  SenderDetails,
  SetAsideReason,
} from '@tallyloom/core';
import {
  CountField,
  DateField,
  IdField,
  NullableEmailField,
  NullableTextField,
} from './receipt-fields';

export class SenderDto implements SenderDetails {
  @NullableTextField(160, 'Rowan Example') name?: string | null;
  @NullableEmailField() email?: string | null;
  @NullableTextField(500) address?: string | null;
}

export class SetAsideDto implements Record<SetAsideReason, number> {
  @CountField('Off-size panels') offSize: number;
  @CountField('Panels in hard-care yarn') hardCareYarn: number;
  @CountField('Soiled or damaged panels') soiledOrDamaged: number;
  @CountField('Set aside for another reason; say which in setAsideOtherNote') other: number;
}

export class FinishedBlanketInputDto {
  @IdField() blanketSizeId: number;
  @CountField() count: number;
}

const SIDE_MESSAGE = '$property must be a number above 0 and at most 100, with at most 2 decimals';

export class SamplePanelDto implements SamplePanelMeasurement {
  @ApiProperty({ minimum: 0, exclusiveMinimum: true, maximum: 100, example: 7 })
  @Max(100, { message: SIDE_MESSAGE })
  @Min(0.01, { message: SIDE_MESSAGE })
  @IsNumber(
    { allowNaN: false, allowInfinity: false, maxDecimalPlaces: 2 },
    { message: SIDE_MESSAGE },
  )
  width: number;

  @ApiProperty({ minimum: 0, exclusiveMinimum: true, maximum: 100, example: 9 })
  @Max(100, { message: SIDE_MESSAGE })
  @Min(0.01, { message: SIDE_MESSAGE })
  @IsNumber(
    { allowNaN: false, allowInfinity: false, maxDecimalPlaces: 2 },
    { message: SIDE_MESSAGE },
  )
  height: number;

  @ApiProperty({ enum: ['in', 'cm'] })
  @IsIn(['in', 'cm'], { message: "$property must be 'in' or 'cm'" })
  unit: 'in' | 'cm';
}

/** One parcel as entered. Rules that need the database (chapter, dates, ceiling) are the service's. */
export class ReceiptInputDto implements ParcelReceiptInput {
  @IdField() chapterId: number;

  @DateField({ description: 'Not in the future, within the chapter’s active dates' })
  receivedOn: string;

  @ApiPropertyOptional({ type: SenderDto, nullable: true })
  @IsOptional()
  @ValidateNested()
  @Type(() => SenderDto)
  @IsObject({ message: '$property must be an object' })
  sender?: SenderDto | null;

  @NullableTextField(24, 'DWD26') campaignCode?: string | null;

  @CountField() panelsAccepted: number;

  @ApiProperty({ type: SetAsideDto })
  @ValidateNested()
  @Type(() => SetAsideDto)
  @IsObject({
    message: '$property must be an object with offSize, hardCareYarn, soiledOrDamaged and other',
  })
  setAside: SetAsideDto;

  @ApiPropertyOptional({ type: String, nullable: true, maxLength: 500 })
  @Transform(({ value }: { value: unknown }) =>
    typeof value === 'string' ? value.trim() || null : value,
  )
  @ValidateIf(
    (input: ReceiptInputDto) =>
      (typeof input.setAside?.other === 'number' && input.setAside.other > 0) ||
      (input.setAsideOtherNote !== undefined && input.setAsideOtherNote !== null),
  )
  @MaxLength(500, { message: '$property must be at most 500 characters' })
  @IsNotEmpty({ message: '$property is required when panels are set aside for another reason' })
  @IsString({ message: '$property is required when panels are set aside for another reason' })
  setAsideOtherNote?: string | null;

  @ApiProperty({ type: [FinishedBlanketInputDto] })
  @ValidateNested({ each: true })
  @Type(() => FinishedBlanketInputDto)
  @ArrayMaxSize(50, { message: '$property may list at most 50 sizes' })
  @IsArray({ message: '$property must be a list' })
  finishedBlankets: FinishedBlanketInputDto[];

  @CountField('Hats, scarves and other finished items that are not blankets') otherItems: number;

  @NullableTextField(4000) notes?: string | null;

  @ApiPropertyOptional({ type: SamplePanelDto, nullable: true })
  @IsOptional()
  @ValidateNested()
  @Type(() => SamplePanelDto)
  @IsObject({ message: '$property must be an object with width, height and unit' })
  samplePanel?: SamplePanelDto | null;
}

export class UpdateReceiptDto extends ReceiptInputDto {
  @ApiProperty({
    type: 'integer',
    description: 'The version you read; a newer one on the server answers 409 with it',
  })
  @Min(1, { message: '$property must be a whole number' })
  @IsNumber(
    { allowNaN: false, maxDecimalPlaces: 0 },
    { message: '$property must be a whole number' },
  )
  version: number;
}
