import { Button, makeStyles, Text, tokens } from '@fluentui/react-components';
import {
  ArrowClockwise20Regular,
  Database20Regular,
  Server20Regular,
  Timer20Regular,
} from '@fluentui/react-icons';
import type { HealthReport } from '@tallyloom/core';
import type { ReactNode } from 'react';
import { ErrorState } from '@/components/ui/error-state';
import { FactList } from '@/components/ui/fact-list';
import { LoadingState } from '@/components/ui/loading-state';
import { formatTimeOfDay, formatUptime } from '@/lib/format';
import { useHealth } from '../api/get-health';
import { QueueTable } from './queue-table';
import { ServiceStateBadge } from './service-state-badge';

const useStyles = makeStyles({
  summary: {
    display: 'flex',
    flexWrap: 'wrap',
    alignItems: 'center',
    gap: tokens.spacingHorizontalM,
    marginBottom: tokens.spacingVerticalL,
  },
  summaryText: { margin: 0 },
  checkedAt: { margin: 0, color: tokens.colorNeutralForeground2 },
  grid: {
    display: 'grid',
    gridTemplateColumns: 'repeat(auto-fit, minmax(300px, 1fr))',
    gap: tokens.spacingHorizontalL,
    alignItems: 'start',
  },
  panel: {
    padding: `${tokens.spacingVerticalM} ${tokens.spacingHorizontalL}`,
    border: `1px solid ${tokens.colorNeutralStroke2}`,
    borderRadius: tokens.borderRadiusMedium,
    backgroundColor: tokens.colorNeutralBackground1,
  },
  panelTitle: {
    display: 'flex',
    alignItems: 'center',
    gap: tokens.spacingHorizontalS,
    margin: 0,
    marginBottom: tokens.spacingVerticalS,
  },
  panelIcon: { color: tokens.colorBrandForeground1 },
  facts: { marginBottom: tokens.spacingVerticalS },
});

function ServicePanel({
  id,
  title,
  icon,
  children,
}: {
  id: string;
  title: string;
  icon: ReactNode;
  children: ReactNode;
}) {
  const styles = useStyles();
  return (
    <section className={styles.panel} aria-labelledby={id}>
      <Text as="h2" id={id} size={400} weight="semibold" className={styles.panelTitle}>
        <span className={styles.panelIcon} aria-hidden="true">
          {icon}
        </span>
        {title}
      </Text>
      {children}
    </section>
  );
}

function Facts({ rows }: { rows: Array<[string, ReactNode]> }) {
  const styles = useStyles();
  return <FactList rows={rows} className={styles.facts} />;
}

function downServices(report: HealthReport): string[] {
  const down: string[] = [];
  if (report.database.status === 'down') down.push('database');
  if (report.queue.status === 'down') down.push('job queue');
  return down;
}

/** The health check in words: each backing service up or down, with what it reported. */
export function HealthOverview() {
  const styles = useStyles();
  const health = useHealth();

  if (health.isPending) return <LoadingState label="Checking the services…" />;

  if (health.isError) {
    return (
      <ErrorState
        title="The health check did not answer"
        error={health.error}
        onRetry={() => void health.refetch()}
        retrying={health.isFetching}
      />
    );
  }

  const report = health.data;
  const down = downServices(report);
  const { database, queue } = report;

  return (
    <>
      <div className={styles.summary}>
        <Text as="p" size={400} weight="semibold" className={styles.summaryText} role="status">
          {report.status === 'ok' && down.length === 0
            ? 'All services are up'
            : `Degraded: ${down.length ? `${down.join(' and ')} down` : 'see below'}`}
        </Text>
        <Text as="p" size={200} className={styles.checkedAt}>
          Checked at {formatTimeOfDay(health.dataUpdatedAt)}; checks again every 30 seconds.
        </Text>
        <Button
          size="small"
          icon={<ArrowClockwise20Regular />}
          onClick={() => void health.refetch()}
          disabledFocusable={health.isFetching}
        >
          {health.isFetching ? 'Checking…' : 'Check now'}
        </Button>
      </div>
      <div className={styles.grid}>
        <ServicePanel id="health-database" title="Database" icon={<Database20Regular />}>
          <Facts
            rows={[
              ['State', <ServiceStateBadge key="state" state={database.status} />],
              ...(database.version ? [['Version', database.version] as [string, ReactNode]] : []),
              ...(database.error ? [['Problem', database.error] as [string, ReactNode]] : []),
            ]}
          />
        </ServicePanel>
        <ServicePanel id="health-queue" title="Job queue" icon={<Server20Regular />}>
          <Facts
            rows={[
              ['State', <ServiceStateBadge key="state" state={queue.status} />],
              ...(queue.error ? [['Problem', queue.error] as [string, ReactNode]] : []),
            ]}
          />
          {queue.queues?.length ? (
            <QueueTable queues={queue.queues} labelledBy="health-queue" />
          ) : null}
        </ServicePanel>
        <ServicePanel id="health-app" title="Application" icon={<Timer20Regular />}>
          <Facts
            rows={[
              ['Version', report.version],
              ['Running for', formatUptime(report.uptimeSeconds)],
            ]}
          />
        </ServicePanel>
      </div>
    </>
  );
}
