import { Button, makeStyles, mergeClasses, Text, tokens } from '@fluentui/react-components';
import { Checkmark16Regular } from '@fluentui/react-icons';

export const IMPORT_STEPS = ['Upload', 'Match columns', 'Check rows', 'Import'] as const;

export type ImportStepName = (typeof IMPORT_STEPS)[number];

const useStyles = makeStyles({
  list: {
    display: 'flex',
    flexWrap: 'wrap',
    gap: tokens.spacingHorizontalS,
    listStyle: 'none',
    margin: 0,
    marginBottom: tokens.spacingVerticalL,
    padding: 0,
  },
  item: { display: 'flex', alignItems: 'center', gap: tokens.spacingHorizontalS },
  separator: {
    width: '32px',
    height: '1px',
    backgroundColor: tokens.colorNeutralStroke1,
  },
  step: {
    display: 'inline-flex',
    alignItems: 'center',
    gap: tokens.spacingHorizontalS,
    minHeight: '32px',
    color: tokens.colorNeutralForeground3,
  },
  current: { color: tokens.colorNeutralForeground1, fontWeight: tokens.fontWeightSemibold },
  bubble: {
    display: 'inline-flex',
    alignItems: 'center',
    justifyContent: 'center',
    width: '24px',
    height: '24px',
    borderRadius: tokens.borderRadiusCircular,
    border: `1px solid ${tokens.colorNeutralStroke1}`,
    fontSize: tokens.fontSizeBase200,
    flexShrink: 0,
  },
  currentBubble: {
    backgroundColor: tokens.colorBrandBackground,
    border: `1px solid ${tokens.colorBrandBackground}`,
    color: tokens.colorNeutralForegroundOnBrand,
  },
  doneBubble: {
    backgroundColor: tokens.colorNeutralBackground3,
  },
  visuallyHidden: {
    position: 'absolute',
    width: '1px',
    height: '1px',
    overflow: 'hidden',
    clipPath: 'inset(50%)',
    whiteSpace: 'nowrap',
  },
});

export interface ImportStepperProps {
  /** The current step, from 0. */
  current: number;
  /** Steps before the current one that may be reopened (all of them until the import is done). */
  onOpen?: (step: number) => void;
}

/**
 * The wizard's steps: "1 Upload · 2 Match columns · 3 Check rows · 4 Import". Earlier steps are
 * buttons (when they may be reopened), so the way back is in the tab order; the current step
 * carries aria-current.
 */
export function ImportStepper({ current, onOpen }: ImportStepperProps) {
  const styles = useStyles();
  return (
    <nav aria-label="Import steps">
      <ol className={styles.list}>
        {IMPORT_STEPS.map((name, index) => {
          const done = index < current;
          const isCurrent = index === current;
          const bubble = (
            <span
              aria-hidden="true"
              className={mergeClasses(
                styles.bubble,
                isCurrent && styles.currentBubble,
                done && styles.doneBubble,
              )}
            >
              {done ? <Checkmark16Regular /> : index + 1}
            </span>
          );
          const hidden = (text: string) => <span className={styles.visuallyHidden}>{text}</span>;
          return (
            <li key={name} className={styles.item} aria-current={isCurrent ? 'step' : undefined}>
              {index > 0 ? <span aria-hidden="true" className={styles.separator} /> : null}
              {done && onOpen ? (
                <Button appearance="subtle" icon={bubble} onClick={() => onOpen(index)}>
                  {hidden(`Back to step ${index + 1}: `)}
                  {name}
                </Button>
              ) : (
                <Text className={mergeClasses(styles.step, isCurrent && styles.current)}>
                  {bubble}
                  {hidden(`Step ${index + 1}: `)}
                  {name}
                  {hidden(isCurrent ? ' (current)' : done ? ' (done)' : '')}
                </Text>
              )}
            </li>
          );
        })}
      </ol>
    </nav>
  );
}
