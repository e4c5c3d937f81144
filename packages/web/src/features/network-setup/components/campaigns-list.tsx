import { Megaphone20Regular } from '@fluentui/react-icons';
import type { CampaignView } from '@tallyloom/core';
import type { ReactNode } from 'react';
import { EmptyState } from '@/components/ui/empty-state';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { SectionHeading } from '@/components/ui/section-heading';
import { useCampaigns } from '../api/get-campaigns';
import { CampaignsTable } from './campaigns-table';
import { useSectionStyles } from './section-toolbar';

const headingId = 'campaigns-heading';

export interface CampaignsListProps {
  /** Adds "Edit…" to each row; left out where the list is read-only. */
  onEdit?: (campaign: CampaignView) => void;
  /** Beside the heading, e.g. "Add campaign". */
  headerAction?: ReactNode;
  emptyHint?: string;
}

/** The drives in the person's scope, latest first, with where each stands today. */
export function CampaignsList({
  onEdit,
  headerAction,
  emptyHint = 'A network admin adds drives, each with a code that senders write on parcel labels.',
}: CampaignsListProps) {
  const styles = useSectionStyles();
  const campaigns = useCampaigns();

  let body;
  if (campaigns.isPending) body = <LoadingState label="Loading campaigns…" />;
  else if (campaigns.isError)
    body = (
      <ErrorState
        title="Campaigns could not be loaded"
        error={campaigns.error}
        onRetry={() => void campaigns.refetch()}
        retrying={campaigns.isFetching}
        headingLevel={3}
      />
    );
  else if (campaigns.data.length === 0)
    body = (
      <EmptyState title="No campaigns yet" icon={<Megaphone20Regular />} headingLevel={3}>
        {emptyHint}
      </EmptyState>
    );
  else body = <CampaignsTable campaigns={campaigns.data} labelledBy={headingId} onEdit={onEdit} />;

  return (
    <section aria-labelledby={headingId}>
      <div className={styles.toolbar}>
        <SectionHeading id={headingId} className={styles.heading}>
          Campaigns
        </SectionHeading>
        {headerAction}
      </div>
      {body}
    </section>
  );
}
