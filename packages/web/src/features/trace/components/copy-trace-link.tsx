import { Button, Input, makeStyles, Text, tokens } from '@fluentui/react-components';
import { Link20Regular } from '@fluentui/react-icons';
import type { TraceMeasure } from '@tallyloom/core';
import { useState } from 'react';
import { paths } from '@/config/paths';

const useStyles = makeStyles({
  root: { display: 'flex', flexWrap: 'wrap', alignItems: 'center', gap: tokens.spacingHorizontalS },
  url: { minWidth: '320px', flexGrow: 1, maxWidth: '640px' },
  status: { color: tokens.colorNeutralForeground2 },
});

/** The trace's full, stable address: what a finding or an e-mail should carry. */
export function traceUrl(
  reference: string,
  measure: TraceMeasure | null,
  origin = window.location.origin,
): string {
  return `${origin}${paths.trace.getHref(reference, measure ?? undefined)}`;
}

/** Shows the stable address and copies it; says so, or asks to copy it by hand. */
export function CopyTraceLink({
  reference,
  measure,
}: {
  reference: string;
  measure: TraceMeasure | null;
}) {
  const styles = useStyles();
  const [status, setStatus] = useState('');
  const url = traceUrl(reference, measure);
  const copy = async () => {
    try {
      await navigator.clipboard.writeText(url);
      setStatus('Link copied.');
    } catch {
      // No clipboard (an insecure page, or refused): the address is in the field to copy.
      setStatus('Copy the address from the field.');
    }
  };
  return (
    <div className={styles.root}>
      <Input
        className={styles.url}
        value={url}
        readOnly
        aria-label="Stable address of this trace"
        onFocus={(event) => event.currentTarget.select()}
      />
      <Button icon={<Link20Regular />} onClick={() => void copy()}>
        Copy link
      </Button>
      <Text size={200} className={styles.status} aria-live="polite">
        {status}
      </Text>
    </div>
  );
}
