import { Button, Field, makeStyles, Select, tokens } from '@fluentui/react-components';
import {
  monthLabel,
  TALLY_STATE_LABELS,
  TALLY_STATES,
  type ChapterView,
  type MonthKey,
  type RegionView,
  type TallyState,
} from '@tallyloom/core';
import { RegionChapterFilters } from '@/components/ui/region-chapter-filters';

const useStyles = makeStyles({
  root: {
    display: 'flex',
    flexWrap: 'wrap',
    alignItems: 'flex-end',
    gap: tokens.spacingHorizontalM,
    marginBottom: tokens.spacingVerticalM,
  },
  select: { minWidth: '170px' },
});

/** 'all' shows every state; the queue opens on what waits for a decision. */
export type QueueStateFilter = TallyState | 'all';

export interface QueueFilterValues {
  state: QueueStateFilter;
  regionId: number | undefined;
  chapterId: number | undefined;
  /** 'YYYY-MM', or empty for any month. */
  month: MonthKey;
}

export const defaultQueueFilters: QueueFilterValues = {
  state: 'submitted',
  regionId: undefined,
  chapterId: undefined,
  month: '',
};

export function isFilteredBeyondDefault(values: QueueFilterValues): boolean {
  return (
    values.state !== defaultQueueFilters.state ||
    values.regionId !== undefined ||
    values.chapterId !== undefined ||
    values.month !== ''
  );
}

/** The pickers' choices; the API already limits regions and chapters to the person's scope. */
export interface QueueFilterOptions {
  regions: RegionView[];
  chapters: ChapterView[];
  /** Newest first. */
  months: MonthKey[];
  /** Coordinators see one region: the server scopes the queue, so the picker would be noise. */
  showRegion: boolean;
}

function isStateFilter(value: string): value is QueueStateFilter {
  return value === 'all' || (TALLY_STATES as readonly string[]).includes(value);
}

export interface QueueFiltersProps {
  values: QueueFilterValues;
  onChange: (values: QueueFilterValues) => void;
  options: QueueFilterOptions;
}

/** State, region, chapter and month of the tallies in the review queue. */
export function QueueFilters({ values, onChange, options }: QueueFiltersProps) {
  const styles = useStyles();
  // A month from a shared link may lie outside the recent ones listed: keep it choosable.
  const months =
    values.month && !options.months.includes(values.month)
      ? [values.month, ...options.months]
      : options.months;

  return (
    <div className={styles.root} role="search" aria-label="Filter tallies">
      <Field label="State" className={styles.select}>
        <Select
          value={values.state}
          onChange={(_event, data) => {
            if (isStateFilter(data.value)) onChange({ ...values, state: data.value });
          }}
        >
          {TALLY_STATES.map((state) => (
            <option key={state} value={state}>
              {TALLY_STATE_LABELS[state]}
            </option>
          ))}
          <option value="all">All states</option>
        </Select>
      </Field>
      <RegionChapterFilters
        value={{ regionId: values.regionId, chapterId: values.chapterId }}
        onChange={(place) => onChange({ ...values, ...place })}
        regions={options.regions}
        chapters={options.chapters}
        showRegion={options.showRegion}
        className={styles.select}
      />
      <Field label="Month" className={styles.select}>
        <Select
          value={values.month}
          onChange={(_event, data) => onChange({ ...values, month: data.value })}
        >
          <option value="">Any month</option>
          {months.map((month) => (
            <option key={month} value={month}>
              {monthLabel(month)}
            </option>
          ))}
        </Select>
      </Field>
      {isFilteredBeyondDefault(values) ? (
        <Button appearance="subtle" onClick={() => onChange(defaultQueueFilters)}>
          Reset filters
        </Button>
      ) : null}
    </div>
  );
}
