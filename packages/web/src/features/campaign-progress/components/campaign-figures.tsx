import { Card, Field, makeStyles, ProgressBar, Text, tokens } from '@fluentui/react-components';
import type { PublicCampaignProgress } from '@tallyloom/core';
import { useId, type ReactNode } from 'react';
import { formatCount, formatDate } from '@/lib/format';
import { formatPace, formatShare, neededWords } from './progress-words';

const useStyles = makeStyles({
  goal: { marginBottom: tokens.spacingVerticalL, maxWidth: '640px' },
  grid: {
    display: 'grid',
    gridTemplateColumns: 'repeat(auto-fill, minmax(180px, 1fr))',
    gap: tokens.spacingHorizontalM,
    margin: 0,
    padding: 0,
    listStyleType: 'none',
  },
  label: { color: tokens.colorNeutralForeground2 },
  value: { fontVariantNumeric: 'tabular-nums' },
});

function Figure({ label, value, note }: { label: string; value: string; note?: ReactNode }) {
  const styles = useStyles();
  const id = useId();
  // Named by its visible label, so screen readers still read the figure inside.
  return (
    <li aria-labelledby={id}>
      <Card>
        <Text id={id} className={styles.label}>
          {label}
        </Text>
        <Text size={600} weight="semibold" className={styles.value}>
          {value}
        </Text>
        {note ? <Text size={200}>{note}</Text> : null}
      </Card>
    </li>
  );
}

export interface CampaignFiguresProps {
  progress: PublicCampaignProgress;
  /** Panels whose month is not approved yet: shown beside, never counted (signed-in view only). */
  pendingPanels?: number;
}

/** Credited panels against the goal, and the paces: counts only, so the public page shows it too. */
export function CampaignFigures({ progress, pendingPanels }: CampaignFiguresProps) {
  const styles = useStyles();
  const credited = `${formatCount(progress.creditedPanels)} of ${formatCount(progress.goalPanels)} panels credited`;
  return (
    <>
      <Field
        label="Credited panels against the goal"
        hint={`${credited} (${formatShare(progress.shareDone)})`}
        className={styles.goal}
      >
        <ProgressBar
          value={Math.min(progress.shareDone, 1)}
          max={1}
          thickness="large"
          aria-valuetext={`${credited}, ${formatShare(progress.shareDone)}`}
        />
      </Field>
      <ul className={styles.grid} aria-label="Campaign figures">
        <Figure label="Credited panels" value={formatCount(progress.creditedPanels)} />
        <Figure label="Goal" value={formatCount(progress.goalPanels)} />
        <Figure label="Share done" value={formatShare(progress.shareDone)} />
        <Figure label="Pace so far" value={`${formatPace(progress.pacePerWeek)} a week`} />
        <Figure label="Pace still needed" value={neededWords(progress)} />
        <Figure
          label="Weeks left"
          value={formatCount(progress.weeksLeft)}
          note={`Ends ${formatDate(progress.endsOn)}`}
        />
        {pendingPanels !== undefined ? (
          <Figure
            label="Pending panels"
            value={formatCount(pendingPanels)}
            note="In months not approved yet: not counted above."
          />
        ) : null}
      </ul>
    </>
  );
}
