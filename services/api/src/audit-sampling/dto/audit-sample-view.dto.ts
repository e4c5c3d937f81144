import { ApiProperty } from '@nestjs/swagger';
import {
  WORKSHEET_RESULTS,
  type AuditSamplePage,
  type AuditSampleSummaryView,
  type AuditSampleView,
  type SampleEvaluation,
  type SampleItemView,
  type SamplePlanView,
  type WorksheetResult,
  type WorksheetResultView,
} from '@tallyloom/core';
import { SamplePlanRequestDto } from './sample-plan-request.dto';

class FinitePopulationAdjustmentDto {
  @ApiProperty() method: string;
  @ApiProperty() sampleSize: number;
}

export class SamplePlanDto implements SamplePlanView {
  @ApiProperty({ type: SamplePlanRequestDto }) request: SamplePlanRequestDto;
  @ApiProperty({ description: 'Items in the population when the plan was made' })
  population: number;
  @ApiProperty({ description: 'The binomial n' }) sampleSize: number;
  @ApiProperty() method: string;
  @ApiProperty() examineWholePopulation: boolean;
  @ApiProperty({ type: FinitePopulationAdjustmentDto, nullable: true })
  finitePopulationAdjustment: FinitePopulationAdjustmentDto | null;
  @ApiProperty({ description: 'What a draw takes' }) itemsToDraw: number;
}

class SampleEvaluationDto implements SampleEvaluation {
  @ApiProperty({ description: 'A fraction (0.077 = 7.7 %)' }) upperDeviationLimit: number;
  @ApiProperty() method: string;
  @ApiProperty() supportsReliance: boolean;
  @ApiProperty({ description: 'The conclusion in plain words' }) text: string;
}

class WorksheetResultDto implements WorksheetResultView {
  @ApiProperty({ description: 'Items recorded so far' }) examined: number;
  @ApiProperty() deviations: number;
  @ApiProperty({
    type: SampleEvaluationDto,
    nullable: true,
    description: 'Once every item is recorded',
  })
  evaluation: SampleEvaluationDto | null;
}

class SampleItemDto implements SampleItemView {
  @ApiProperty({ description: '1-based, in draw order' }) position: number;
  @ApiProperty({ description: 'Parcel receipt or monthly tally id' }) itemId: number;
  @ApiProperty({ enum: WORKSHEET_RESULTS, nullable: true }) result: WorksheetResult | null;
  @ApiProperty({ type: String, nullable: true }) note: string | null;
  @ApiProperty({ type: String, nullable: true }) attachmentUrl: string | null;
}

export class AuditSampleDto implements AuditSampleView {
  @ApiProperty() id: number;
  @ApiProperty({ type: SamplePlanDto }) plan: SamplePlanDto;
  @ApiProperty() seed: string;
  @ApiProperty() prng: string;
  @ApiProperty({ type: [SampleItemDto] }) items: SampleItemDto[];
  @ApiProperty({ format: 'date-time' }) drawnAt: string;
  @ApiProperty() drawnBy: string;
  @ApiProperty({ type: WorksheetResultDto }) worksheet: WorksheetResultDto;
}

export class AuditSampleSummaryDto implements AuditSampleSummaryView {
  @ApiProperty() id: number;
  @ApiProperty({ type: SamplePlanDto }) plan: SamplePlanDto;
  @ApiProperty() seed: string;
  @ApiProperty() prng: string;
  @ApiProperty() itemCount: number;
  @ApiProperty({ format: 'date-time' }) drawnAt: string;
  @ApiProperty() drawnBy: string;
  @ApiProperty({ type: WorksheetResultDto }) worksheet: WorksheetResultDto;
}

export class AuditSamplePageDto implements AuditSamplePage {
  @ApiProperty({ type: [AuditSampleSummaryDto] }) items: AuditSampleSummaryDto[];
  @ApiProperty() total: number;
  @ApiProperty() page: number;
  @ApiProperty() pageSize: number;
}
