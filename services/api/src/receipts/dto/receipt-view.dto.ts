import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import type {
  ParcelReceiptDetail,
  ParcelReceiptView,
  ReceiptPage,
  ReceiptTotals,
  SamplePanelMeasurement,
  ScanView,
  SenderDetails,
  SetAsideReason,
} from '@tallyloom/core';

class SenderViewDto implements SenderDetails {
  @ApiProperty({ type: String, nullable: true }) name: string | null;
  @ApiProperty({ type: String, nullable: true }) email: string | null;
  @ApiProperty({ type: String, nullable: true }) address: string | null;
}

class SetAsideViewDto implements Record<SetAsideReason, number> {
  @ApiProperty() offSize: number;
  @ApiProperty() hardCareYarn: number;
  @ApiProperty() soiledOrDamaged: number;
  @ApiProperty() other: number;
}

class FinishedBlanketViewDto {
  @ApiProperty() blanketSizeId: number;
  @ApiProperty() name: string;
  @ApiProperty() count: number;
}

class SamplePanelViewDto implements SamplePanelMeasurement {
  @ApiProperty() width: number;
  @ApiProperty() height: number;
  @ApiProperty({ enum: ['in', 'cm'] }) unit: 'in' | 'cm';
  @ApiProperty() withinTolerance: boolean;
  @ApiProperty({ type: [String] }) messages: string[];
}

export class ScanDto implements ScanView {
  @ApiProperty() id: number;
  @ApiProperty() fileName: string;
  @ApiProperty({ enum: ['image/jpeg', 'image/png', 'image/webp', 'application/pdf'] })
  mediaType: string;
  @ApiProperty() sizeBytes: number;
  @ApiProperty({ format: 'date-time' }) uploadedAt: string;
  @ApiProperty() url: string;
}

export class ReceiptDto implements ParcelReceiptView {
  @ApiProperty() id: number;
  @ApiProperty() chapterId: number;
  @ApiProperty() chapterName: string;
  @ApiProperty() regionId: number;
  @ApiProperty() regionName: string;
  @ApiProperty({ format: 'date' }) receivedOn: string;
  @ApiProperty({
    type: SenderViewDto,
    nullable: true,
    description: "Only for roles with 'senders.read'; null for others and once erased",
  })
  sender: SenderDetails | null;
  @ApiProperty() senderErased: boolean;
  @ApiProperty({ type: Number, nullable: true }) campaignId: number | null;
  @ApiProperty({ type: String, nullable: true }) campaignCode: string | null;
  @ApiProperty() credited: boolean;
  @ApiProperty() panelsAccepted: number;
  @ApiProperty({ type: SetAsideViewDto }) setAside: Record<SetAsideReason, number>;
  @ApiProperty({ type: String, nullable: true }) setAsideOtherNote: string | null;
  @ApiProperty() setAsideTotal: number;
  @ApiProperty({ type: [FinishedBlanketViewDto] })
  finishedBlankets: Array<{ blanketSizeId: number; name: string; count: number }>;
  @ApiProperty() finishedBlanketsTotal: number;
  @ApiProperty() otherItems: number;
  @ApiProperty({ type: String, nullable: true }) notes: string | null;
  @ApiProperty({ type: SamplePanelViewDto, nullable: true })
  samplePanel: ParcelReceiptView['samplePanel'];
  @ApiProperty() scanCount: number;
  @ApiProperty({ type: Number, nullable: true }) importBatchId: number | null;
  @ApiProperty({ format: 'date-time' }) createdAt: string;
  @ApiProperty() version: number;
  @ApiProperty({ type: [String] }) warnings: string[];
}

export class ReceiptDetailDto extends ReceiptDto implements ParcelReceiptDetail {
  @ApiProperty({ type: [ScanDto] }) scans: ScanView[];
}

class ReceiptTotalsDto implements ReceiptTotals {
  @ApiProperty() receipts: number;
  @ApiProperty() panelsAccepted: number;
  @ApiProperty() setAside: number;
  @ApiProperty() finishedBlankets: number;
  @ApiProperty() otherItems: number;
}

export class ReceiptPageDto implements ReceiptPage {
  @ApiProperty({ type: [ReceiptDto] }) items: ParcelReceiptView[];
  @ApiProperty() total: number;
  @ApiProperty() page: number;
  @ApiProperty() pageSize: number;
  @ApiProperty({ type: ReceiptTotalsDto, description: 'Over every matching receipt, not the page' })
  totals: ReceiptTotals;
}

/** One audit entry of a receipt. Sender details never appear here (see auditableReceipt). */
export class ReceiptHistoryEntryDto {
  @ApiProperty() id: number;
  @ApiProperty({ example: 'receipt.updated' }) action: string;
  @ApiProperty({ format: 'date-time' }) occurredAt: string;
  @ApiProperty({ type: Number, nullable: true }) actorUserId: number | null;
  @ApiProperty({ type: String, nullable: true }) actorEmail: string | null;
  @ApiPropertyOptional({ type: Object, nullable: true }) before: Record<string, unknown> | null;
  @ApiPropertyOptional({ type: Object, nullable: true }) after: Record<string, unknown> | null;
}
