import { applyDecorators } from '@nestjs/common';
import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import {
  IsBoolean,
  IsIn,
  IsNumber,
  IsObject,
  IsOptional,
  IsString,
  Matches,
  MaxLength,
  ValidateBy,
  ValidateNested,
} from 'class-validator';
import {
  MAX_SAMPLE_SIZE,
  SAMPLE_POPULATION_KINDS,
  SAMPLING_CONFIDENCES,
  SNAPSHOT_SCOPES,
  type DrawSampleRequest,
  type SamplePlanRequest,
  type SamplePopulation,
  type SamplePopulationKind,
  type SamplingConfidence,
  type SnapshotScope,
} from '@tallyloom/core';
import { WholeNumberField } from '../../common/validation/fields';
import { MonthField } from '../../tallies/dto/tally-fields';

const KINDS = SAMPLE_POPULATION_KINDS.join(', ');
const SCOPES = SNAPSHOT_SCOPES.join(', ');

export class SamplePopulationDto implements SamplePopulation {
  @ApiProperty({ enum: SAMPLE_POPULATION_KINDS })
  @IsIn(SAMPLE_POPULATION_KINDS, { message: `$property must be one of: ${KINDS}` })
  kind: SamplePopulationKind;

  @ApiProperty({ enum: SNAPSHOT_SCOPES })
  @IsIn(SNAPSHOT_SCOPES, { message: `$property must be one of: ${SCOPES}` })
  scope: SnapshotScope;

  @WholeNumberField(1, 4294967295, {
    presence: 'optional',
    description: 'The region or chapter; left out for the network',
  })
  scopeId?: number;

  @MonthField({ description: 'First month, inclusive' }) from: string;
  @MonthField({ description: 'Last month, inclusive' }) to: string;
}

/** A fraction above 0 and at most 0.5. */
const TolerableRateField = () =>
  applyDecorators(
    ApiProperty({ example: 0.05, minimum: 0, exclusiveMinimum: true, maximum: 0.5 }),
    ValidateBy(
      {
        name: 'isTolerableRate',
        validator: {
          validate: (value: unknown) => typeof value === 'number' && value > 0 && value <= 0.5,
        },
      },
      { message: '$property must be a fraction above 0 and at most 0.5 (5 % is 0.05)' },
    ),
  );

export class SamplePlanRequestDto implements SamplePlanRequest {
  @ApiProperty({ type: SamplePopulationDto })
  @ValidateNested()
  @Type(() => SamplePopulationDto)
  @IsObject({ message: '$property must be an object with kind, scope, scopeId, from and to' })
  population: SamplePopulationDto;

  @ApiProperty({ enum: SAMPLING_CONFIDENCES, example: 0.95 })
  @IsIn(SAMPLING_CONFIDENCES, { message: '$property must be 0.9 or 0.95 (90 % or 95 %)' })
  @IsNumber({}, { message: '$property must be 0.9 or 0.95 (90 % or 95 %)' })
  confidence: SamplingConfidence;

  @TolerableRateField() tolerableRate: number;

  @WholeNumberField(0, MAX_SAMPLE_SIZE, { example: 0 }) expectedDeviations: number;

  @ApiPropertyOptional({ default: false })
  @IsOptional()
  @IsBoolean({ message: '$property must be true or false' })
  finitePopulationAdjustment?: boolean;
}

export class DrawSampleRequestDto implements DrawSampleRequest {
  @ApiProperty({ type: SamplePlanRequestDto })
  @ValidateNested()
  @Type(() => SamplePlanRequestDto)
  @IsObject({ message: '$property must be an object: the sample plan' })
  plan: SamplePlanRequestDto;

  @ApiPropertyOptional({
    maxLength: 100,
    example: '7f3a-09c2-e41b-5d80',
    description: 'Leave out for a fresh seed; give an earlier one to re-draw that sample',
  })
  @IsOptional()
  @IsString({ message: '$property must be text' })
  @MaxLength(100, { message: '$property must be at most 100 characters' })
  @Matches(/^\S(.*\S)?$/s, { message: '$property must not be empty or start or end with spaces' })
  seed?: string;
}
