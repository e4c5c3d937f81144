import { Link, makeStyles, Text, tokens } from '@fluentui/react-components';
import type { OutboxMessage } from '@tallyloom/core';
import { FactList } from '@/components/ui/fact-list';
import { formatDateTime } from '@/lib/format';

const useStyles = makeStyles({
  root: {
    display: 'flex',
    flexDirection: 'column',
    gap: tokens.spacingVerticalS,
    padding: `${tokens.spacingVerticalM} ${tokens.spacingHorizontalL}`,
    border: `1px solid ${tokens.colorNeutralStroke2}`,
    borderRadius: tokens.borderRadiusMedium,
    minWidth: 0,
  },
  title: { margin: 0 },
  text: {
    margin: 0,
    padding: tokens.spacingHorizontalM,
    whiteSpace: 'pre-wrap',
    overflowWrap: 'anywhere',
    fontFamily: tokens.fontFamilyMonospace,
    fontSize: tokens.fontSizeBase200,
    backgroundColor: tokens.colorNeutralBackground2,
    borderRadius: tokens.borderRadiusMedium,
  },
  subheading: { margin: 0 },
  links: { margin: 0, paddingLeft: tokens.spacingHorizontalXL },
  link: { overflowWrap: 'anywhere' },
});

/** Only web addresses become links: a captured message is test data, not trusted markup. */
function isWebAddress(value: string): boolean {
  try {
    const url = new URL(value);
    return url.protocol === 'http:' || url.protocol === 'https:';
  } catch {
    return false;
  }
}

/** One captured e-mail: who it went to, its text, and its links ready to follow. */
export function OutboxMessageView({ message }: { message: OutboxMessage }) {
  const styles = useStyles();
  const headingId = `outbox-message-${message.id}`;
  const links = message.links.filter(isWebAddress);
  return (
    <article className={styles.root} aria-labelledby={headingId}>
      <Text as="h2" id={headingId} size={400} weight="semibold" className={styles.title}>
        {message.subject || '(no subject)'}
      </Text>
      <FactList
        rows={[
          ['To', message.to.join(', ')],
          ['From', message.from],
          ['Received', formatDateTime(message.receivedAt)],
        ]}
      />
      <pre className={styles.text}>{message.text}</pre>
      {links.length ? (
        <>
          <Text as="h3" size={300} weight="semibold" className={styles.subheading}>
            Links in this message
          </Text>
          <ul className={styles.links}>
            {links.map((href) => (
              <li key={href}>
                <Link href={href} className={styles.link}>
                  {href}
                </Link>
              </li>
            ))}
          </ul>
        </>
      ) : null}
    </article>
  );
}
