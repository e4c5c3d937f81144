import { makeStyles, tokens } from '@fluentui/react-components';
import type { RegionView } from '@tallyloom/core';
import { EmptyState } from '@/components/ui/empty-state';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { SectionHeading } from '@/components/ui/section-heading';
import { useChapters } from '../api/get-chapters';
import { ChaptersTable } from './chapters-table';
import { RegionFilter } from './region-filter';

const headingId = 'chapters-heading';

const useStyles = makeStyles({
  toolbar: {
    display: 'flex',
    flexWrap: 'wrap',
    alignItems: 'center',
    justifyContent: 'space-between',
    gap: tokens.spacingHorizontalM,
    marginBottom: tokens.spacingVerticalS,
  },
  heading: { marginBottom: 0 },
});

export interface ChaptersPanelProps {
  regions: RegionView[];
  regionId: number | undefined;
  onRegionChange: (regionId: number | undefined) => void;
}

/** The chapters of one region, or of all, with their reporting deadline and start. */
export function ChaptersPanel({ regions, regionId, onRegionChange }: ChaptersPanelProps) {
  const styles = useStyles();
  const chapters = useChapters({ regionId });
  const region = regions.find((candidate) => candidate.id === regionId);

  let body;
  if (chapters.isPending) {
    body = <LoadingState label="Loading chapters…" />;
  } else if (chapters.isError) {
    body = (
      <ErrorState
        title="Chapters could not be loaded"
        error={chapters.error}
        onRetry={() => void chapters.refetch()}
        retrying={chapters.isFetching}
        headingLevel={3}
      />
    );
  } else if (chapters.data.length === 0) {
    body = (
      <EmptyState
        title={region ? `No chapters in ${region.name} yet` : 'No chapters yet'}
        headingLevel={3}
      >
        A network admin adds chapters to a region; each chapter then files a tally every month.
      </EmptyState>
    );
  } else {
    body = (
      <div aria-busy={chapters.isPlaceholderData}>
        <ChaptersTable chapters={chapters.data} labelledBy={headingId} />
      </div>
    );
  }

  return (
    <section aria-labelledby={headingId}>
      <div className={styles.toolbar}>
        <SectionHeading id={headingId} className={styles.heading}>
          {region ? `Chapters in ${region.name}` : 'Chapters'}
        </SectionHeading>
        <RegionFilter regions={regions} value={region?.id} onChange={onRegionChange} />
      </div>
      {body}
    </section>
  );
}
