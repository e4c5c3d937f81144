import { Button, makeStyles, Text, tokens } from '@fluentui/react-components';
import { Share20Regular } from '@fluentui/react-icons';
import { useState } from 'react';
import { paths } from '@/config/paths';

const useStyles = makeStyles({
  root: { display: 'flex', alignItems: 'center', gap: tokens.spacingHorizontalS },
  status: { color: tokens.colorNeutralForeground2 },
});

/** The public page's full address, for funders and volunteers without an account. */
export function publicProgressUrl(code: string, origin = window.location.origin): string {
  return `${origin}${paths.publicProgress.getHref(code)}`;
}

/** Copies the read-only progress page's address; says so, or shows it to copy by hand. */
export function ShareProgressButton({ code }: { code: string }) {
  const styles = useStyles();
  const [status, setStatus] = useState<string>('');
  const url = publicProgressUrl(code);
  const copy = async () => {
    try {
      await navigator.clipboard.writeText(url);
      setStatus('Link copied. Anyone with it sees the counts, without signing in.');
    } catch {
      // No clipboard (an insecure page, or refused): the address is still there to copy.
      setStatus(`Copy this link: ${url}`);
    }
  };
  return (
    <div className={styles.root}>
      <Button icon={<Share20Regular />} onClick={() => void copy()}>
        Share progress page
      </Button>
      <Text size={200} className={styles.status} aria-live="polite">
        {status}
      </Text>
    </div>
  );
}
