import { ApiProperty } from '@nestjs/swagger';
import {
  CHAIN_BREAK_REASONS,
  type AuditLogEntryView,
  type AuditLogPage,
  type AuditVerificationView,
  type ChainBreakReason,
  type ChainBreakView,
} from '@tallyloom/core';

export class AuditLogEntryDto implements AuditLogEntryView {
  @ApiProperty() id: number;
  @ApiProperty({ format: 'date-time' }) occurredAt: string;
  @ApiProperty({ type: Number, nullable: true }) actorUserId: number | null;
  @ApiProperty({ type: String, nullable: true }) actorEmail: string | null;
  @ApiProperty({ example: 'tally.approved' }) action: string;
  @ApiProperty({ example: 'monthly_tally' }) entityType: string;
  @ApiProperty({ type: String, nullable: true }) entityId: string | null;
  @ApiProperty({ type: Object, nullable: true }) before: unknown;
  @ApiProperty({ type: Object, nullable: true }) after: unknown;
  @ApiProperty({ type: String, nullable: true }) requestId: string | null;
  @ApiProperty({ type: String, nullable: true }) ip: string | null;
  @ApiProperty({ description: 'On the hash chain yet' }) sealed: boolean;
  @ApiProperty({ type: Number, nullable: true }) chainSeq: number | null;
  @ApiProperty({ type: String, nullable: true }) entryHash: string | null;
}

export class AuditLogPageDto implements AuditLogPage {
  @ApiProperty({ type: [AuditLogEntryDto] }) items: AuditLogEntryDto[];
  @ApiProperty() total: number;
  @ApiProperty() page: number;
  @ApiProperty() pageSize: number;
}

class ChainBreakDto implements ChainBreakView {
  @ApiProperty() chainSeq: number;
  @ApiProperty({ type: Number, nullable: true, description: 'Null when the entry is gone' })
  entryId: number | null;
  @ApiProperty({ enum: CHAIN_BREAK_REASONS }) reason: ChainBreakReason;
  @ApiProperty() message: string;
}

export class AuditVerificationDto implements AuditVerificationView {
  @ApiProperty() ok: boolean;
  @ApiProperty() entriesChecked: number;
  @ApiProperty({ type: ChainBreakDto, nullable: true }) firstBrokenLink: ChainBreakDto | null;
  @ApiProperty({ format: 'date-time' }) verifiedAt: string;
  @ApiProperty() headChainSeq: number;
  @ApiProperty() sealedBeforeCheck: number;
}
