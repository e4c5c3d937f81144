import type { SnapshotView } from '@tallyloom/core';
import { useMemo } from 'react';
import { Chart } from '@/components/charts/chart';
import './register-charts';
import { buildTrendOption, describeTrend } from './trend-option';

export function TrendChart({ trend }: { trend: SnapshotView[] }) {
  const option = useMemo(() => buildTrendOption(trend), [trend]);
  return <Chart option={option} description={describeTrend(trend)} height={280} />;
}
