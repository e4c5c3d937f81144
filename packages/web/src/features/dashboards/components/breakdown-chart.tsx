import type { SnapshotView } from '@tallyloom/core';
import { useMemo } from 'react';
import { useNavigate } from 'react-router-dom';
import { Chart } from '@/components/charts/chart';
import { formatFigure } from '@/lib/format';
import { breakdownAt, buildBreakdownOption } from './breakdown-option';
import { CHART_MEASURES, MEASURE_LABELS } from './measures';
import './register-charts';

export interface BreakdownChartProps {
  breakdown: SnapshotView[];
  /** Where a bar leads: that region's or chapter's own dashboard. */
  hrefOf: (row: SnapshotView) => string;
}

function describeBreakdown(breakdown: SnapshotView[]): string {
  const rows = breakdown.map(
    (row) =>
      `${row.scopeName}: ${CHART_MEASURES.map((m) => `${MEASURE_LABELS[m]} ${formatFigure(row.figures[m])}`).join(', ')}`,
  );
  return `Comparison. ${rows.join('; ')}. Choose a bar or a name in the table to open its dashboard.`;
}

/** The regions (or chapters) side by side; a click on a bar opens that one's dashboard. */
export function BreakdownChart({ breakdown, hrefOf }: BreakdownChartProps) {
  const navigate = useNavigate();
  const option = useMemo(() => buildBreakdownOption(breakdown), [breakdown]);
  const onEvents = useMemo(
    () => ({
      click: (params: unknown) => {
        const index = (params as { dataIndex?: number }).dataIndex;
        const row = index === undefined ? undefined : breakdownAt(breakdown, index);
        if (row) void navigate(hrefOf(row));
      },
    }),
    [breakdown, hrefOf, navigate],
  );
  return (
    <Chart
      option={option}
      description={describeBreakdown(breakdown)}
      height={Math.max(160, 48 + breakdown.length * 40)}
      onEvents={onEvents}
    />
  );
}
