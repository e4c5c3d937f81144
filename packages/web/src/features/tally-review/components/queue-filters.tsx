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

function idOf(value: string): number | undefined {
  return /^\d+$/.test(value) ? Number(value) : undefined;
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
  const chapters =
    values.regionId === undefined
      ? options.chapters
      : options.chapters.filter((chapter) => chapter.regionId === values.regionId);
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
      {options.showRegion && options.regions.length > 1 ? (
        <Field label="Region" className={styles.select}>
          <Select
            value={values.regionId === undefined ? '' : String(values.regionId)}
            onChange={(_event, data) => {
              const regionId = idOf(data.value);
              const chapter = options.chapters.find((c) => c.id === values.chapterId);
              // A chapter of another region would empty the queue for no visible reason.
              const keepChapter = regionId === undefined || chapter?.regionId === regionId;
              onChange({
                ...values,
                regionId,
                chapterId: keepChapter ? values.chapterId : undefined,
              });
            }}
          >
            <option value="">All regions</option>
            {options.regions.map((region) => (
              <option key={region.id} value={region.id}>
                {region.name}
              </option>
            ))}
          </Select>
        </Field>
      ) : null}
      {options.chapters.length > 1 ? (
        <Field label="Chapter" className={styles.select}>
          <Select
            value={values.chapterId === undefined ? '' : String(values.chapterId)}
            onChange={(_event, data) => onChange({ ...values, chapterId: idOf(data.value) })}
          >
            <option value="">All chapters</option>
            {chapters.map((chapter) => (
              <option key={chapter.id} value={chapter.id}>
                {chapter.name}
              </option>
            ))}
          </Select>
        </Field>
      ) : null}
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
