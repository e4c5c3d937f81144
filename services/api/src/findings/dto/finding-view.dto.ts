import { ApiProperty } from '@nestjs/swagger';
import {
  FINDING_SEVERITIES,
  FINDING_STATUSES,
  type FindingPage,
  type FindingResponseView,
  type FindingSeverity,
  type FindingStatus,
  type FindingSummaryView,
  type FindingView,
} from '@tallyloom/core';
import { FindingLinkDto } from './finding-requests.dto';

export class FindingResponseViewDto implements FindingResponseView {
  @ApiProperty() id: number;
  @ApiProperty() body: string;
  @ApiProperty() respondedBy: string;
  @ApiProperty({ format: 'date-time' }) respondedAt: string;
}

export class FindingSummaryDto implements FindingSummaryView {
  @ApiProperty() id: number;
  @ApiProperty() title: string;
  @ApiProperty({ enum: FINDING_SEVERITIES }) severity: FindingSeverity;
  @ApiProperty({ enum: FINDING_STATUSES }) status: FindingStatus;
  @ApiProperty() createdBy: string;
  @ApiProperty() createdById: number;
  @ApiProperty({ format: 'date-time' }) createdAt: string;
  @ApiProperty({ format: 'date-time' }) updatedAt: string;
  @ApiProperty() version: number;
  @ApiProperty() responseCount: number;
}

export class FindingDto extends FindingSummaryDto implements FindingView {
  @ApiProperty() body: string;
  @ApiProperty({ type: [FindingLinkDto], description: 'In the order they were added' })
  links: FindingLinkDto[];
  @ApiProperty({ type: [FindingResponseViewDto], description: 'Oldest first' })
  responses: FindingResponseViewDto[];
  @ApiProperty({ type: String, format: 'date-time', nullable: true }) closedAt: string | null;
}

export class FindingPageDto implements FindingPage {
  @ApiProperty({ type: [FindingSummaryDto] }) items: FindingSummaryDto[];
  @ApiProperty() total: number;
  @ApiProperty() page: number;
  @ApiProperty() pageSize: number;
}
