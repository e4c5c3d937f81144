import { makeStyles, tokens } from '@fluentui/react-components';
import { Organization20Regular } from '@fluentui/react-icons';
import { EmptyState } from '@/components/ui/empty-state';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { SectionHeading } from '@/components/ui/section-heading';
import { useRegions } from '../api/get-regions';
import { ChaptersPanel } from './chapters-panel';
import { RegionsTable } from './regions-table';

const regionsHeadingId = 'regions-heading';

const useStyles = makeStyles({
  layout: {
    display: 'grid',
    gridTemplateColumns: 'minmax(260px, 2fr) minmax(0, 5fr)',
    gap: tokens.spacingHorizontalXXL,
    alignItems: 'start',
    '@media (max-width: 1100px)': {
      gridTemplateColumns: 'minmax(0, 1fr)',
      rowGap: tokens.spacingVerticalXL,
    },
  },
  code: {
    fontFamily: tokens.fontFamilyMonospace,
    fontSize: tokens.fontSizeBase200,
    padding: `0 ${tokens.spacingHorizontalXXS}`,
    borderRadius: tokens.borderRadiusSmall,
    backgroundColor: tokens.colorNeutralBackground3,
  },
});

export interface NetworkOverviewProps {
  regionId: number | undefined;
  onRegionChange: (regionId: number | undefined) => void;
}

/** Regions beside the chapters they hold; every state (loading, empty, failed) says what it is. */
export function NetworkOverview({ regionId, onRegionChange }: NetworkOverviewProps) {
  const styles = useStyles();
  const regions = useRegions();

  if (regions.isPending) return <LoadingState label="Loading regions…" />;

  if (regions.isError) {
    return (
      <ErrorState
        title="The network could not be loaded"
        error={regions.error}
        onRetry={() => void regions.refetch()}
        retrying={regions.isFetching}
      />
    );
  }

  if (regions.data.length === 0) {
    return (
      <EmptyState title="No regions yet" icon={<Organization20Regular />}>
        A network admin sets up the regions first, then the chapters in each one. To explore with
        the demo network, run <code className={styles.code}>npm start</code> from the project
        folder.
      </EmptyState>
    );
  }

  return (
    <div className={styles.layout}>
      <section aria-labelledby={regionsHeadingId}>
        <SectionHeading id={regionsHeadingId}>Regions</SectionHeading>
        <RegionsTable regions={regions.data} labelledBy={regionsHeadingId} />
      </section>
      <ChaptersPanel regions={regions.data} regionId={regionId} onRegionChange={onRegionChange} />
    </div>
  );
}
