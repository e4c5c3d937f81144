import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import {
  SNAPSHOT_SCOPES,
  TRACE_MEASURES,
  type Period,
  type SnapshotScope,
  type TallyValueChange,
  type TraceAmendment,
  type TraceFigures,
  type TraceMeasure,
  type TraceReceipt,
  type TraceScan,
  type TraceTallyLine,
  type TraceView,
} from '@tallyloom/core';

const FIGURES = {
  type: Object,
  example: { panelsAccepted: 1234 },
  description: 'By measure: the one traced, or every measure',
} as const;

class TracePeriodDto implements Period {
  @ApiProperty({ enum: ['month', 'quarter', 'fiscal_year'] }) kind: Period['kind'];
  @ApiProperty({ example: 'FY2026' }) key: string;
  @ApiProperty({ example: '2025-07' }) from: string;
  @ApiProperty({ example: '2026-06' }) to: string;
  @ApiProperty({ example: 'FY 2025–26' }) label: string;
}

class TraceScanDto implements TraceScan {
  @ApiProperty() id: number;
  @ApiProperty() fileName: string;
  @ApiProperty({ description: 'Download address; same sign-in and scope as the receipt' })
  url: string;
}

class TraceReceiptDto implements TraceReceipt {
  @ApiProperty() id: number;
  @ApiProperty({ format: 'date' }) receivedOn: string;
  @ApiProperty() panelsAccepted: number;
  @ApiProperty() setAsideTotal: number;
  @ApiProperty({ type: String, nullable: true, description: 'As written on the label' })
  campaignCode: string | null;
  @ApiProperty() scanCount: number;
  @ApiProperty({ type: [TraceScanDto] }) scans: TraceScan[];
}

class TallyValueChangeDto implements TallyValueChange {
  @ApiProperty({ example: 'panels.usedInAssembly' }) field: string;
  @ApiProperty({ example: 'Panels used in assembly' }) label: string;
  @ApiProperty({ oneOf: [{ type: 'number' }, { type: 'string' }], nullable: true })
  before: number | string | null;
  @ApiProperty({ oneOf: [{ type: 'number' }, { type: 'string' }], nullable: true })
  after: number | string | null;
}

class TraceAmendmentDto implements TraceAmendment {
  @ApiProperty() revision: number;
  @ApiProperty({ type: String, nullable: true }) reason: string | null;
  @ApiProperty({ type: [TallyValueChangeDto], description: 'Against the revision before' })
  changes: TallyValueChange[];
}

class TraceTallyLineDto implements TraceTallyLine {
  @ApiProperty() tallyId: number;
  @ApiProperty() chapterId: number;
  @ApiProperty() chapterName: string;
  @ApiProperty() regionName: string;
  @ApiProperty({ example: '2026-03' }) month: string;
  @ApiProperty({ description: 'The revision the snapshot counted' }) revision: number;
  @ApiProperty({ type: String, nullable: true }) approvedBy: string | null;
  @ApiProperty({ type: String, format: 'date-time', nullable: true }) approvedAt: string | null;
  @ApiProperty(FIGURES) value: TraceFigures;
  @ApiProperty({ type: [TraceAmendmentDto] }) amendments: TraceAmendment[];
  @ApiProperty({ type: [TraceReceiptDto], description: "The chapter's receipts of the month" })
  receipts: TraceReceipt[];
}

export class TraceViewDto implements TraceView {
  @ApiProperty({ example: 'region:3:2026-Q1' }) reference: string;
  @ApiProperty({ enum: SNAPSHOT_SCOPES }) scope: SnapshotScope;
  @ApiProperty({ type: Number, nullable: true, description: 'Null for the network' })
  scopeId: number | null;
  @ApiProperty() scopeName: string;
  @ApiProperty({ type: TracePeriodDto }) period: Period;
  @ApiPropertyOptional({ enum: TRACE_MEASURES, nullable: true, description: 'Null: every measure' })
  measure: TraceMeasure | null;
  @ApiProperty({ ...FIGURES, description: "The stored snapshot's values (the dashboard's)" })
  figure: TraceFigures;
  @ApiProperty({ ...FIGURES, description: 'Re-added from the tally lines' })
  recomputed: TraceFigures;
  @ApiProperty({ description: 'Every recomputed value equals the figure' }) agrees: boolean;
  @ApiProperty({ format: 'date-time', description: 'When the snapshot was built' }) asOf: string;
  @ApiProperty({ type: [TraceTallyLineDto] }) tallies: TraceTallyLine[];
}
