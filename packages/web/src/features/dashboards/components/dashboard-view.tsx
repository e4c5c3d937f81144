import { makeStyles, tokens } from '@fluentui/react-components';
import { ChartMultiple20Regular } from '@fluentui/react-icons';
import type { DashboardParams, SnapshotView } from '@tallyloom/core';
import { useCallback, type ReactNode } from 'react';
import { EmptyState } from '@/components/ui/empty-state';
import { ErrorState } from '@/components/ui/error-state';
import { LinkButton } from '@/components/ui/link-button';
import { LoadingState } from '@/components/ui/loading-state';
import { PageHeader } from '@/components/ui/page-header';
import { SectionHeading } from '@/components/ui/section-heading';
import { paths } from '@/config/paths';
import { useSessionUser } from '@/lib/session/use-session';
import { useDashboard, type DashboardTarget } from '../api/get-dashboard';
import { BreakdownChart } from './breakdown-chart';
import { BreakdownTable } from './breakdown-table';
import { ComplianceChart } from './compliance-chart';
import { DashboardNotes } from './dashboard-notes';
import { KpiCards } from './kpi-cards';
import type { KpiMeasure } from './measures';
import { PeopleChart } from './people-chart';
import { PeriodPicker } from './period-picker';
import { dashboardSearch } from './period-query';
import { StockFacts } from './stock-facts';
import { talliesHref } from './tallies-link';
import { traceHref } from './trace-link';
import { TrendChart } from './trend-chart';

const useStyles = makeStyles({
  section: { marginTop: tokens.spacingVerticalXXL },
  columns: {
    display: 'grid',
    gridTemplateColumns: 'repeat(auto-fit, minmax(320px, 1fr))',
    gap: tokens.spacingHorizontalXXL,
  },
});

const TITLES: Record<DashboardTarget['scope'], string> = {
  network: 'Network dashboard',
  region: 'Region dashboard',
  chapter: 'Chapter dashboard',
};

function Section({ id, title, children }: { id: string; title: string; children: ReactNode }) {
  const styles = useStyles();
  return (
    <section aria-labelledby={id} className={styles.section}>
      <SectionHeading id={id}>{title}</SectionHeading>
      {children}
    </section>
  );
}

export interface DashboardViewProps {
  target: DashboardTarget;
  query: DashboardParams;
  onQueryChange: (next: DashboardParams) => void;
}

/** The figures of the network, a region or a chapter for one period, built from snapshots. */
export function DashboardView({ target, query, onQueryChange }: DashboardViewProps) {
  const styles = useStyles();
  const user = useSessionUser();
  const dashboard = useDashboard(target, query);
  const search = dashboardSearch(query);
  const childScope = target.scope === 'network' ? 'region' : 'chapter';
  const hrefOf = useCallback(
    (row: SnapshotView) =>
      childScope === 'region'
        ? paths.dashboardRegion.getHref(row.scopeId ?? 0, search)
        : paths.dashboardChapter.getHref(row.scopeId ?? 0, search),
    [childScope, search],
  );

  const view = dashboard.data;
  const header = (
    <PageHeader
      title={view ? `${view.scopeName}: ${view.period.label}` : TITLES[target.scope]}
      description={view ? TITLES[target.scope] : undefined}
      actions={
        <LinkButton to={paths.campaigns.getHref()} icon={<ChartMultiple20Regular />}>
          Campaigns
        </LinkButton>
      }
    />
  );
  const picker = <PeriodPicker value={query} onChange={onQueryChange} />;

  if (dashboard.isPending) {
    return (
      <>
        {header}
        {picker}
        <LoadingState label="Loading the figures…" />
      </>
    );
  }
  if (dashboard.isError) {
    return (
      <>
        {header}
        {picker}
        <ErrorState
          title="The figures could not be loaded"
          error={dashboard.error}
          onRetry={() => void dashboard.refetch()}
          retrying={dashboard.isFetching}
        />
      </>
    );
  }

  const { current, previous, trend, breakdown } = dashboard.data;
  const tallies = user ? talliesHref(user.role, target, current.period) : null;
  const traceOf = (view: SnapshotView, measure: KpiMeasure) => traceHref(user?.role, view, measure);
  const nothing = current.figures.approvedTallies === 0 && current.pendingTallies === 0;
  const childName = childScope === 'region' ? 'Region' : 'Chapter';
  const compliance = breakdown.length
    ? breakdown.map((row) => ({ name: row.scopeName, compliance: row.compliance }))
    : [{ name: current.scopeName, compliance: current.compliance }];

  return (
    <>
      {header}
      {picker}
      <DashboardNotes
        asOf={dashboard.data.asOf}
        pendingTallies={current.pendingTallies}
        unfiled={current.compliance.open + current.compliance.missing}
      />
      {nothing ? (
        <EmptyState title={`No approved tallies for ${current.period.label}`}>
          The figures appear here once the chapters’ tallies for this period are filed and approved.
          Choose another period above.
        </EmptyState>
      ) : (
        <>
          <KpiCards
            current={current}
            previous={previous}
            talliesHref={tallies}
            traceHrefOf={(measure) => traceOf(current, measure)}
          />
          <Section id="dashboard-trend" title="Monthly trend">
            <TrendChart trend={trend} />
          </Section>
          {breakdown.length ? (
            <Section
              id="dashboard-breakdown"
              title={childScope === 'region' ? 'Regions compared' : 'Chapters compared'}
            >
              <BreakdownChart breakdown={breakdown} hrefOf={hrefOf} />
              <BreakdownTable
                breakdown={breakdown}
                nameHeader={childName}
                labelledBy="dashboard-breakdown"
                hrefOf={hrefOf}
                traceHrefOf={traceOf}
              />
            </Section>
          ) : null}
          <div className={styles.columns}>
            <Section id="dashboard-people" title="People served by group">
              <PeopleChart byGroup={current.figures.peopleServedByGroup} />
            </Section>
            <Section id="dashboard-stock" title="Stock at the end of the period">
              <StockFacts figures={current.figures} />
            </Section>
          </div>
          <Section id="dashboard-compliance" title="Reporting compliance">
            <ComplianceChart rows={compliance} />
          </Section>
        </>
      )}
    </>
  );
}
