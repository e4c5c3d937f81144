import { ApiProperty } from '@nestjs/swagger';
import {
  HEADLINE_COUNTS,
  TALLY_ACTIONS,
  TALLY_STATES,
  type HeadlineCount,
  type PlausibilityScore,
  type ReportingStatus,
  type SetAsideReason,
  type TallyAction,
  type TallyCalendar,
  type TallyCalendarEntry,
  type TallyCheckContext,
  type TallyCheckResult,
  type TallyDetail,
  type TallyEvent,
  type TallyEventKind,
  type TallyHeadline,
  type TallyPage,
  type TallyProblem,
  type TallyProblemSeverity,
  type TallyRevisionState,
  type TallyRevisionSummary,
  type TallyRevisionView,
  type TallyState,
  type TallySummary,
  type TallyValues,
} from '@tallyloom/core';
import { TallyValuesDto } from './tally-values.dto';

const REPORTING: ReportingStatus[] = ['upcoming', 'due', 'on-time', 'late', 'missing'];
const REVISION_STATES: TallyRevisionState[] = [...TALLY_STATES, 'superseded'];
const EVENT_KINDS: TallyEventKind[] = [
  'created',
  'submitted',
  'returned',
  'approved',
  'amendment_started',
];
const nullableString = { type: String, nullable: true } as const;
const nullableDate = { type: String, format: 'date-time', nullable: true } as const;

class TallyHeadlineDto implements TallyHeadline {
  @ApiProperty() panelsAccepted: number;
  @ApiProperty() blanketsAssembled: number;
  @ApiProperty() blanketsGiven: number;
  @ApiProperty() peopleServed: number;
  @ApiProperty() volunteerHours: number;
}

export class TallySummaryDto implements TallySummary {
  @ApiProperty() id: number;
  @ApiProperty() chapterId: number;
  @ApiProperty() chapterName: string;
  @ApiProperty() regionId: number;
  @ApiProperty() regionName: string;
  @ApiProperty({ example: '2026-03' }) month: string;
  @ApiProperty({ enum: TALLY_STATES }) state: TallyState;
  @ApiProperty({ description: 'The revision being worked on (the latest)' }) revision: number;
  @ApiProperty({ type: Number, nullable: true, description: 'The revision reports read' })
  approvedRevision: number | null;
  @ApiProperty() amendmentPending: boolean;
  @ApiProperty({ format: 'date' }) dueOn: string;
  @ApiProperty({ enum: REPORTING }) reporting: ReportingStatus;
  @ApiProperty(nullableDate) firstSubmittedAt: string | null;
  @ApiProperty(nullableDate) submittedAt: string | null;
  @ApiProperty(nullableDate) approvedAt: string | null;
  @ApiProperty(nullableString) approvedByName: string | null;
  @ApiProperty() openingEnteredByHand: boolean;
  @ApiProperty({ type: TallyHeadlineDto }) headline: TallyHeadline;
  @ApiProperty({ description: 'Send it back with every write' }) version: number;
  @ApiProperty({ format: 'date-time' }) updatedAt: string;
}

export class TallyPageDto implements TallyPage {
  @ApiProperty({ type: [TallySummaryDto] }) items: TallySummary[];
  @ApiProperty() total: number;
  @ApiProperty() page: number;
  @ApiProperty() pageSize: number;
}

export class TallyRevisionSummaryDto implements TallyRevisionSummary {
  @ApiProperty() revision: number;
  @ApiProperty({ enum: REVISION_STATES }) state: TallyRevisionState;
  @ApiProperty(nullableString) amendmentReason: string | null;
  @ApiProperty({ format: 'date-time' }) createdAt: string;
  @ApiProperty(nullableString) createdByName: string | null;
  @ApiProperty(nullableDate) submittedAt: string | null;
  @ApiProperty(nullableString) submittedByName: string | null;
  @ApiProperty(nullableDate) approvedAt: string | null;
  @ApiProperty(nullableString) approvedByName: string | null;
}

export class TallyRevisionViewDto extends TallyRevisionSummaryDto implements TallyRevisionView {
  @ApiProperty({ type: TallyValuesDto }) values: TallyValues;
  @ApiProperty({ type: [String] }) acknowledgedWarnings: string[];
  @ApiProperty(nullableString) acknowledgementNote: string | null;
}

class TallyEventDto implements TallyEvent {
  @ApiProperty({ enum: EVENT_KINDS }) kind: TallyEventKind;
  @ApiProperty() revision: number;
  @ApiProperty({ format: 'date-time' }) at: string;
  @ApiProperty(nullableString) byName: string | null;
  @ApiProperty(nullableString) comment: string | null;
}

class TallyProblemDto implements TallyProblem {
  @ApiProperty({ example: 'panel-flow' }) code: string;
  @ApiProperty({ enum: ['error', 'warning', 'info'] }) severity: TallyProblemSeverity;
  @ApiProperty({ example: 'panels.closing' }) field: string;
  @ApiProperty() message: string;
}

class PlausibilityScoreDto implements PlausibilityScore {
  @ApiProperty({ enum: HEADLINE_COUNTS }) count: HeadlineCount;
  @ApiProperty() value: number;
  @ApiProperty({ type: Number, nullable: true }) median: number | null;
  @ApiProperty({ type: Number, nullable: true }) mad: number | null;
  @ApiProperty({ type: Number, nullable: true }) score: number | null;
  @ApiProperty() flagged: boolean;
  @ApiProperty({ enum: ['mad', 'meanAbsoluteDeviation', 'constant', 'too-little-history'] })
  method: PlausibilityScore['method'];
}

class TallyCheckResultDto implements TallyCheckResult {
  @ApiProperty({ type: [TallyProblemDto] }) errors: TallyProblem[];
  @ApiProperty({ type: [TallyProblemDto] }) warnings: TallyProblem[];
  @ApiProperty({ type: [TallyProblemDto] }) infos: TallyProblem[];
  @ApiProperty() panelsInProgress: number;
  @ApiProperty({ type: [PlausibilityScoreDto] }) plausibility: PlausibilityScore[];
}

class ReceiptSumsDto {
  @ApiProperty() count: number;
  @ApiProperty() panelsAccepted: number;
  @ApiProperty({
    type: Object,
    example: { offSize: 0, hardCareYarn: 0, soiledOrDamaged: 0, other: 0 },
  })
  setAside: Record<SetAsideReason, number>;
  @ApiProperty() finishedBlankets: number;
}

class CatalogueSizeDto {
  @ApiProperty() id: number;
  @ApiProperty() name: string;
  @ApiProperty() panels: number;
}

class ExpectedOpeningDto {
  @ApiProperty() panels: number;
  @ApiProperty() blankets: number;
  @ApiProperty({ example: '2026-02' }) fromMonth: string;
  @ApiProperty() approved: boolean;
}

class TallyCheckContextDto implements TallyCheckContext {
  @ApiProperty({ example: '2026-03' }) month: string;
  @ApiProperty({ type: ReceiptSumsDto }) receipts: TallyCheckContext['receipts'];
  @ApiProperty({ type: [CatalogueSizeDto] }) blanketSizes: TallyCheckContext['blanketSizes'];
  @ApiProperty({ type: ExpectedOpeningDto, nullable: true })
  expectedOpening: TallyCheckContext['expectedOpening'];
  @ApiProperty({
    type: 'array',
    items: { type: 'object' },
    description: `Oldest first: { month, ${HEADLINE_COUNTS.join(', ')} } of approved months`,
  })
  history: TallyCheckContext['history'];
  @ApiProperty() servedPerBlanketWarnFactor: number;
}

class AgencyRefDto {
  @ApiProperty() id: number;
  @ApiProperty() name: string;
  @ApiProperty() kind: string;
}

export class TallyDetailDto extends TallySummaryDto implements TallyDetail {
  @ApiProperty({ type: TallyValuesDto }) values: TallyValues;
  @ApiProperty({ type: TallyCheckContextDto }) checkContext: TallyCheckContext;
  @ApiProperty({ type: TallyCheckResultDto }) checks: TallyCheckResult;
  @ApiProperty({ type: [String] }) acknowledgedWarnings: string[];
  @ApiProperty(nullableString) acknowledgementNote: string | null;
  @ApiProperty(nullableString) amendmentReason: string | null;
  @ApiProperty(nullableString) returnComment: string | null;
  @ApiProperty({ type: [TallyRevisionSummaryDto] }) revisions: TallyRevisionSummary[];
  @ApiProperty({ type: [TallyEventDto] }) events: TallyEvent[];
  @ApiProperty({ type: [AgencyRefDto] }) agencies: TallyDetail['agencies'];
  @ApiProperty({ enum: TALLY_ACTIONS, isArray: true }) allowedActions: TallyAction[];
}

class TallyCalendarEntryDto implements TallyCalendarEntry {
  @ApiProperty() chapterId: number;
  @ApiProperty() chapterName: string;
  @ApiProperty({ example: '2026-03' }) month: string;
  @ApiProperty({ format: 'date' }) dueOn: string;
  @ApiProperty({ enum: REPORTING }) reporting: ReportingStatus;
  @ApiProperty({ type: Number, nullable: true }) tallyId: number | null;
  @ApiProperty({ enum: TALLY_STATES, nullable: true }) state: TallyState | null;
  @ApiProperty() amendmentPending: boolean;
  @ApiProperty(nullableString) returnComment: string | null;
}

export class TallyCalendarDto implements TallyCalendar {
  @ApiProperty({ type: [TallyCalendarEntryDto], description: 'Newest month first' })
  entries: TallyCalendarEntry[];
  @ApiProperty({ format: 'date' }) today: string;
}
