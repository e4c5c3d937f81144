import {
  Button,
  Checkbox,
  Field,
  Input,
  makeStyles,
  mergeClasses,
  Radio,
  RadioGroup,
  Select,
  Spinner,
  Text,
  tokens,
} from '@fluentui/react-components';
import {
  DomainError,
  sampleSize,
  type SamplePlanRequest,
  type SamplePopulationKind,
  type SampleSizeResult,
  type SamplingConfidence,
  type SnapshotScope,
} from '@tallyloom/core';
import { useMemo, useState, type FormEvent } from 'react';
import { useNavigate } from 'react-router-dom';
import { FormAlert } from '@/components/ui/form-alert';
import { paths } from '@/config/paths';
import { useChapters } from '@/features/network/api/get-chapters';
import { useRegions } from '@/features/network/api/get-regions';
import { formatCount } from '@/lib/format';
import { useDrawSample } from '../api/draw-sample';
import { useSamplePlan } from '../api/plan-sample';
import { recentQuarters } from './plan-period';
import { POPULATION_LABELS } from './sample-words';
import { serverProblems } from './server-problems';

const useStyles = makeStyles({
  form: {
    display: 'grid',
    gridTemplateColumns: 'repeat(auto-fill, minmax(220px, 1fr))',
    gap: tokens.spacingHorizontalL,
    alignItems: 'start',
    maxWidth: '960px',
  },
  wide: { gridColumn: '1 / -1' },
  size: {
    display: 'flex',
    flexDirection: 'column',
    gap: tokens.spacingVerticalXS,
    padding: tokens.spacingHorizontalM,
    borderLeft: `4px solid ${tokens.colorBrandStroke1}`,
    backgroundColor: tokens.colorNeutralBackground2,
    borderRadius: tokens.borderRadiusMedium,
  },
  muted: { color: tokens.colorNeutralForeground2 },
  actions: { display: 'flex', gap: tokens.spacingHorizontalM, alignItems: 'center' },
});

const CUSTOM = 'custom';

interface Draft {
  kind: SamplePopulationKind;
  scope: SnapshotScope;
  regionId: string;
  chapterId: string;
  /** A quarter key, or 'custom' for the two month fields. */
  period: string;
  from: string;
  to: string;
  confidence: SamplingConfidence;
  /** Percent, as typed. */
  tolerablePercent: string;
  expectedDeviations: string;
  finitePopulationAdjustment: boolean;
  seed: string;
}

type Problems = Partial<
  Record<'scope' | 'period' | 'tolerableRate' | 'expectedDeviations', string>
>;

/** The draft as a request, or the problems that keep it from being one. */
function requestOf(
  draft: Draft,
  quarters: ReturnType<typeof recentQuarters>,
): { request: SamplePlanRequest | null; problems: Problems } {
  const problems: Problems = {};
  let scopeId: number | undefined;
  if (draft.scope !== 'network') {
    const raw = draft.scope === 'region' ? draft.regionId : draft.chapterId;
    scopeId = /^\d+$/.test(raw) ? Number(raw) : undefined;
    if (scopeId === undefined) problems.scope = `Choose the ${draft.scope}.`;
  }
  const quarter = quarters.find((each) => each.key === draft.period);
  const from = quarter ? quarter.from : draft.from;
  const to = quarter ? quarter.to : draft.to;
  if (!/^\d{4}-\d{2}$/.test(from) || !/^\d{4}-\d{2}$/.test(to)) {
    problems.period = 'Choose the first and last month.';
  } else if (from > to) {
    problems.period = 'The first month must not be after the last.';
  }
  const percent = Number(draft.tolerablePercent);
  if (draft.tolerablePercent.trim() === '' || !Number.isFinite(percent)) {
    problems.tolerableRate = 'Enter the tolerable deviation rate in percent, e.g. 5.';
  }
  const expected = Number(draft.expectedDeviations);
  if (!/^\d+$/.test(draft.expectedDeviations.trim())) {
    problems.expectedDeviations = 'Enter a whole number of deviations, 0 or more.';
  }
  if (Object.keys(problems).length) return { request: null, problems };
  return {
    request: {
      population: {
        kind: draft.kind,
        scope: draft.scope,
        ...(scopeId === undefined ? {} : { scopeId }),
        from,
        to,
      },
      confidence: draft.confidence,
      // Two decimals of a percent at most: 2.5 % → 0.025 without floating-point residue.
      tolerableRate: Math.round(percent * 100) / 10_000,
      expectedDeviations: expected,
      finitePopulationAdjustment: draft.finitePopulationAdjustment,
    },
    problems,
  };
}

/** Core's own binomial n for the parameters, live; or the rule the parameters break. */
function liveSize(request: SamplePlanRequest | null): {
  result: SampleSizeResult | null;
  problem: { field: string; message: string } | null;
} {
  if (!request) return { result: null, problem: null };
  try {
    return {
      result: sampleSize({
        confidence: request.confidence,
        tolerableRate: request.tolerableRate,
        expectedDeviations: request.expectedDeviations,
      }),
      problem: null,
    };
  } catch (error) {
    if (error instanceof DomainError) {
      return { result: null, problem: { field: error.argument, message: error.message } };
    }
    throw error;
  }
}

/** Plans a sample with the size shown as the parameters change, then draws it. */
export function PlanSampleForm({ today }: { today?: string }) {
  const styles = useStyles();
  const navigate = useNavigate();
  const quarters = useMemo(() => recentQuarters(today), [today]);
  const regions = useRegions();
  const chapters = useChapters();
  const [draft, setDraft] = useState<Draft>({
    kind: 'parcel-receipts',
    scope: 'network',
    regionId: '',
    chapterId: '',
    period: quarters[0].key,
    from: quarters[0].from,
    to: quarters[0].to,
    confidence: 0.95,
    tolerablePercent: '5',
    expectedDeviations: '0',
    finitePopulationAdjustment: false,
    seed: '',
  });
  const change = (patch: Partial<Draft>) => setDraft((current) => ({ ...current, ...patch }));

  const { request, problems } = requestOf(draft, quarters);
  const live = liveSize(request);
  // The server counts the population only for a plan core accepts.
  const plan = useSamplePlan(live.problem ? null : request);
  const draw = useDrawSample();

  const fieldProblem = (field: keyof Problems) =>
    problems[field] ?? (live.problem?.field === field ? live.problem.message : undefined);

  const submit = (event: FormEvent) => {
    event.preventDefault();
    if (!request || live.problem) return;
    draw.mutate(
      { plan: request, ...(draft.seed.trim() ? { seed: draft.seed.trim() } : {}) },
      { onSuccess: (sample) => void navigate(paths.sample.getHref(sample.id)) },
    );
  };

  const sizeBox = () => {
    if (!live.result) {
      return (
        <Text className={styles.muted}>
          {live.problem ? live.problem.message : 'Complete the plan to see the sample size.'}
        </Text>
      );
    }
    const view = plan.data;
    return (
      <>
        <Text weight="semibold" aria-live="polite">
          Sample size: {formatCount(live.result.sampleSize)} items
        </Text>
        <Text size={200} className={styles.muted}>
          {live.result.method}
        </Text>
        {plan.isFetching && !view ? <Spinner size="tiny" label="Counting the population…" /> : null}
        {plan.isError ? (
          <Text size={200}>{serverProblems(plan.error).join(' ')}</Text>
        ) : view ? (
          <>
            <Text>
              Population: {formatCount(view.population)}{' '}
              {POPULATION_LABELS[draft.kind].toLowerCase()}
            </Text>
            {view.finitePopulationAdjustment ? (
              <Text size={200} className={styles.muted}>
                Finite-population adjustment:{' '}
                {formatCount(view.finitePopulationAdjustment.sampleSize)} items (
                {view.finitePopulationAdjustment.method})
              </Text>
            ) : null}
            <Text weight="semibold">
              {view.examineWholePopulation
                ? `Items to draw: ${formatCount(view.itemsToDraw)}, every item of the population`
                : `Items to draw: ${formatCount(view.itemsToDraw)}`}
            </Text>
          </>
        ) : null}
      </>
    );
  };

  return (
    <form className={styles.form} onSubmit={submit} aria-label="Plan a sample" noValidate>
      <Field label="Population" className={styles.wide}>
        <RadioGroup
          layout="horizontal"
          value={draft.kind}
          onChange={(_event, data) => change({ kind: data.value as SamplePopulationKind })}
        >
          <Radio value="parcel-receipts" label={POPULATION_LABELS['parcel-receipts']} />
          <Radio value="tallies" label={POPULATION_LABELS.tallies} />
        </RadioGroup>
      </Field>

      <Field label="Scope">
        <Select
          value={draft.scope}
          onChange={(_event, data) => change({ scope: data.value as SnapshotScope })}
        >
          <option value="network">Whole network</option>
          <option value="region">One region</option>
          <option value="chapter">One chapter</option>
        </Select>
      </Field>
      {draft.scope === 'region' ? (
        <Field label="Region" required validationMessage={fieldProblem('scope')}>
          <Select
            value={draft.regionId}
            onChange={(_event, data) => change({ regionId: data.value })}
          >
            <option value="">{regions.isPending ? 'Loading regions…' : 'Choose a region'}</option>
            {(regions.data ?? []).map((region) => (
              <option key={region.id} value={region.id}>
                {region.name}
              </option>
            ))}
          </Select>
        </Field>
      ) : null}
      {draft.scope === 'chapter' ? (
        <Field label="Chapter" required validationMessage={fieldProblem('scope')}>
          <Select
            value={draft.chapterId}
            onChange={(_event, data) => change({ chapterId: data.value })}
          >
            <option value="">
              {chapters.isPending ? 'Loading chapters…' : 'Choose a chapter'}
            </option>
            {(chapters.data ?? []).map((chapter) => (
              <option key={chapter.id} value={chapter.id}>
                {chapter.name}
              </option>
            ))}
          </Select>
        </Field>
      ) : null}

      <Field
        label="Period"
        validationMessage={draft.period === CUSTOM ? undefined : fieldProblem('period')}
      >
        <Select value={draft.period} onChange={(_event, data) => change({ period: data.value })}>
          {quarters.map((quarter) => (
            <option key={quarter.key} value={quarter.key}>
              {quarter.label}
            </option>
          ))}
          <option value={CUSTOM}>Other months…</option>
        </Select>
      </Field>
      {draft.period === CUSTOM ? (
        <>
          <Field label="First month" validationMessage={fieldProblem('period')}>
            <Input
              type="month"
              value={draft.from}
              onChange={(_event, data) => change({ from: data.value })}
            />
          </Field>
          <Field label="Last month">
            <Input
              type="month"
              value={draft.to}
              onChange={(_event, data) => change({ to: data.value })}
            />
          </Field>
        </>
      ) : null}

      <Field label="Confidence">
        <RadioGroup
          layout="horizontal"
          value={String(draft.confidence)}
          onChange={(_event, data) => change({ confidence: data.value === '0.9' ? 0.9 : 0.95 })}
        >
          <Radio value="0.9" label="90 %" />
          <Radio value="0.95" label="95 %" />
        </RadioGroup>
      </Field>
      <Field
        label="Tolerable deviation rate (%)"
        hint="Above 0 and at most 50."
        validationMessage={fieldProblem('tolerableRate')}
      >
        <Input
          type="number"
          inputMode="decimal"
          min={0}
          max={50}
          step={0.5}
          value={draft.tolerablePercent}
          onChange={(_event, data) => change({ tolerablePercent: data.value })}
        />
      </Field>
      <Field
        label="Expected deviations"
        hint="How many deviations you expect to find in the sample."
        validationMessage={fieldProblem('expectedDeviations')}
      >
        <Input
          type="number"
          inputMode="numeric"
          min={0}
          step={1}
          value={draft.expectedDeviations}
          onChange={(_event, data) => change({ expectedDeviations: data.value })}
        />
      </Field>
      <Field
        className={styles.wide}
        hint="Draws without replacement from the counted population (hypergeometric), which can need fewer items than the binomial size."
      >
        <Checkbox
          checked={draft.finitePopulationAdjustment}
          onChange={(_event, data) => change({ finitePopulationAdjustment: data.checked === true })}
          label="Finite-population adjustment (hypergeometric)"
        />
      </Field>

      <div className={mergeClasses(styles.size, styles.wide)} role="group" aria-label="Sample size">
        {sizeBox()}
      </div>

      <Field
        label="Seed (optional)"
        hint="Leave empty for a fresh seed; enter an earlier sample's seed to re-draw it."
      >
        <Input value={draft.seed} onChange={(_event, data) => change({ seed: data.value })} />
      </Field>

      <div className={styles.wide}>
        <FormAlert messages={draw.isError ? serverProblems(draw.error) : []} />
      </div>
      <div className={mergeClasses(styles.actions, styles.wide)}>
        <Button
          type="submit"
          appearance="primary"
          disabledFocusable={!request || !!live.problem || draw.isPending || plan.isError}
        >
          {draw.isPending ? 'Drawing…' : 'Draw the sample'}
        </Button>
        {request && live.result ? (
          <Text size={200} className={styles.muted}>
            The seed is chosen and shown when the sample is drawn, so anyone can re-draw it.
          </Text>
        ) : null}
      </div>
    </form>
  );
}
