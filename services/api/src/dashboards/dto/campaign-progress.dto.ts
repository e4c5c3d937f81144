import { ApiProperty } from '@nestjs/swagger';
import type { CampaignProgressView, PublicCampaignProgress } from '@tallyloom/core';

type Projection = CampaignProgressView['projection'];
type Week = CampaignProgressView['weekly'][number];

class ProjectionDto implements Projection {
  @ApiProperty({ example: 'least-squares line over the last 8 complete weeks of credited panels' })
  method: string;
  @ApiProperty() panelsAtEnd: number;
  @ApiProperty({ type: String, format: 'date', nullable: true }) goalMetOn: string | null;
}

class WeekDto implements Week {
  @ApiProperty({ format: 'date' }) weekStart: string;
  @ApiProperty() panels: number;
  @ApiProperty() cumulative: number;
}

export class PublicCampaignProgressDto implements PublicCampaignProgress {
  @ApiProperty({ example: 'DWD26' }) code: string;
  @ApiProperty() name: string;
  @ApiProperty() goalPanels: number;
  @ApiProperty({ format: 'date' }) startsOn: string;
  @ApiProperty({ format: 'date' }) endsOn: string;
  @ApiProperty({ description: 'Panels credited in approved tally months' }) creditedPanels: number;
  @ApiProperty({ description: 'credited ÷ goal (may exceed 1)' }) shareDone: number;
  @ApiProperty() weeksLeft: number;
  @ApiProperty() pacePerWeek: number;
  @ApiProperty({ type: Number, nullable: true, description: 'Null once the end has passed' })
  neededPerWeek: number | null;
  @ApiProperty({ type: [WeekDto] }) weekly: Week[];
  @ApiProperty({ format: 'date-time' }) asOf: string;
}

export class CampaignProgressDto extends PublicCampaignProgressDto implements CampaignProgressView {
  @ApiProperty() campaignId: number;
  @ApiProperty({ description: 'Credited by receipts of months not approved yet' })
  pendingPanels: number;
  @ApiProperty() weeksElapsed: number;
  @ApiProperty() weeksTotal: number;
  @ApiProperty({ type: ProjectionDto }) projection: Projection;
}
