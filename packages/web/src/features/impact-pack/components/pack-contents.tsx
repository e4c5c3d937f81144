import { makeStyles, Text, tokens } from '@fluentui/react-components';
import { SectionHeading } from '@/components/ui/section-heading';

const useStyles = makeStyles({
  list: { margin: 0, paddingLeft: tokens.spacingHorizontalXL, maxWidth: '72ch' },
  item: { marginBottom: tokens.spacingVerticalXXS },
  note: { margin: 0, marginTop: tokens.spacingVerticalS, color: tokens.colorNeutralForeground2 },
});

// The workbook's own sheet names, so the list reads like the file's tabs.
const SHEETS: Array<[string, string]> = [
  ['Cover', 'scope, period, the date the figures are as of, and who exported them'],
  ['Headline figures', 'panels, blankets, people served, volunteer hours and stock'],
  ['By region (or By chapter)', 'one row per region, or per chapter of a region, with totals'],
  ['By month', 'one row per month of the period'],
  ['By agency kind', 'blankets given and people served, by kind of partner agency'],
  ['People by group', 'infants, children, adults, older adults, disaster-affected'],
  ['Campaigns', 'goal, panels credited, share done and pace'],
  ['Volunteer value', 'volunteer hours and their estimated value, with the source of the rate'],
  ['Charts', 'the monthly trend, the comparison and people served, as images'],
  ['Methodology', 'how tallies become figures, what counts, and the known gaps'],
  ['Data dictionary', 'what every column of every sheet means'],
];

/** What the workbook holds, so a grant writer knows before building it. */
export function PackContents({ headingId }: { headingId: string }) {
  const styles = useStyles();
  return (
    <section aria-labelledby={headingId}>
      <SectionHeading id={headingId}>What the workbook contains</SectionHeading>
      <ul className={styles.list}>
        {SHEETS.map(([sheet, holds]) => (
          <li key={sheet} className={styles.item}>
            <Text weight="semibold">{sheet}</Text>: {holds}.
          </li>
        ))}
      </ul>
      <Text as="p" size={200} className={styles.note}>
        Figures come from approved tallies only and are estimates built from volunteer reports. No
        sender’s name, e-mail or address is ever in the pack.
      </Text>
    </section>
  );
}
