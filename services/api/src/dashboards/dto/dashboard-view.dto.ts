import { ApiProperty } from '@nestjs/swagger';
import {
  PEOPLE_GROUPS,
  SNAPSHOT_SCOPES,
  type ComplianceFigures,
  type DashboardView,
  type PeopleGroup,
  type Period,
  type SnapshotFigures,
  type SnapshotScope,
  type SnapshotView,
} from '@tallyloom/core';
import { DASHBOARD_PERIOD_KINDS } from '../dashboard-period';

const nullableId = { type: Number, nullable: true, description: 'Null for the network' } as const;

class PeriodDto implements Period {
  @ApiProperty({ enum: DASHBOARD_PERIOD_KINDS }) kind: Period['kind'];
  @ApiProperty({ example: '2026-Q1' }) key: string;
  @ApiProperty({ example: '2026-01' }) from: string;
  @ApiProperty({ example: '2026-03' }) to: string;
  @ApiProperty({ example: 'Q1 2026' }) label: string;
}

class SnapshotFiguresDto implements SnapshotFigures {
  @ApiProperty() panelsAccepted: number;
  @ApiProperty() panelsSetAside: number;
  @ApiProperty() panelsUsed: number;
  @ApiProperty() blanketsAssembled: number;
  @ApiProperty() blanketsReceived: number;
  @ApiProperty() blanketsGiven: number;
  @ApiProperty() peopleServed: number;
  @ApiProperty({
    type: Object,
    example: Object.fromEntries(PEOPLE_GROUPS.map((group) => [group, 0])),
  })
  peopleServedByGroup: Record<PeopleGroup, number>;
  @ApiProperty() volunteerHours: number;
  @ApiProperty() yarnKg: number;
  @ApiProperty({ description: 'Closing stock of the last approved month' }) panelsInStock: number;
  @ApiProperty({ description: 'Closing stock of the last approved month' }) blanketsInStock: number;
  @ApiProperty() approvedTallies: number;
}

class ComplianceFiguresDto implements ComplianceFigures {
  @ApiProperty() expected: number;
  @ApiProperty() onTime: number;
  @ApiProperty() late: number;
  @ApiProperty() missing: number;
  @ApiProperty({ description: 'Not due yet, or due but not past the due day' }) open: number;
}

export class SnapshotViewDto implements SnapshotView {
  @ApiProperty({ enum: SNAPSHOT_SCOPES }) scope: SnapshotScope;
  @ApiProperty(nullableId) scopeId: number | null;
  @ApiProperty() scopeName: string;
  @ApiProperty({ type: PeriodDto }) period: Period;
  @ApiProperty({ type: SnapshotFiguresDto }) figures: SnapshotFigures;
  @ApiProperty({ type: ComplianceFiguresDto }) compliance: ComplianceFigures;
  @ApiProperty({ description: 'Filed but not approved yet: not in the figures' })
  pendingTallies: number;
  @ApiProperty({ format: 'date-time' }) asOf: string;
}

export class DashboardViewDto implements DashboardView {
  @ApiProperty({ enum: SNAPSHOT_SCOPES }) scope: SnapshotScope;
  @ApiProperty(nullableId) scopeId: number | null;
  @ApiProperty() scopeName: string;
  @ApiProperty({ type: PeriodDto }) period: Period;
  @ApiProperty({ type: SnapshotViewDto }) current: SnapshotView;
  @ApiProperty({ type: SnapshotViewDto, nullable: true }) previous: SnapshotView | null;
  @ApiProperty({ type: [SnapshotViewDto], description: 'One per month' }) trend: SnapshotView[];
  @ApiProperty({ type: [SnapshotViewDto], description: 'Regions, or chapters of a region' })
  breakdown: SnapshotView[];
  @ApiProperty({ format: 'date-time', description: 'The oldest snapshot shown' }) asOf: string;
}
