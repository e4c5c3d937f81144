import {
  Button,
  Checkbox,
  Field,
  Input,
  makeStyles,
  Select,
  tokens,
} from '@fluentui/react-components';
import type { CampaignView, ChapterView, RegionView } from '@tallyloom/core';
import { RegionChapterFilters } from '@/components/ui/region-chapter-filters';

const useStyles = makeStyles({
  root: {
    display: 'flex',
    flexWrap: 'wrap',
    alignItems: 'flex-end',
    gap: tokens.spacingHorizontalM,
    marginBottom: tokens.spacingVerticalM,
  },
  date: { width: '160px' },
  select: { minWidth: '180px' },
  checkbox: { paddingBottom: tokens.spacingVerticalXXS },
});

export interface ReceiptFilterValues {
  /** YYYY-MM-DD, received on or after. */
  from: string;
  /** YYYY-MM-DD, received on or before. */
  to: string;
  regionId: number | undefined;
  chapterId: number | undefined;
  campaignId: number | undefined;
  /** Only parcels with at least one scan. */
  hasScan: boolean;
}

export const noReceiptFilters: ReceiptFilterValues = {
  from: '',
  to: '',
  regionId: undefined,
  chapterId: undefined,
  campaignId: undefined,
  hasScan: false,
};

export function isFiltered(values: ReceiptFilterValues): boolean {
  return (
    !!values.from ||
    !!values.to ||
    values.regionId !== undefined ||
    values.chapterId !== undefined ||
    values.campaignId !== undefined ||
    values.hasScan
  );
}

/** The pickers' choices; the API already limits them to the person's scope. */
export interface ReceiptFilterOptions {
  regions: RegionView[];
  chapters: ChapterView[];
  campaigns: CampaignView[];
}

function idOf(value: string): number | undefined {
  return /^\d+$/.test(value) ? Number(value) : undefined;
}

export interface ReceiptFiltersProps {
  values: ReceiptFilterValues;
  onChange: (values: ReceiptFilterValues) => void;
  options: ReceiptFilterOptions;
}

/** Received between two dates, region and chapter, campaign, and whether a scan is attached. */
export function ReceiptFilters({ values, onChange, options }: ReceiptFiltersProps) {
  const styles = useStyles();

  return (
    <div className={styles.root} role="search" aria-label="Filter parcels">
      <Field label="Received from" className={styles.date}>
        <Input
          type="date"
          value={values.from}
          max={values.to || undefined}
          onChange={(_event, data) => onChange({ ...values, from: data.value })}
        />
      </Field>
      <Field label="Received to" className={styles.date}>
        <Input
          type="date"
          value={values.to}
          min={values.from || undefined}
          onChange={(_event, data) => onChange({ ...values, to: data.value })}
        />
      </Field>
      <RegionChapterFilters
        value={{ regionId: values.regionId, chapterId: values.chapterId }}
        onChange={(place) => onChange({ ...values, ...place })}
        regions={options.regions}
        chapters={options.chapters}
        className={styles.select}
      />
      <Field label="Campaign" className={styles.select}>
        <Select
          value={values.campaignId === undefined ? '' : String(values.campaignId)}
          onChange={(_event, data) => onChange({ ...values, campaignId: idOf(data.value) })}
        >
          <option value="">All campaigns</option>
          {options.campaigns.map((campaign) => (
            <option key={campaign.id} value={campaign.id}>
              {campaign.code} · {campaign.name}
            </option>
          ))}
        </Select>
      </Field>
      <Checkbox
        className={styles.checkbox}
        label="Only with a scan"
        checked={values.hasScan}
        onChange={(_event, data) => onChange({ ...values, hasScan: data.checked === true })}
      />
      {isFiltered(values) ? (
        <Button appearance="subtle" onClick={() => onChange(noReceiptFilters)}>
          Clear filters
        </Button>
      ) : null}
    </div>
  );
}
