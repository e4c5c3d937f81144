import { Badge, makeStyles, ProgressBar, Text, tokens } from '@fluentui/react-components';
import { formatTolerableRate, formatUpperLimit, type AuditSampleView } from '@tallyloom/core';
import { FactList } from '@/components/ui/fact-list';
import { confidenceWords, progressWords } from './sample-words';

const useStyles = makeStyles({
  root: {
    display: 'flex',
    flexDirection: 'column',
    gap: tokens.spacingVerticalM,
    maxWidth: '72ch',
  },
  conclusion: {
    display: 'flex',
    gap: tokens.spacingHorizontalM,
    alignItems: 'flex-start',
    padding: tokens.spacingHorizontalM,
    borderRadius: tokens.borderRadiusMedium,
    backgroundColor: tokens.colorNeutralBackground2,
  },
  muted: { color: tokens.colorNeutralForeground2 },
  // A long verdict must not be squeezed by the sentence beside it.
  badge: { flexShrink: 0, whiteSpace: 'nowrap' },
});

/** Progress, deviations found, and once all is recorded the upper limit and the conclusion. */
export function SampleResult({ sample }: { sample: AuditSampleView }) {
  const styles = useStyles();
  const { worksheet, items, plan } = sample;
  const { confidence, tolerableRate } = plan.request;
  const evaluation = worksheet.evaluation;
  return (
    <div className={styles.root}>
      <ProgressBar
        value={items.length ? worksheet.examined / items.length : 0}
        thickness="large"
        aria-label="Items recorded"
      />
      <Text weight="semibold" aria-live="polite">
        {progressWords(worksheet, items.length)}
      </Text>
      <FactList
        rows={[
          ['Deviations found', String(worksheet.deviations)],
          ['Tolerable rate', formatTolerableRate(tolerableRate)],
          [
            `Upper deviation limit at ${confidenceWords(confidence)}`,
            evaluation
              ? `${formatUpperLimit(evaluation.upperDeviationLimit)} %`
              : 'Once every item is recorded',
          ],
          ...(evaluation ? ([['Method', evaluation.method]] as Array<[string, string]>) : []),
        ]}
      />
      {evaluation ? (
        <div className={styles.conclusion} role="status" aria-label="Conclusion">
          {evaluation.supportsReliance ? (
            <Badge appearance="filled" color="success" className={styles.badge}>
              Supports reliance
            </Badge>
          ) : (
            <Badge appearance="filled" color="danger" className={styles.badge}>
              Does not support reliance
            </Badge>
          )}
          <Text>{evaluation.text}</Text>
        </div>
      ) : (
        <Text className={styles.muted}>
          The conclusion appears when every sampled item is recorded as agreeing or as a deviation.
        </Text>
      )}
    </div>
  );
}
