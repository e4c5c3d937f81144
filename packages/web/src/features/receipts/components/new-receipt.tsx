import type { ChapterView } from '@tallyloom/core';
import { useState } from 'react';
import { useNavigate } from 'react-router-dom';
import { useNotify } from '@/components/ui/app-toaster';
import { paths } from '@/config/paths';
import { todayIsoDate } from '@/lib/format';
import { useCreateReceipt } from '../api/create-receipt';
import { emptyDraft, type FormBlanketSize } from './receipt-draft';
import { ReceiptForm, savedNavigationState } from './receipt-form';

export interface NewReceiptProps {
  chapters: ChapterView[];
  sizes: FormBlanketSize[];
  toleranceIn: number | undefined;
}

/** Logs a parcel, then opens it: its page shows anything the server flagged (e.g. an uncredited code). */
export function NewReceipt({ chapters, sizes, toleranceIn }: NewReceiptProps) {
  const create = useCreateReceipt();
  const navigate = useNavigate();
  const notify = useNotify();
  // Parcels arrive at open chapters; a chapter lead has one, and it is already chosen.
  const openChapters = chapters.filter((chapter) => chapter.activeTo === null);
  const [initial] = useState(() =>
    emptyDraft(openChapters.length === 1 ? (openChapters[0]?.id ?? null) : null, todayIsoDate()),
  );

  return (
    <ReceiptForm
      initial={initial}
      chapters={openChapters}
      sizes={sizes}
      toleranceIn={toleranceIn}
      error={create.error}
      pending={create.isPending}
      submitLabel="Log parcel"
      pendingLabel="Saving…"
      cancelTo={paths.receipts.getHref()}
      onSubmit={(input) =>
        create.mutate(input, {
          onSuccess: (receipt) => {
            notify(
              receipt.warnings.length > 0
                ? 'Parcel logged, with something worth a second look.'
                : 'Parcel logged.',
              receipt.warnings.length > 0 ? 'warning' : 'success',
            );
            void navigate(paths.receipt.getHref(receipt.id), { state: savedNavigationState });
          },
        })
      }
    />
  );
}
