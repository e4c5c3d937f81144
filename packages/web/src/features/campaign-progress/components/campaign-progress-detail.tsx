import { makeStyles, Text, tokens } from '@fluentui/react-components';
import type { CampaignProgressView } from '@tallyloom/core';
import { SectionHeading } from '@/components/ui/section-heading';
import { formatDate, formatDateTime } from '@/lib/format';
import { CampaignFigures } from './campaign-figures';
import { ProgressChart } from './progress-chart';
import { projectionWords } from './progress-words';
import { ShareProgressButton } from './share-progress-button';

const useStyles = makeStyles({
  section: { marginTop: tokens.spacingVerticalXXL },
  note: { margin: 0, color: tokens.colorNeutralForeground2 },
  share: { marginBottom: tokens.spacingVerticalL },
});

/** One campaign: where it stands against its goal, its pace, and where it is heading. */
export function CampaignProgressDetail({ progress }: { progress: CampaignProgressView }) {
  const styles = useStyles();
  return (
    <>
      <div className={styles.share}>
        <ShareProgressButton code={progress.code} />
      </div>
      <Text as="p" className={styles.note}>
        {formatDate(progress.startsOn)} to {formatDate(progress.endsOn)}, week{' '}
        {progress.weeksElapsed} of {progress.weeksTotal}. As of {formatDateTime(progress.asOf)}.
        Figures for funders are estimates built from volunteer reports.
      </Text>
      <section aria-labelledby="campaign-figures" className={styles.section}>
        <SectionHeading id="campaign-figures">Progress</SectionHeading>
        <CampaignFigures progress={progress} pendingPanels={progress.pendingPanels} />
      </section>
      <section aria-labelledby="campaign-projection" className={styles.section}>
        <SectionHeading id="campaign-projection">Projection</SectionHeading>
        <Text as="p">{projectionWords(progress)}</Text>
        <ProgressChart {...progress} />
      </section>
    </>
  );
}
