import { makeStyles, Text, tokens } from '@fluentui/react-components';
import { CalendarLtr24Regular } from '@fluentui/react-icons';
import { LinkButton } from '@/components/ui/link-button';
import { paths } from '@/config/paths';
import { useTallyCalendar } from '../api/get-tally-calendar';

const useStyles = makeStyles({
  root: {
    display: 'flex',
    flexWrap: 'wrap',
    alignItems: 'center',
    gap: tokens.spacingHorizontalL,
    padding: `${tokens.spacingVerticalM} ${tokens.spacingHorizontalL}`,
    marginBottom: tokens.spacingVerticalL,
    borderRadius: tokens.borderRadiusMedium,
    border: `1px solid ${tokens.colorBrandStroke2}`,
    backgroundColor: tokens.colorBrandBackground2,
  },
  icon: { color: tokens.colorBrandForeground1, flexShrink: 0 },
  body: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalXXS, flexGrow: 1 },
  title: { margin: 0 },
  line: { margin: 0 },
});

function count(n: number, one: string, many: string) {
  return `${n} ${n === 1 ? one : many}`;
}

/** A chapter lead's way in from the network home: what is due, and one click to it. */
export function TallyDueCard() {
  const styles = useStyles();
  const calendar = useTallyCalendar();
  const entries = calendar.data?.entries ?? [];
  const toFile = entries.filter(
    (entry) =>
      entry.state !== 'approved' &&
      entry.state !== 'submitted' &&
      (entry.reporting === 'due' || entry.reporting === 'missing'),
  ).length;
  const returned = entries.filter((entry) => entry.state === 'returned').length;
  const summary = calendar.isSuccess
    ? toFile + returned === 0
      ? 'Every month due is filed.'
      : [
          toFile ? `${count(toFile, 'month', 'months')} to file` : '',
          returned ? `${count(returned, 'tally', 'tallies')} returned for changes` : '',
        ]
          .filter(Boolean)
          .join(', ') + '.'
    : "File each month's tally, and fix the ones returned to you.";

  return (
    <section className={styles.root} aria-labelledby="tally-due-card">
      <CalendarLtr24Regular className={styles.icon} aria-hidden />
      <div className={styles.body}>
        <Text as="h2" id="tally-due-card" size={400} weight="semibold" className={styles.title}>
          Monthly tallies
        </Text>
        <Text as="p" className={styles.line}>
          {summary}
        </Text>
      </div>
      <LinkButton to={paths.tallies.getHref()} appearance="primary">
        Go to monthly tallies
      </LinkButton>
    </section>
  );
}
