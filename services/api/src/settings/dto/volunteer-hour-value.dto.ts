import { ApiProperty, ApiPropertyOptional, PartialType } from '@nestjs/swagger';
import type { SaveVolunteerHourValueRequest, VolunteerHourValueView } from '@tallyloom/core';
import { Transform } from 'class-transformer';
import { IsNumber, IsPositive, IsString, Matches, Max, ValidateIf } from 'class-validator';
import { TextField, WholeNumberField } from '../../common/validation/fields';

export class VolunteerHourValueDto implements VolunteerHourValueView {
  @ApiProperty({ example: 2 }) id: number;
  @ApiProperty({ example: 2022 }) dataYear: number;
  @ApiProperty({ example: 31.8, description: 'Value of one volunteer hour in `currency`' })
  hourlyValue: number;
  @ApiProperty({ example: 'USD' }) currency: string;
  @ApiProperty({ description: 'The publication the figure comes from' }) source: string;
}

const HOURLY_VALUE = 'hourlyValue must be more than 0 and at most 1,000, with at most 2 decimals';

export class SaveVolunteerHourValueDto implements SaveVolunteerHourValueRequest {
  @WholeNumberField(1990, 2100, {
    example: 2022,
    description: 'The year the figure is for; unique',
  })
  dataYear: number;

  @ApiProperty({ example: 31.8, exclusiveMinimum: true, minimum: 0, maximum: 1000 })
  @Max(1000, { message: HOURLY_VALUE })
  @IsPositive({ message: HOURLY_VALUE })
  @IsNumber(
    { allowNaN: false, allowInfinity: false, maxDecimalPlaces: 2 },
    { message: HOURLY_VALUE },
  )
  hourlyValue: number;

  @ApiPropertyOptional({ example: 'USD', default: 'USD', pattern: '^[A-Z]{3}$' })
  @Transform(({ value }: { value: unknown }) =>
    typeof value === 'string' ? value.trim().toUpperCase() : value,
  )
  @ValidateIf((_, value) => value !== undefined)
  @Matches(/^[A-Z]{3}$/, { message: 'currency must be a three-letter code such as USD' })
  @IsString({ message: 'currency must be text' })
  currency?: string;

  @TextField(255, 'Independent Sector, Value of Volunteer Time (2022 data, released 2023)')
  source: string;
}

/** A change to one year's figure: only the fields sent change. */
export class UpdateVolunteerHourValueDto
  extends PartialType(SaveVolunteerHourValueDto, { skipNullProperties: false })
  implements Partial<SaveVolunteerHourValueRequest> {}
