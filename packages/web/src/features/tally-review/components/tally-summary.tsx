import { makeStyles, Text, tokens } from '@fluentui/react-components';
import type { TallyValues } from '@tallyloom/core';
import type { ReactNode } from 'react';
import { FactList } from '@/components/ui/fact-list';
import { SectionHeading } from '@/components/ui/section-heading';
import { formatFigure } from './figures';
import {
  TALLY_SECTION_LABELS,
  tallyFields,
  type TallyField,
  type TallyNames,
  type TallySection,
} from './tally-fields';

const useStyles = makeStyles({
  columns: {
    display: 'grid',
    gridTemplateColumns: 'repeat(auto-fit, minmax(300px, 1fr))',
    gap: `${tokens.spacingVerticalL} ${tokens.spacingHorizontalXXL}`,
    alignItems: 'start',
  },
  section: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalXS },
  number: { fontVariantNumeric: 'tabular-nums' },
  text: { whiteSpace: 'pre-wrap' },
  none: { margin: 0, color: tokens.colorNeutralForeground2 },
});

const SECTIONS: TallySection[] = ['panels', 'blankets', 'peopleServed', 'other'];

// Optional text that is left out when empty; the rest says "None" so a blank is never ambiguous.
const OMIT_WHEN_EMPTY = new Set(['receiptsDifferenceReason']);

export interface TallySummaryProps {
  values: TallyValues;
  names: TallyNames;
  /** Prefix for the section headings' ids, so two summaries on a page do not clash. */
  idPrefix: string;
}

/** Every figure of a tally, read-only and compact, section by section. */
export function TallySummary({ values, names, idPrefix }: TallySummaryProps) {
  const styles = useStyles();
  const fields = tallyFields(values, names);
  const show = (field: TallyField): ReactNode =>
    field.kind === 'count' && typeof field.value === 'number' ? (
      <span className={styles.number}>{formatFigure(field.value)}</span>
    ) : (
      <span className={styles.text}>{field.value ?? 'None'}</span>
    );

  return (
    <div className={styles.columns}>
      {SECTIONS.map((section) => {
        const rows = fields.filter(
          (field) =>
            field.section === section && !(OMIT_WHEN_EMPTY.has(field.field) && !field.value),
        );
        const headingId = `${idPrefix}-${section}`;
        return (
          <section key={section} aria-labelledby={headingId} className={styles.section}>
            <SectionHeading id={headingId}>{TALLY_SECTION_LABELS[section]}</SectionHeading>
            {rows.length > 0 ? (
              <FactList
                rows={rows.map((field): [string, ReactNode] => [field.label, show(field)])}
              />
            ) : (
              <Text as="p" className={styles.none}>
                No one recorded.
              </Text>
            )}
          </section>
        );
      })}
    </div>
  );
}
