import { Button } from '@fluentui/react-components';
import { Add20Regular } from '@fluentui/react-icons';
import type { CampaignView } from '@tallyloom/core';
import { useCallback, useState } from 'react';
import { CampaignDialog } from './campaign-dialog';
import { CampaignsList } from './campaigns-list';
import type { NetworkOptions } from './network-options';

/** Campaigns for network admins, with Add and Edit. */
export function CampaignsPanel({ options }: { options: NetworkOptions }) {
  const [editing, setEditing] = useState<{ row?: CampaignView } | null>(null);
  const edit = useCallback((row: CampaignView) => setEditing({ row }), []);
  return (
    <>
      <CampaignsList
        onEdit={edit}
        headerAction={
          <Button icon={<Add20Regular />} onClick={() => setEditing({})}>
            Add campaign
          </Button>
        }
        emptyHint="Add a drive with “Add campaign”: a code for parcel labels, a goal in panels and its dates."
      />
      <CampaignDialog
        open={editing !== null}
        campaign={editing?.row}
        regions={options.regions}
        onClose={() => setEditing(null)}
      />
    </>
  );
}
