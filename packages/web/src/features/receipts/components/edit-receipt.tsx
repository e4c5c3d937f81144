import type { ChapterView, ParcelReceiptDetail } from '@tallyloom/core';
import { useState } from 'react';
import { useNavigate } from 'react-router-dom';
import { useNotify } from '@/components/ui/app-toaster';
import { paths } from '@/config/paths';
import { conflictingReceipt, useUpdateReceipt } from '../api/update-receipt';
import { draftOf, type FormBlanketSize } from './receipt-draft';
import { ReceiptConflict } from './receipt-conflict';
import { ReceiptForm, savedNavigationState } from './receipt-form';

export interface EditReceiptProps {
  receipt: ParcelReceiptDetail;
  chapters: ChapterView[];
  sizes: FormBlanketSize[];
  toleranceIn: number | undefined;
}

/**
 * Corrects a parcel. The change is based on the version read; if someone saved first, the
 * server refuses it (409) with the parcel as it is now, and the person can load that.
 */
export function EditReceipt({ receipt, chapters, sizes, toleranceIn }: EditReceiptProps) {
  const update = useUpdateReceipt();
  const navigate = useNavigate();
  const notify = useNotify();
  // The version this correction is based on, and a key to start the form afresh from it.
  const [base, setBase] = useState(receipt);
  const [formKey, setFormKey] = useState(0);
  const current = conflictingReceipt(update.error);

  const reload = (latest: ParcelReceiptDetail) => {
    update.reset();
    setBase(latest);
    setFormKey((key) => key + 1);
  };

  return (
    <ReceiptForm
      key={formKey}
      initial={draftOf(base)}
      // A closed chapter still shows for its old parcels.
      chapters={chapters.filter(
        (chapter) => chapter.activeTo === null || chapter.id === base.chapterId,
      )}
      sizes={sizes}
      toleranceIn={toleranceIn}
      senderErased={base.senderErased}
      error={current ? null : update.error}
      pending={update.isPending}
      submitLabel="Save changes"
      pendingLabel="Saving…"
      cancelTo={paths.receipt.getHref(base.id)}
      banner={
        current ? <ReceiptConflict current={current} onReload={() => reload(current)} /> : null
      }
      onSubmit={(changes) =>
        update.mutate(
          { id: base.id, version: base.version, changes },
          {
            onSuccess: (saved) => {
              notify(
                saved.warnings.length > 0
                  ? 'Changes saved, with something worth a second look.'
                  : 'Changes saved.',
                saved.warnings.length > 0 ? 'warning' : 'success',
              );
              void navigate(paths.receipt.getHref(saved.id), { state: savedNavigationState });
            },
          },
        )
      }
    />
  );
}
