import { makeStyles, Text, tokens } from '@fluentui/react-components';
import { PEOPLE_GROUP_LABELS, PEOPLE_GROUPS } from '@tallyloom/core';
import { useWatch, type Control } from 'react-hook-form';
import { SectionHeading } from '@/components/ui/section-heading';
import { formatCount } from '@/lib/format';
import { CountField } from './count-field';
import { useSectionStyles } from './form-styles';
import { wholeNumberProblem, type TallyForm } from './tally-form-model';

const useStyles = makeStyles({
  // Only a narrow window scrolls: from 560 px up the table shares out its column's width.
  scroller: { overflowX: 'auto' },
  table: {
    borderCollapse: 'collapse',
    tableLayout: 'fixed',
    width: '100%',
    minWidth: '560px',
  },
  agencyColumn: { width: '24%' },
  totalColumn: { width: '10%' },
  // Header cells inherit this: a wrapped group name lines up with the one-line ones.
  header: { verticalAlign: 'bottom' },
  head: {
    textAlign: 'end',
    fontWeight: tokens.fontWeightSemibold,
    padding: `${tokens.spacingVerticalXS} ${tokens.spacingHorizontalXS}`,
    // Long group names ("Disaster-affected") wrap instead of widening the column.
    overflowWrap: 'break-word',
  },
  rowHead: {
    textAlign: 'start',
    fontWeight: tokens.fontWeightRegular,
    padding: `${tokens.spacingVerticalXS} ${tokens.spacingHorizontalS}`,
    overflowWrap: 'break-word',
  },
  cell: { padding: `${tokens.spacingVerticalXXS} ${tokens.spacingHorizontalXS}` },
  // The box takes its cell's width, whatever the column gets.
  box: { width: '100%', minWidth: 0 },
  total: {
    textAlign: 'end',
    fontVariantNumeric: 'tabular-nums',
    whiteSpace: 'nowrap',
    padding: `${tokens.spacingVerticalXS} ${tokens.spacingHorizontalS}`,
  },
});

export interface PeopleServedSectionProps {
  control: Control<TallyForm>;
  agencies: Array<{ id: number; name: string }>;
}

/** People served: one row per partner agency, one column per group. */
export function PeopleServedSection({ control, agencies }: PeopleServedSectionProps) {
  const section = useSectionStyles();
  const styles = useStyles();
  const rows = useWatch({ control, name: 'peopleServed' });
  const nameOf = (id: number) =>
    agencies.find((agency) => agency.id === id)?.name ?? `Agency ${id}`;
  const rowTotal = (index: number) => {
    const counts = Object.values(rows[index]?.counts ?? {});
    return counts.every((typed) => !wholeNumberProblem(typed, ''))
      ? formatCount(counts.reduce((sum, typed) => sum + Number(typed), 0))
      : '—';
  };

  return (
    <section className={section.section} aria-labelledby="tally-people">
      <SectionHeading id="tally-people">People served</SectionHeading>
      {rows.length === 0 ? (
        <Text as="p" className={section.note}>
          The chapter serves no partner agencies yet; a network admin adds them under Network
          set-up.
        </Text>
      ) : (
        <div className={styles.scroller}>
          <table className={styles.table} aria-labelledby="tally-people">
            <colgroup>
              <col className={styles.agencyColumn} />
              {PEOPLE_GROUPS.map((group) => (
                <col key={group} />
              ))}
              <col className={styles.totalColumn} />
            </colgroup>
            <thead className={styles.header}>
              <tr>
                <th className={styles.rowHead} scope="col">
                  Partner agency
                </th>
                {PEOPLE_GROUPS.map((group) => (
                  <th key={group} className={styles.head} scope="col">
                    {PEOPLE_GROUP_LABELS[group]}
                  </th>
                ))}
                <th className={styles.head} scope="col">
                  Total
                </th>
              </tr>
            </thead>
            <tbody>
              {rows.map((row, index) => (
                <tr key={row.partnerAgencyId}>
                  <th className={styles.rowHead} scope="row">
                    {nameOf(row.partnerAgencyId)}
                  </th>
                  {PEOPLE_GROUPS.map((group) => (
                    <td key={group} className={styles.cell}>
                      <CountField
                        control={control}
                        name={`peopleServed.${index}.counts.${group}`}
                        label={undefined}
                        ariaLabel={`${PEOPLE_GROUP_LABELS[group]} served by ${nameOf(row.partnerAgencyId)}`}
                        className={styles.box}
                        validate={(typed) =>
                          wholeNumberProblem(
                            typed,
                            `${PEOPLE_GROUP_LABELS[group]} served by ${nameOf(row.partnerAgencyId)}`,
                          )
                        }
                      />
                    </td>
                  ))}
                  <td className={styles.total}>{rowTotal(index)}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      )}
    </section>
  );
}
