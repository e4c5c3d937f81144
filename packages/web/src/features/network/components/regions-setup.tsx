import { Button, makeStyles, tokens } from '@fluentui/react-components';
import { Add20Regular, Organization20Regular } from '@fluentui/react-icons';
import type { ChapterView, RegionView } from '@tallyloom/core';
import { useCallback, useState } from 'react';
import { EmptyState } from '@/components/ui/empty-state';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { SectionHeading } from '@/components/ui/section-heading';
import { useChapters } from '../api/get-chapters';
import { useRegions } from '../api/get-regions';
import { ChapterDialog } from './chapter-dialog';
import { ChaptersTable } from './chapters-table';
import { RegionDialog } from './region-dialog';
import { RegionsTable } from './regions-table';

const regionsHeadingId = 'setup-regions-heading';
const chaptersHeadingId = 'setup-chapters-heading';

const useStyles = makeStyles({
  root: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalXXL },
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

/** What a dialog is open for: adding (no row) or editing a row; null while closed. */
type Editing<T> = { row?: T } | null;

function ChaptersSection({ regions }: { regions: RegionView[] }) {
  const styles = useStyles();
  const chapters = useChapters();
  const [editing, setEditing] = useState<Editing<ChapterView>>(null);
  const edit = useCallback((row: ChapterView) => setEditing({ row }), []);

  let body;
  if (chapters.isPending) body = <LoadingState label="Loading chapters…" />;
  else if (chapters.isError)
    body = (
      <ErrorState
        title="Chapters could not be loaded"
        error={chapters.error}
        onRetry={() => void chapters.refetch()}
        retrying={chapters.isFetching}
        headingLevel={3}
      />
    );
  else if (chapters.data.length === 0)
    body = (
      <EmptyState title="No chapters yet" headingLevel={3}>
        Add the first chapter with “Add chapter”: give it a region, the day its monthly tally is due
        and the day it started.
      </EmptyState>
    );
  else
    body = <ChaptersTable chapters={chapters.data} labelledBy={chaptersHeadingId} onEdit={edit} />;

  return (
    <section aria-labelledby={chaptersHeadingId}>
      <div className={styles.toolbar}>
        <SectionHeading id={chaptersHeadingId} className={styles.heading}>
          Chapters
        </SectionHeading>
        <Button icon={<Add20Regular />} onClick={() => setEditing({})}>
          Add chapter
        </Button>
      </div>
      {body}
      <ChapterDialog
        open={editing !== null}
        chapter={editing?.row}
        regions={regions}
        onClose={() => setEditing(null)}
      />
    </section>
  );
}

/** Regions and their chapters, each with Add and Edit, for network admins. */
export function RegionsSetup() {
  const styles = useStyles();
  const regions = useRegions();
  const [editing, setEditing] = useState<Editing<RegionView>>(null);
  const edit = useCallback((row: RegionView) => setEditing({ row }), []);

  let body;
  if (regions.isPending) body = <LoadingState label="Loading regions…" />;
  else if (regions.isError)
    body = (
      <ErrorState
        title="Regions could not be loaded"
        error={regions.error}
        onRetry={() => void regions.refetch()}
        retrying={regions.isFetching}
        headingLevel={3}
      />
    );
  else if (regions.data.length === 0)
    body = (
      <EmptyState title="No regions yet" icon={<Organization20Regular />} headingLevel={3}>
        Start here: add the network’s regions with “Add region”, then the chapters in each one.
      </EmptyState>
    );
  else body = <RegionsTable regions={regions.data} labelledBy={regionsHeadingId} onEdit={edit} />;

  return (
    <div className={styles.root}>
      <section aria-labelledby={regionsHeadingId}>
        <div className={styles.toolbar}>
          <SectionHeading id={regionsHeadingId} className={styles.heading}>
            Regions
          </SectionHeading>
          <Button icon={<Add20Regular />} onClick={() => setEditing({})}>
            Add region
          </Button>
        </div>
        {body}
        <RegionDialog
          open={editing !== null}
          region={editing?.row}
          onClose={() => setEditing(null)}
        />
      </section>
      {regions.data && regions.data.length > 0 ? <ChaptersSection regions={regions.data} /> : null}
    </div>
  );
}
