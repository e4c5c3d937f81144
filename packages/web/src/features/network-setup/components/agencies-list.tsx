import { makeStyles, Text, tokens } from '@fluentui/react-components';
import { BuildingMultiple20Regular } from '@fluentui/react-icons';
import { AGENCY_KIND_LABELS, type PartnerAgencyView } from '@tallyloom/core';
import type { ReactNode } from 'react';
import { ActiveBadge } from '@/components/ui/active-badge';
import { EmptyState } from '@/components/ui/empty-state';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { SectionHeading } from '@/components/ui/section-heading';
import { useAgencies } from '../api/get-agencies';
import { AgenciesTable, type AgencyActions } from './agencies-table';
import { useSectionStyles } from './section-toolbar';

const headingId = 'agencies-heading';

const useListStyles = makeStyles({
  list: {
    listStyle: 'none',
    margin: 0,
    padding: 0,
    display: 'flex',
    flexDirection: 'column',
    gap: tokens.spacingVerticalXS,
  },
  item: { display: 'flex', flexWrap: 'wrap', alignItems: 'center', gap: tokens.spacingHorizontalS },
  kind: { color: tokens.colorNeutralForeground2 },
});

/** A short list for one chapter's few agencies: name, kind, and a badge once inactive. */
function AgencyItems({ agencies }: { agencies: PartnerAgencyView[] }) {
  const styles = useListStyles();
  return (
    <ul className={styles.list} aria-labelledby={headingId}>
      {[...agencies]
        .sort((a, b) => a.name.localeCompare(b.name))
        .map((agency) => (
          <li key={agency.id} className={styles.item}>
            <Text weight="semibold">{agency.name}</Text>
            <Text className={styles.kind}>{AGENCY_KIND_LABELS[agency.kind]}</Text>
            {agency.active ? null : <ActiveBadge active={false} />}
          </li>
        ))}
    </ul>
  );
}

export interface AgenciesListProps {
  /** What to call the list, e.g. "Partner agencies Alder Falls serves". */
  title?: string;
  /**
   * A plain list instead of a table, for one chapter's few agencies: the chapters table above
   * stays the only place the chapter's name sits in a cell.
   */
  compact?: boolean;
  /** Row actions; left out where the list is read-only. */
  actions?: AgencyActions;
  /** Beside the heading, e.g. "Add agency". */
  headerAction?: ReactNode;
  /** What the empty list tells the reader to do first. */
  emptyHint?: string;
}

/** Partner agencies in the person's scope, with every state (loading, empty, failed) in words. */
export function AgenciesList({
  title = 'Partner agencies',
  compact = false,
  actions,
  headerAction,
  emptyHint = 'A network admin adds the agencies that receive blankets and the chapters that serve them.',
}: AgenciesListProps) {
  const styles = useSectionStyles();
  const agencies = useAgencies();

  let body;
  if (agencies.isPending) body = <LoadingState label="Loading partner agencies…" />;
  else if (agencies.isError)
    body = (
      <ErrorState
        title="Partner agencies could not be loaded"
        error={agencies.error}
        onRetry={() => void agencies.refetch()}
        retrying={agencies.isFetching}
        headingLevel={3}
      />
    );
  else if (agencies.data.length === 0)
    body = (
      <EmptyState
        title="No partner agencies yet"
        icon={<BuildingMultiple20Regular />}
        headingLevel={3}
      >
        {emptyHint}
      </EmptyState>
    );
  else if (compact) body = <AgencyItems agencies={agencies.data} />;
  else body = <AgenciesTable agencies={agencies.data} labelledBy={headingId} actions={actions} />;

  return (
    <section aria-labelledby={headingId}>
      <div className={styles.toolbar}>
        <SectionHeading id={headingId} className={styles.heading}>
          {title}
        </SectionHeading>
        {headerAction}
      </div>
      {body}
    </section>
  );
}
