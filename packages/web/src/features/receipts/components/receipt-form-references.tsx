import {
  DEFAULT_PANEL_TOLERANCE_IN,
  type ChapterView,
  type ParcelReceiptDetail,
} from '@tallyloom/core';
import type { ReactNode } from 'react';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { useBlanketSizes } from '../api/get-blanket-sizes';
import { useSettings } from '../api/get-settings';
import { formBlanketSizes, type FormBlanketSize } from './receipt-draft';

export interface ReceiptFormReferencesData {
  sizes: FormBlanketSize[];
  toleranceIn: number | undefined;
}

export interface ReceiptFormReferencesProps {
  /** The chapters in the person's scope; undefined while they load. */
  chapters: ChapterView[] | undefined;
  chaptersError: unknown;
  onRetryChapters: () => void;
  /** The parcel being corrected, whose retired sizes still need a field. */
  receipt?: ParcelReceiptDetail;
  children: (data: ReceiptFormReferencesData) => ReactNode;
}

/** Waits for what the form is built from: chapters and blanket sizes; the tolerance may follow. */
export function ReceiptFormReferences({
  chapters,
  chaptersError,
  onRetryChapters,
  receipt,
  children,
}: ReceiptFormReferencesProps) {
  const sizes = useBlanketSizes();
  const settings = useSettings();

  if (chaptersError || sizes.isError) {
    return (
      <ErrorState
        title="The form could not be prepared"
        error={chaptersError ?? sizes.error}
        onRetry={() => {
          if (chaptersError) onRetryChapters();
          if (sizes.isError) void sizes.refetch();
        }}
      />
    );
  }
  if (!chapters || sizes.isPending) return <LoadingState label="Preparing the form…" />;

  return children({
    sizes: formBlanketSizes(sizes.data, receipt),
    // Without the setting, the check still runs with the usual tolerance.
    toleranceIn:
      settings.data?.panelToleranceIn ??
      (settings.isError ? DEFAULT_PANEL_TOLERANCE_IN : undefined),
  });
}
