import { Button, makeStyles, Text, tokens } from '@fluentui/react-components';
import { ChevronLeft20Regular, ChevronRight20Regular } from '@fluentui/react-icons';
import { formatCount } from '@/lib/format';

const useStyles = makeStyles({
  root: {
    display: 'flex',
    alignItems: 'center',
    justifyContent: 'flex-end',
    flexWrap: 'wrap',
    gap: tokens.spacingHorizontalS,
    paddingTop: tokens.spacingVerticalS,
  },
  range: { fontVariantNumeric: 'tabular-nums', color: tokens.colorNeutralForeground2 },
});

/** "1–25 of 40": the rows on this page and the total. */
export function pageRangeText(pageIndex: number, pageSize: number, total: number): string {
  if (total === 0) return '0 of 0';
  const first = pageIndex * pageSize + 1;
  const last = Math.min((pageIndex + 1) * pageSize, total);
  return `${formatCount(first)}–${formatCount(last)} of ${formatCount(total)}`;
}

export interface PaginationBarProps {
  /** Zero-based, as TanStack Table counts. */
  pageIndex: number;
  pageSize: number;
  total: number;
  canPrevious: boolean;
  canNext: boolean;
  onPrevious: () => void;
  onNext: () => void;
  /** What the rows are, for the group's name: "People" → "Pages of People". */
  label: string;
}

export function PaginationBar({
  pageIndex,
  pageSize,
  total,
  canPrevious,
  canNext,
  onPrevious,
  onNext,
  label,
}: PaginationBarProps) {
  const styles = useStyles();
  return (
    <div className={styles.root} role="group" aria-label={`Pages of ${label}`}>
      <Text className={styles.range} aria-live="polite">
        {pageRangeText(pageIndex, pageSize, total)}
      </Text>
      <Button
        size="small"
        icon={<ChevronLeft20Regular />}
        disabledFocusable={!canPrevious}
        onClick={onPrevious}
      >
        Previous page
      </Button>
      <Button
        size="small"
        icon={<ChevronRight20Regular />}
        iconPosition="after"
        disabledFocusable={!canNext}
        onClick={onNext}
      >
        Next page
      </Button>
    </div>
  );
}
