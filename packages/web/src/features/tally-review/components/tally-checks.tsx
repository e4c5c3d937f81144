import { Badge, makeStyles, Text, tokens } from '@fluentui/react-components';
import type { TallyCheckResult, TallyProblem } from '@tallyloom/core';
import type { ReactNode } from 'react';

const useStyles = makeStyles({
  root: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalM },
  group: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalXS },
  groupTitle: { margin: 0 },
  list: {
    listStyle: 'none',
    margin: 0,
    padding: 0,
    display: 'flex',
    flexDirection: 'column',
    gap: tokens.spacingVerticalXS,
  },
  item: { display: 'flex', alignItems: 'baseline', gap: tokens.spacingHorizontalS },
  badge: { flexShrink: 0 },
  note: {
    margin: 0,
    padding: `${tokens.spacingVerticalS} ${tokens.spacingHorizontalM}`,
    borderLeft: `3px solid ${tokens.colorNeutralStroke1}`,
    backgroundColor: tokens.colorNeutralBackground2,
    whiteSpace: 'pre-wrap',
  },
  quiet: { margin: 0, color: tokens.colorNeutralForeground2 },
});

function ProblemList({
  title,
  problems,
  badge,
}: {
  title: string;
  problems: TallyProblem[];
  badge: (problem: TallyProblem) => ReactNode;
}) {
  const styles = useStyles();
  if (problems.length === 0) return null;
  return (
    <div className={styles.group}>
      <Text as="h3" weight="semibold" className={styles.groupTitle}>
        {title}
      </Text>
      <ul className={styles.list}>
        {problems.map((problem) => (
          <li key={`${problem.code}-${problem.field}`} className={styles.item}>
            <span className={styles.badge}>{badge(problem)}</span>
            <span>{problem.message}</span>
          </li>
        ))}
      </ul>
    </div>
  );
}

export interface TallyChecksProps {
  checks: TallyCheckResult;
  acknowledgedWarnings: string[];
  acknowledgementNote: string | null;
}

/** The checks as the server ran them, which warnings the chapter lead acknowledged, and why. */
export function TallyChecks({
  checks,
  acknowledgedWarnings,
  acknowledgementNote,
}: TallyChecksProps) {
  const styles = useStyles();
  const acknowledged = new Set(acknowledgedWarnings);
  const clean = checks.errors.length === 0 && checks.warnings.length === 0;
  return (
    <div className={styles.root}>
      {clean ? (
        <Text as="p" className={styles.quiet}>
          Every check passes: the stock adds up, the accepted panels match the parcels, and each
          count is in line with the chapter’s history.
        </Text>
      ) : null}
      <ProblemList
        title="Errors"
        problems={checks.errors}
        badge={() => (
          <Badge appearance="filled" color="danger" size="small">
            Error
          </Badge>
        )}
      />
      <ProblemList
        title="Warnings"
        problems={checks.warnings}
        badge={(problem) =>
          acknowledged.has(problem.code) ? (
            <Badge appearance="tint" color="informative" size="small">
              Acknowledged
            </Badge>
          ) : (
            <Badge appearance="outline" color="warning" size="small">
              Not acknowledged
            </Badge>
          )
        }
      />
      {checks.warnings.length > 0 || acknowledgementNote ? (
        <div className={styles.group}>
          <Text as="h3" weight="semibold" className={styles.groupTitle}>
            The chapter lead’s note
          </Text>
          {acknowledgementNote ? (
            <Text as="p" className={styles.note}>
              {acknowledgementNote}
            </Text>
          ) : (
            <Text as="p" className={styles.quiet}>
              No note given.
            </Text>
          )}
        </div>
      ) : null}
      <ProblemList
        title="For information"
        problems={checks.infos}
        badge={() => (
          <Badge appearance="tint" color="subtle" size="small">
            Info
          </Badge>
        )}
      />
    </div>
  );
}
