import { useQueryClient } from '@tanstack/react-query';
import type { TallyDetail, TallyValues } from '@tallyloom/core';
import { useCallback, useEffect, useRef, useState } from 'react';
import { refreshAfterTallyWrite } from '../api/invalidate-tally';
import { conflictingTally, useSaveTally } from '../api/save-tally';

/** The wait after the last change before the draft is saved. */
export const AUTOSAVE_DELAY_MS = 1500;

export type AutosaveStatus =
  | { kind: 'unchanged' }
  | { kind: 'waiting' }
  | { kind: 'saving' }
  | { kind: 'saved'; at: Date }
  | { kind: 'invalid'; message: string }
  | { kind: 'failed'; error: unknown }
  /** Someone saved a newer version first: the draft stops saving until the person chooses. */
  | { kind: 'conflict'; current: TallyDetail; mine: TallyValues };

export interface AutosaveOptions {
  id: number;
  /** The version the form was opened on. */
  version: number;
  /** The values as the form read them when opened: what counts as "unchanged". */
  openedValues: TallyValues;
  /** The values as typed now. */
  values: TallyValues;
  /** Why the values cannot be saved as typed (a box that is not a number), if so. */
  invalidMessage: string | undefined;
  enabled: boolean;
}

/**
 * Saves the draft a moment after each change, with the version last read (optimistic locking).
 * One save at a time: a change made while a save is under way is saved after it.
 */
export function useTallyAutosave({
  id,
  version,
  openedValues,
  values,
  invalidMessage,
  enabled,
}: AutosaveOptions) {
  const queryClient = useQueryClient();
  const { mutateAsync } = useSaveTally();
  const [status, setStatus] = useState<AutosaveStatus>({ kind: 'unchanged' });
  const versionRef = useRef(version);
  const savedJsonRef = useRef(JSON.stringify(openedValues));
  const latestRef = useRef(values);
  const inFlightRef = useRef<Promise<TallyDetail | null> | null>(null);
  const json = JSON.stringify(values);
  latestRef.current = values;
  const conflict = status.kind === 'conflict';

  const save = useCallback(async (): Promise<TallyDetail | null> => {
    while (inFlightRef.current) await inFlightRef.current;
    const sending = latestRef.current;
    const sendingJson = JSON.stringify(sending);
    const attempt = (async () => {
      setStatus({ kind: 'saving' });
      try {
        const saved = await mutateAsync({ id, version: versionRef.current, values: sending });
        versionRef.current = saved.version;
        savedJsonRef.current = sendingJson;
        setStatus({ kind: 'saved', at: new Date() });
        return saved;
      } catch (error) {
        const current = conflictingTally(error);
        setStatus(
          current ? { kind: 'conflict', current, mine: sending } : { kind: 'failed', error },
        );
        return null;
      }
    })();
    inFlightRef.current = attempt;
    try {
      return await attempt;
    } finally {
      inFlightRef.current = null;
    }
  }, [id, mutateAsync]);

  useEffect(() => {
    if (!enabled || conflict) return undefined;
    if (invalidMessage) {
      setStatus({ kind: 'invalid', message: invalidMessage });
      return undefined;
    }
    if (json === savedJsonRef.current) {
      setStatus((current) =>
        current.kind === 'invalid' || current.kind === 'waiting' ? { kind: 'unchanged' } : current,
      );
      return undefined;
    }
    setStatus({ kind: 'waiting' });
    const timer = setTimeout(() => void save(), AUTOSAVE_DELAY_MS);
    return () => clearTimeout(timer);
  }, [json, enabled, conflict, invalidMessage, save]);

  /** Saves now what is not saved yet (before submitting); null when it could not be saved. */
  const flush = useCallback(async (): Promise<{ version: number } | null> => {
    if (invalidMessage || conflict) return null;
    if (JSON.stringify(latestRef.current) === savedJsonRef.current && !inFlightRef.current) {
      return { version: versionRef.current };
    }
    const saved = await save();
    return saved ? { version: saved.version } : null;
  }, [conflict, invalidMessage, save]);

  /** After a conflict: carry on from the tally as it is now (the form loads `values`). */
  const takeCurrent = useCallback(
    (current: TallyDetail, values: TallyValues) => {
      versionRef.current = current.version;
      savedJsonRef.current = JSON.stringify(values);
      void refreshAfterTallyWrite(queryClient, current);
      setStatus({ kind: 'unchanged' });
    },
    [queryClient],
  );

  /** After a conflict: put what the person typed on top of the newer version, and save it. */
  const keepMine = useCallback(
    (current: TallyDetail) => {
      versionRef.current = current.version;
      void refreshAfterTallyWrite(queryClient, current);
      setStatus({ kind: 'waiting' });
      void save();
    },
    [queryClient, save],
  );

  return {
    status,
    flush,
    retry: save,
    takeCurrent,
    keepMine,
    version: () => versionRef.current,
  };
}
