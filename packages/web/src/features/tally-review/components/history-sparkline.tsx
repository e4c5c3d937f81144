import { makeStyles } from '@fluentui/react-components';
import { LineChart } from 'echarts/charts';
import { GridComponent, TooltipComponent } from 'echarts/components';
import * as echarts from 'echarts/core';
import { CanvasRenderer } from 'echarts/renderers';
import ReactEChartsCore from 'echarts-for-react/esm/core';
import { useMemo } from 'react';
import { useChartFontsReady } from '@/hooks/use-chart-fonts';
import { buildSparklineOption, describeSparkline, type SparklineInput } from './sparkline-option';

// Only the pieces the sparkline draws with: the whole library would add ~200 KB to this page.
echarts.use([LineChart, GridComponent, TooltipComponent, CanvasRenderer]);

const useStyles = makeStyles({
  chart: { width: '160px', height: '36px' },
});

/** A small line of a count over the chapter's approved months, with this month marked. */
export function HistorySparkline(props: SparklineInput) {
  const styles = useStyles();
  const fontsReady = useChartFontsReady();
  const { label, month, value, history } = props;
  const option = useMemo(
    () => buildSparklineOption({ label, month, value, history }),
    [label, month, value, history],
  );
  const description = describeSparkline(props);
  return (
    <div role="img" aria-label={description} title={description} className={styles.chart}>
      {fontsReady ? (
        <ReactEChartsCore
          echarts={echarts}
          option={option}
          notMerge
          style={{ width: '100%', height: '100%' }}
          opts={{ renderer: 'canvas' }}
        />
      ) : null}
    </div>
  );
}
