import { makeStyles } from '@fluentui/react-components';
import * as echarts from 'echarts/core';
import type { EChartsCoreOption } from 'echarts/core';
import ReactEChartsCore from 'echarts-for-react/esm/core';
import { useChartFontsReady } from '@/hooks/use-chart-fonts';

const useStyles = makeStyles({
  root: { width: '100%' },
});

export interface ChartProps {
  option: EChartsCoreOption;
  /** The chart in words: screen readers read this, and it shows as the tooltip of the frame. */
  description: string;
  height: number;
  /** ECharts events by name, e.g. `{ click: … }` for a drill-down. */
  onEvents?: Record<string, (params: unknown) => void>;
}

/**
 * One ECharts canvas. Each feature registers the chart types it draws with (`echarts.use`), so
 * a page carries only those; this frame waits for the chart fonts and names the chart in words.
 */
export function Chart({ option, description, height, onEvents }: ChartProps) {
  const styles = useStyles();
  const fontsReady = useChartFontsReady();
  return (
    <div role="img" aria-label={description} className={styles.root} style={{ height }}>
      {fontsReady ? (
        <ReactEChartsCore
          echarts={echarts}
          option={option}
          notMerge
          onEvents={onEvents}
          style={{ width: '100%', height: '100%' }}
          opts={{ renderer: 'canvas' }}
        />
      ) : null}
    </div>
  );
}
