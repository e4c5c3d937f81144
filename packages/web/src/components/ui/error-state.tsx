import { Button, makeStyles, Text, tokens } from '@fluentui/react-components';
import { ArrowClockwise20Regular, ErrorCircle24Regular } from '@fluentui/react-icons';
import type { FieldProblem } from '@tallyloom/core';
import { ApiError } from '@/lib/api-client';

const useStyles = makeStyles({
  root: {
    display: 'flex',
    gap: tokens.spacingHorizontalM,
    alignItems: 'flex-start',
    padding: `${tokens.spacingVerticalL} ${tokens.spacingHorizontalL}`,
    borderLeft: `4px solid ${tokens.colorStatusDangerBorderActive}`,
    borderRadius: tokens.borderRadiusMedium,
    backgroundColor: tokens.colorStatusDangerBackground1,
    maxWidth: '72ch',
  },
  icon: { color: tokens.colorStatusDangerForeground1, flexShrink: 0 },
  body: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalXS },
  title: { margin: 0 },
  line: { margin: 0 },
  hint: { margin: 0, color: tokens.colorNeutralForeground2 },
  fields: { margin: 0, paddingLeft: tokens.spacingHorizontalXL },
  requestId: { fontFamily: tokens.fontFamilyMonospace, userSelect: 'all' },
  actions: { marginTop: tokens.spacingVerticalXS },
});

interface Problem {
  message: string;
  hint: string;
  requestId?: string;
  fields?: FieldProblem[];
}

/** Turns whatever was thrown into words: the server's message, what to do next, and its request id. */
export function describeProblem(error: unknown): Problem {
  if (error instanceof ApiError) {
    const { statusCode, requestId, fields } = error;
    let hint = 'Try again in a moment. If it keeps happening, pass the request id to the team.';
    if (error.isNetworkFailure) hint = 'Check the connection, or whether the server is running.';
    else if (statusCode === 401) hint = 'Sign in, then try again.';
    else if (statusCode === 403) hint = 'Ask a network admin for access if you need it.';
    else if (statusCode === 404) hint = 'It may have been removed or renamed.';
    return { message: error.message, hint, requestId, fields };
  }
  const message = error instanceof Error ? error.message : 'Something unexpected happened.';
  return { message, hint: 'Try again. If it keeps happening, reload the page.' };
}

export interface ErrorStateProps {
  title: string;
  error: unknown;
  onRetry?: () => void;
  /** Holds the retry button (still focusable) while a retry is under way. */
  retrying?: boolean;
  headingLevel?: 2 | 3;
}

export function ErrorState({ title, error, onRetry, retrying, headingLevel = 2 }: ErrorStateProps) {
  const styles = useStyles();
  const problem = describeProblem(error);
  return (
    <div className={styles.root} role="alert">
      <ErrorCircle24Regular className={styles.icon} aria-hidden="true" />
      <div className={styles.body}>
        <Text as={`h${headingLevel}`} size={400} weight="semibold" className={styles.title}>
          {title}
        </Text>
        <Text as="p" className={styles.line}>
          {problem.message}
        </Text>
        {problem.fields?.length ? (
          <ul className={styles.fields}>
            {problem.fields.map((field) => (
              <li key={field.field}>
                <strong>{field.field}</strong>: {field.messages.join('; ')}
              </li>
            ))}
          </ul>
        ) : null}
        <Text as="p" className={styles.hint}>
          {problem.hint}
        </Text>
        {problem.requestId ? (
          <Text as="p" size={200} className={styles.line}>
            Request id: <span className={styles.requestId}>{problem.requestId}</span>
          </Text>
        ) : null}
        {onRetry ? (
          <div className={styles.actions}>
            <Button
              icon={<ArrowClockwise20Regular />}
              onClick={onRetry}
              disabledFocusable={retrying}
            >
              {retrying ? 'Trying again…' : 'Try again'}
            </Button>
          </div>
        ) : null}
      </div>
    </div>
  );
}
