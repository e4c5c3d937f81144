import { Card, makeStyles, Text, tokens } from '@fluentui/react-components';
import type { SnapshotView } from '@tallyloom/core';
import { RouterLink } from '@/components/ui/router-link';
import { formatFigure } from '@/lib/format';
import { changeMark, changeWords, figureChange } from './figure-change';
import { KPI_MEASURES, MEASURE_COLOURS, MEASURE_LABELS, type KpiMeasure } from './measures';

const useStyles = makeStyles({
  grid: {
    display: 'grid',
    gridTemplateColumns: 'repeat(auto-fill, minmax(180px, 1fr))',
    gap: tokens.spacingHorizontalM,
    margin: 0,
    padding: 0,
    listStyleType: 'none',
  },
  card: { height: '100%', borderTopWidth: '3px', borderTopStyle: 'solid' },
  label: { color: tokens.colorNeutralForeground2 },
  value: { fontVariantNumeric: 'tabular-nums' },
  up: { color: tokens.colorPaletteGreenForeground1 },
  down: { color: tokens.colorPaletteRedForeground1 },
  flat: { color: tokens.colorNeutralForeground2 },
  // Read by screen readers, not shown: the arrow says the same to sighted readers.
  visuallyHidden: {
    position: 'absolute',
    width: '1px',
    height: '1px',
    overflow: 'hidden',
    clip: 'rect(0 0 0 0)',
    whiteSpace: 'nowrap',
  },
});

export interface KpiCardsProps {
  current: SnapshotView;
  previous: SnapshotView | null;
  /** The tallies behind the figures, for roles that may read them. */
  talliesHref: string | null;
  /** A figure's trace, for roles that may trace it; the figure then links there instead. */
  traceHrefOf?: (measure: KpiMeasure) => string | null;
}

/** The period's headline figures, each with its change on the period before. */
export function KpiCards({ current, previous, talliesHref, traceHrefOf }: KpiCardsProps) {
  const styles = useStyles();
  const previousLabel = previous?.period.label ?? null;
  return (
    <ul className={styles.grid} aria-label={`Figures for ${current.period.label}`}>
      {KPI_MEASURES.map((measure) => {
        const value = current.figures[measure];
        const change = figureChange(value, previous?.figures[measure]);
        const changeClass =
          change.direction === 'up'
            ? styles.up
            : change.direction === 'down'
              ? styles.down
              : styles.flat;
        const figure = formatFigure(value);
        const href = traceHrefOf?.(measure) ?? talliesHref;
        return (
          // Named by its visible label, so screen readers still read the figure inside.
          <li key={measure} aria-labelledby={`kpi-${measure}`}>
            <Card className={styles.card} style={{ borderTopColor: MEASURE_COLOURS[measure] }}>
              <Text id={`kpi-${measure}`} className={styles.label}>
                {MEASURE_LABELS[measure]}
              </Text>
              <Text size={700} weight="semibold" className={styles.value}>
                {href ? (
                  <RouterLink to={href} inline>
                    {figure}
                  </RouterLink>
                ) : (
                  figure
                )}
              </Text>
              <Text size={200} className={changeClass}>
                <span aria-hidden="true">{changeMark(change)}</span>
                <span className={styles.visuallyHidden}>{changeWords(change, previousLabel)}</span>
                {previousLabel ? <span aria-hidden="true"> vs {previousLabel}</span> : null}
              </Text>
            </Card>
          </li>
        );
      })}
    </ul>
  );
}
