import { makeStyles, tokens } from '@fluentui/react-components';
import { can, formatTolerableRate, type AuditSampleView } from '@tallyloom/core';
import { ErrorState } from '@/components/ui/error-state';
import { FactList } from '@/components/ui/fact-list';
import { LoadingState } from '@/components/ui/loading-state';
import { SectionHeading } from '@/components/ui/section-heading';
import { useChapters } from '@/features/network/api/get-chapters';
import { useRegions } from '@/features/network/api/get-regions';
import { formatCount, formatDateTime } from '@/lib/format';
import { useSessionUser } from '@/lib/session/use-session';
import { useSample } from '../api/get-sample';
import { SampleResult } from './sample-result';
import { confidenceWords, monthsWords, POPULATION_LABELS, scopeWords } from './sample-words';
import { WorksheetItems } from './worksheet-items';

const useStyles = makeStyles({
  root: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalXL },
  seed: { fontFamily: tokens.fontFamilyMonospace, userSelect: 'all' },
});

function PlanFacts({ sample }: { sample: AuditSampleView }) {
  const styles = useStyles();
  const regions = useRegions();
  const chapters = useChapters();
  const { request } = sample.plan;
  const { population } = request;
  return (
    <FactList
      rows={[
        ['Seed', <span className={styles.seed}>{sample.seed}</span>],
        ['Generator', sample.prng],
        ['Population', POPULATION_LABELS[population.kind]],
        ['Scope', scopeWords(population, regions.data, chapters.data)],
        ['Months', monthsWords(population.from, population.to)],
        ['Items in the population', formatCount(sample.plan.population)],
        ['Confidence', confidenceWords(request.confidence)],
        ['Tolerable rate', formatTolerableRate(request.tolerableRate)],
        ['Expected deviations', String(request.expectedDeviations)],
        ['Sample size', `${formatCount(sample.plan.sampleSize)} (${sample.plan.method})`],
        [
          'Finite-population adjustment',
          sample.plan.finitePopulationAdjustment
            ? `${formatCount(sample.plan.finitePopulationAdjustment.sampleSize)} (${sample.plan.finitePopulationAdjustment.method})`
            : 'Not used',
        ],
        ['Items drawn', formatCount(sample.items.length)],
        ['Drawn', `${formatDateTime(sample.drawnAt)} by ${sample.drawnBy}`],
      ]}
    />
  );
}

/** A drawn sample's worksheet: its seed and plan, the items to check, and the result. */
export function SampleWorksheet({ id }: { id: number }) {
  const styles = useStyles();
  const sample = useSample(id);
  const user = useSessionUser();
  if (sample.isPending) return <LoadingState label="Loading the sample…" />;
  if (sample.isError) {
    return (
      <ErrorState
        title="The sample could not be loaded"
        error={sample.error}
        onRetry={() => void sample.refetch()}
        retrying={sample.isFetching}
      />
    );
  }
  return (
    <div className={styles.root}>
      <section aria-labelledby="plan-facts-heading">
        <SectionHeading id="plan-facts-heading">Seed and plan</SectionHeading>
        <PlanFacts sample={sample.data} />
      </section>
      <section aria-labelledby="result-heading">
        <SectionHeading id="result-heading">Result</SectionHeading>
        <SampleResult sample={sample.data} />
      </section>
      <section aria-labelledby="worksheet-heading">
        <SectionHeading id="worksheet-heading">Sampled items</SectionHeading>
        <WorksheetItems sample={sample.data} mayRecord={can(user?.role, 'audit.sample')} />
      </section>
    </div>
  );
}
