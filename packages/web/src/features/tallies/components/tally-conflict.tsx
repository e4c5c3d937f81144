import {
  Button,
  makeStyles,
  MessageBar,
  MessageBarBody,
  MessageBarTitle,
  Table,
  TableBody,
  TableCell,
  TableHeader,
  TableHeaderCell,
  TableRow,
  tokens,
} from '@fluentui/react-components';
import { ArrowClockwise20Regular, ArrowUpload20Regular } from '@fluentui/react-icons';
import { diffTallyValues, type TallyDetail, type TallyValues } from '@tallyloom/core';
import { formatDateTime } from '@/lib/format';

const useStyles = makeStyles({
  root: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalS },
  body: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalS },
  numeric: { textAlign: 'end', fontVariantNumeric: 'tabular-nums' },
  // A header cell lays its text out in an inner box: push that to the right as well.
  numericHead: { justifyContent: 'flex-end' },
  actions: { display: 'flex', flexWrap: 'wrap', gap: tokens.spacingHorizontalS },
});

const shown = (value: number | string | null) =>
  value === null ? '—' : typeof value === 'number' ? value.toLocaleString('en-US') : value;

export interface TallyConflictProps {
  current: TallyDetail;
  /** What the person typed, which was not saved. */
  mine: TallyValues;
  onTakeCurrent: () => void;
  onKeepMine: () => void;
}

/**
 * A save was refused: someone saved a newer version first. Shows every figure that differs between
 * what the person typed and what is saved now, and lets them take either.
 */
export function TallyConflict({ current, mine, onTakeCurrent, onKeepMine }: TallyConflictProps) {
  const styles = useStyles();
  const names = {
    blanketSizes: Object.fromEntries(current.checkContext.blanketSizes.map((s) => [s.id, s.name])),
    agencies: Object.fromEntries(current.agencies.map((a) => [a.id, a.name])),
  };
  const changes = diffTallyValues(mine, current.values, names);

  return (
    <div role="alert" className={styles.root}>
      <MessageBar intent="warning" layout="multiline">
        <MessageBarBody className={styles.body}>
          <MessageBarTitle>Someone else saved this tally first</MessageBarTitle>
          <span>
            Your last changes were not saved: the tally was saved by someone else at{' '}
            {formatDateTime(current.updatedAt)} (version {current.version}).{' '}
            {changes.length === 0
              ? 'Their figures are the same as yours.'
              : `${changes.length} ${changes.length === 1 ? 'figure differs' : 'figures differ'}:`}
          </span>
        </MessageBarBody>
      </MessageBar>
      {changes.length > 0 ? (
        <Table size="small" aria-label="Figures that differ">
          <TableHeader>
            <TableRow>
              <TableHeaderCell>Figure</TableHeaderCell>
              <TableHeaderCell
                className={styles.numeric}
                button={{ className: styles.numericHead }}
              >
                Yours (not saved)
              </TableHeaderCell>
              <TableHeaderCell
                className={styles.numeric}
                button={{ className: styles.numericHead }}
              >
                Saved now
              </TableHeaderCell>
            </TableRow>
          </TableHeader>
          <TableBody>
            {changes.map((change) => (
              <TableRow key={change.field + change.label}>
                <TableCell>{change.label}</TableCell>
                <TableCell className={styles.numeric}>{shown(change.before)}</TableCell>
                <TableCell className={styles.numeric}>{shown(change.after)}</TableCell>
              </TableRow>
            ))}
          </TableBody>
        </Table>
      ) : null}
      <div className={styles.actions}>
        <Button icon={<ArrowClockwise20Regular />} onClick={onTakeCurrent}>
          Take the saved figures
        </Button>
        <Button appearance="primary" icon={<ArrowUpload20Regular />} onClick={onKeepMine}>
          Save mine over them
        </Button>
      </div>
    </div>
  );
}
