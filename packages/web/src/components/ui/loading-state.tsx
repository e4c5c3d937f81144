import { makeStyles, Spinner, tokens } from '@fluentui/react-components';

const useStyles = makeStyles({
  root: {
    display: 'flex',
    justifyContent: 'flex-start',
    padding: `${tokens.spacingVerticalL} ${tokens.spacingHorizontalS}`,
  },
});

/** A labelled spinner; the label says what is loading, not just that something is. */
export function LoadingState({ label }: { label: string }) {
  const styles = useStyles();
  return (
    <div className={styles.root} aria-live="polite">
      <Spinner size="small" labelPosition="after" label={label} />
    </div>
  );
}
