import {
  makeStyles,
  Table,
  TableBody,
  TableCell,
  TableHeader,
  TableHeaderCell,
  TableRow,
  Text,
  tokens,
} from '@fluentui/react-components';
import type { TraceTallyLine } from '@tallyloom/core';
import { RouterLink } from '@/components/ui/router-link';
import { paths } from '@/config/paths';
import { formatCount, formatDate, formatFigure } from '@/lib/format';
import { ScanLink } from './scan-link';

const useStyles = makeStyles({
  root: {
    display: 'flex',
    flexDirection: 'column',
    gap: tokens.spacingVerticalM,
    padding: `${tokens.spacingVerticalS} ${tokens.spacingHorizontalL}`,
    backgroundColor: tokens.colorNeutralBackground2,
  },
  heading: { margin: 0 },
  numeric: { textAlign: 'end', fontVariantNumeric: 'tabular-nums' },
  numericHeader: { justifyContent: 'flex-end' },
  scans: { display: 'flex', flexWrap: 'wrap', gap: tokens.spacingHorizontalM },
  muted: { color: tokens.colorNeutralForeground2 },
});

function shown(value: number | string | null): string {
  if (value === null) return '—';
  return typeof value === 'number' ? formatFigure(value) : value;
}

/** Amendments with each changed field's before and after, then the month's receipts and scans. */
export function TraceLineDetail({ line }: { line: TraceTallyLine }) {
  const styles = useStyles();
  const name = `${line.chapterName}, ${line.month}`;
  return (
    <div className={styles.root}>
      <Text as="h3" weight="semibold" className={styles.heading}>
        Amendments
      </Text>
      {line.amendments.length === 0 ? (
        <Text className={styles.muted}>Never amended: the first approved revision counts.</Text>
      ) : (
        <Table size="extra-small" aria-label={`Amendments of ${name}`}>
          <TableHeader>
            <TableRow>
              <TableHeaderCell>Revision</TableHeaderCell>
              <TableHeaderCell>Reason</TableHeaderCell>
              <TableHeaderCell>Field</TableHeaderCell>
              <TableHeaderCell button={{ className: styles.numericHeader }}>Before</TableHeaderCell>
              <TableHeaderCell button={{ className: styles.numericHeader }}>After</TableHeaderCell>
            </TableRow>
          </TableHeader>
          <TableBody>
            {line.amendments.flatMap((amendment) =>
              (amendment.changes.length
                ? amendment.changes
                : [{ field: '', label: 'No figure changed', before: null, after: null }]
              ).map((change, index) => (
                <TableRow key={`${amendment.revision}-${change.field}-${index}`}>
                  <TableCell>{index === 0 ? amendment.revision : ''}</TableCell>
                  <TableCell>{index === 0 ? (amendment.reason ?? '—') : ''}</TableCell>
                  <TableCell>{change.label}</TableCell>
                  <TableCell className={styles.numeric}>{shown(change.before)}</TableCell>
                  <TableCell className={styles.numeric}>{shown(change.after)}</TableCell>
                </TableRow>
              )),
            )}
          </TableBody>
        </Table>
      )}

      <Text as="h3" weight="semibold" className={styles.heading}>
        Parcel receipts of the month
      </Text>
      {line.receipts.length === 0 ? (
        <Text className={styles.muted}>No parcels were logged for this chapter and month.</Text>
      ) : (
        <Table size="extra-small" aria-label={`Parcel receipts of ${name}`}>
          <TableHeader>
            <TableRow>
              <TableHeaderCell>Received</TableHeaderCell>
              <TableHeaderCell button={{ className: styles.numericHeader }}>
                Panels accepted
              </TableHeaderCell>
              <TableHeaderCell button={{ className: styles.numericHeader }}>
                Set aside
              </TableHeaderCell>
              <TableHeaderCell>Campaign</TableHeaderCell>
              <TableHeaderCell>Scans</TableHeaderCell>
            </TableRow>
          </TableHeader>
          <TableBody>
            {line.receipts.map((receipt) => (
              <TableRow key={receipt.id}>
                <TableCell>
                  <RouterLink to={paths.receipt.getHref(receipt.id)}>
                    {`Parcel ${formatDate(receipt.receivedOn)} (#${receipt.id})`}
                  </RouterLink>
                </TableCell>
                <TableCell className={styles.numeric}>
                  {formatCount(receipt.panelsAccepted)}
                </TableCell>
                <TableCell className={styles.numeric}>
                  {formatCount(receipt.setAsideTotal)}
                </TableCell>
                <TableCell>{receipt.campaignCode ?? '—'}</TableCell>
                <TableCell>
                  {receipt.scans.length === 0 ? (
                    <Text className={styles.muted}>None</Text>
                  ) : (
                    <span className={styles.scans}>
                      {receipt.scans.map((scan) => (
                        <ScanLink key={scan.id} receiptId={receipt.id} scan={scan} />
                      ))}
                    </span>
                  )}
                </TableCell>
              </TableRow>
            ))}
          </TableBody>
        </Table>
      )}
    </div>
  );
}
