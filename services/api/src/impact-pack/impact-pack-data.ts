import type {
  CampaignProgressView,
  ComplianceFigures,
  Period,
  Role,
  SnapshotFigures,
  SnapshotScope,
} from '@tallyloom/core';
import type { AgencyKindRow, HourValueSetting } from '@tallyloom/reports';

/** One row of a by-scope or by-month table: a snapshot's figures with its trace key. */
export interface ImpactFigureRow {
  /** Region or chapter name, or the month 'YYYY-MM'. */
  label: string;
  figures: SnapshotFigures;
  pendingTallies: number;
  traceReference: string;
  /** The web app's address of that trace, written as the reference cell's hyperlink. */
  traceUrl: string;
}

/** Everything the workbook shows, gathered once; the writer does no reading of its own. */
export interface ImpactPackData {
  scope: 'network' | 'region' | 'campaign';
  /** e.g. 'Whole network', 'North Ridge', 'Deep Winter Drive (DWD26) · Whole network'. */
  scopeName: string;
  /** The snapshot scope whose figures the pack shows (a campaign pack: its area). */
  area: { scope: Extract<SnapshotScope, 'network' | 'region'>; scopeId: number | null };
  childScope: 'region' | 'chapter';
  period: Period;
  fiscalYearStartMonth: number;
  asOf: string;
  requester: { name: string; role: Role; roleLabel: string };
  exportedAt: Date;
  headline: SnapshotFigures;
  compliance: ComplianceFigures;
  pendingTallies: number;
  byChild: ImpactFigureRow[];
  byMonth: ImpactFigureRow[];
  byAgencyKind: AgencyKindRow[];
  campaigns: CampaignProgressView[];
  hourValues: HourValueSetting[];
  chaptersWithoutApprovedTally: string[];
}
