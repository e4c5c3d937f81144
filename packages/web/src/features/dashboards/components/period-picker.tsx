import { Field, makeStyles, Select, tokens } from '@fluentui/react-components';
import { PERIOD_KINDS, type DashboardParams, type PeriodKind } from '@tallyloom/core';
import { useMemo } from 'react';
import { todayIsoDate } from '@/lib/format';
import {
  PERIOD_KIND_LABELS,
  recentFiscalYearOptions,
  recentMonthOptions,
  recentQuarterOptions,
  type PeriodOption,
} from './period-options';

const useStyles = makeStyles({
  root: {
    display: 'flex',
    flexWrap: 'wrap',
    gap: tokens.spacingHorizontalM,
    alignItems: 'flex-end',
    marginBottom: tokens.spacingVerticalL,
  },
  field: { minWidth: '160px' },
});

const KINDS = [...PERIOD_KINDS, 'custom'] as const;
type Kind = PeriodKind | 'custom';

function isKind(value: string): value is Kind {
  return (KINDS as readonly string[]).includes(value);
}

/** Keeps a period from a link selectable even when it is older than the list reaches. */
function withCurrent(options: PeriodOption[], key: string | undefined): PeriodOption[] {
  if (!key || options.some((option) => option.key === key)) return options;
  return [...options, { key, label: key }];
}

export interface PeriodPickerProps {
  value: DashboardParams;
  onChange: (next: DashboardParams) => void;
  today?: string;
}

/** Month, quarter, fiscal year or a custom range of months; the dashboard keeps it in the URL. */
export function PeriodPicker({ value, onChange, today = todayIsoDate() }: PeriodPickerProps) {
  const styles = useStyles();
  const options = useMemo(
    () => ({
      month: recentMonthOptions(today),
      quarter: recentQuarterOptions(today),
      fiscal_year: recentFiscalYearOptions(today),
    }),
    [today],
  );

  // A newly chosen kind starts on its latest complete period (this quarter and fiscal year
  // are still under way, but a coordinator asks about them most).
  const startOf = (kind: Kind): DashboardParams => {
    if (kind === 'custom') {
      return {
        periodKind: 'custom',
        from: options.month[6]?.key ?? '',
        to: options.month[1]?.key ?? '',
      };
    }
    const list = options[kind];
    const start = kind === 'month' ? list[1] : kind === 'fiscal_year' ? list[1] : list[0];
    return { periodKind: kind, period: start?.key };
  };

  const months = options.month;
  return (
    <div className={styles.root} role="group" aria-label="Period">
      <Field label="Period" className={styles.field}>
        <Select
          value={value.periodKind}
          onChange={(_event, data) => {
            if (isKind(data.value)) onChange(startOf(data.value));
          }}
        >
          {KINDS.map((kind) => (
            <option key={kind} value={kind}>
              {PERIOD_KIND_LABELS[kind]}
            </option>
          ))}
        </Select>
      </Field>
      {value.periodKind === 'custom' ? (
        <>
          <Field label="From" className={styles.field}>
            <Select
              value={value.from ?? ''}
              onChange={(_event, data) => {
                // Keep the range the right way round: moving "from" past "to" moves both.
                const to = value.to && value.to < data.value ? data.value : value.to;
                onChange({ periodKind: 'custom', from: data.value, to });
              }}
            >
              {withCurrent(months, value.from).map((month) => (
                <option key={month.key} value={month.key}>
                  {month.label}
                </option>
              ))}
            </Select>
          </Field>
          <Field label="To" className={styles.field}>
            <Select
              value={value.to ?? ''}
              onChange={(_event, data) => {
                const from = value.from && value.from > data.value ? data.value : value.from;
                onChange({ periodKind: 'custom', from, to: data.value });
              }}
            >
              {withCurrent(months, value.to).map((month) => (
                <option key={month.key} value={month.key}>
                  {month.label}
                </option>
              ))}
            </Select>
          </Field>
        </>
      ) : (
        <Field label={PERIOD_KIND_LABELS[value.periodKind]} className={styles.field}>
          <Select
            value={value.period ?? ''}
            onChange={(_event, data) =>
              onChange({ periodKind: value.periodKind, period: data.value })
            }
          >
            {withCurrent(options[value.periodKind], value.period).map((option) => (
              <option key={option.key} value={option.key}>
                {option.label}
              </option>
            ))}
          </Select>
        </Field>
      )}
    </div>
  );
}
