import {
  Button,
  Menu,
  MenuItem,
  MenuList,
  MenuPopover,
  MenuTrigger,
} from '@fluentui/react-components';
import { ArrowExportUp20Regular } from '@fluentui/react-icons';
import { useState } from 'react';
import { useSessionUser } from '@/lib/session/use-session';
import { useCreateTableExport } from '../api/create-table-export';
import { mayExportTable } from '../export-access';
import {
  EXPORT_CHOICES,
  tableExportRequest,
  type ExportChoice,
  type TableExportTarget,
} from '../export-target';
import { ExportProgressDialog } from './export-progress-dialog';

export interface ExportMenuProps {
  /** The table and the filters it shows now: the export holds the same rows, all pages. */
  target: TableExportTarget;
  /** Names the table for the dialog, e.g. "parcels". */
  what: string;
}

/**
 * "Export" for a table: a spreadsheet or CSV of what is on screen, written by a background job.
 * Shown only to roles whose policies allow exporting this table; the server checks again.
 */
export function ExportMenu({ target, what }: ExportMenuProps) {
  const user = useSessionUser();
  const create = useCreateTableExport();
  const [open, setOpen] = useState(false);
  const [lastChoice, setLastChoice] = useState<ExportChoice>();

  if (!mayExportTable(user?.role, target.table)) return null;

  const start = (choice: ExportChoice) => {
    setLastChoice(choice);
    setOpen(true);
    create.mutate(tableExportRequest(target, choice));
  };

  return (
    <>
      <Menu positioning="below-end">
        <MenuTrigger disableButtonEnhancement>
          <Button icon={<ArrowExportUp20Regular />} aria-label={`Export ${what}`}>
            Export
          </Button>
        </MenuTrigger>
        <MenuPopover>
          <MenuList>
            {EXPORT_CHOICES.map((choice) => (
              <MenuItem key={choice.label} onClick={() => start(choice)}>
                {choice.label}
              </MenuItem>
            ))}
          </MenuList>
        </MenuPopover>
      </Menu>
      <ExportProgressDialog
        open={open}
        title={`Export ${what}`}
        exportId={create.data?.id}
        requesting={create.isPending}
        requestError={create.error ?? undefined}
        onRetry={() => lastChoice && start(lastChoice)}
        onClose={() => setOpen(false)}
      />
    </>
  );
}
