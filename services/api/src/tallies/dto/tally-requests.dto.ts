import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import type {
  AmendTallyRequest,
  ApproveTallyRequest,
  CreateTallyRequest,
  ReturnTallyRequest,
  SaveTallyRequest,
  SubmitTallyRequest,
} from '@tallyloom/core';
import { Type } from 'class-transformer';
import {
  ArrayMaxSize,
  IsArray,
  IsObject,
  IsOptional,
  IsString,
  MaxLength,
  ValidateNested,
} from 'class-validator';
import { NullableTextField, TextField } from '../../common/validation/fields';
import { IdField, MonthField, TallyCountField, VersionField } from './tally-fields';
import { TallyValuesDto } from './tally-values.dto';

export class OpeningStockDto {
  @TallyCountField('Panels in stock at the start of the month') panels: number;
  @TallyCountField('Finished blankets in stock at the start of the month') blankets: number;
}

export class CreateTallyDto implements CreateTallyRequest {
  @IdField() chapterId: number;

  @MonthField({ description: 'Not in the future, not before the chapter started' })
  month: string;

  @ApiPropertyOptional({
    type: OpeningStockDto,
    nullable: true,
    description: "Only for a chapter's first tally; later months carry last month's closing stock",
  })
  @IsOptional()
  @IsObject({ message: '$property must be an object with panels and blankets' })
  @ValidateNested()
  @Type(() => OpeningStockDto)
  opening?: OpeningStockDto | null;
}

export class SaveTallyDto implements SaveTallyRequest {
  @VersionField() version: number;

  @ApiProperty({ type: TallyValuesDto })
  @IsObject({ message: '$property must be an object with every figure of the tally' })
  @ValidateNested()
  @Type(() => TallyValuesDto)
  values: TallyValuesDto;
}

export class SubmitTallyDto implements SubmitTallyRequest {
  @VersionField() version: number;

  @ApiProperty({
    type: [String],
    description: 'Codes of the warnings the submitter has read and accepts',
  })
  @IsArray({ message: '$property must be a list of warning codes' })
  @ArrayMaxSize(100, { message: '$property may hold at most 100 codes' })
  @IsString({ each: true, message: '$property must be a list of warning codes' })
  @MaxLength(100, { each: true, message: 'each of $property must be at most 100 characters' })
  acknowledgedWarnings: string[];

  @NullableTextField(2000, undefined, 'Why the warnings are in order; required when there are any')
  acknowledgementNote?: string | null;
}

export class ApproveTallyDto implements ApproveTallyRequest {
  @VersionField() version: number;
  @NullableTextField(2000) comment?: string | null;
}

export class ReturnTallyDto implements ReturnTallyRequest {
  @VersionField() version: number;
  @TextField(2000, 'Set-aside panels do not add up; please recount.') comment: string;
}

export class AmendTallyDto implements AmendTallyRequest {
  @VersionField() version: number;
  @TextField(2000, 'Two lap blankets were counted twice.') reason: string;
}
