import type { TallyDetail } from '@tallyloom/core';

export interface RevisionPair {
  left: number;
  right: number;
}

/**
 * The revisions to compare: those asked for when the tally has them; otherwise the latest on
 * the right and, on the left, the approved one it would replace, or else the one before it.
 */
export function chooseRevisions(
  tally: Pick<TallyDetail, 'revision' | 'approvedRevision' | 'revisions'>,
  asked: { left?: number; right?: number },
): RevisionPair {
  const known = new Set(tally.revisions.map((revision) => revision.revision));
  const right = asked.right !== undefined && known.has(asked.right) ? asked.right : tally.revision;
  if (asked.left !== undefined && known.has(asked.left)) return { left: asked.left, right };
  const earlier = [...known].filter((revision) => revision < right).sort((a, b) => b - a);
  const approved =
    tally.approvedRevision !== null && tally.approvedRevision !== right
      ? tally.approvedRevision
      : undefined;
  return { left: approved ?? earlier[0] ?? right, right };
}
