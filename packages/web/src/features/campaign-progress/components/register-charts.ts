import { LineChart } from 'echarts/charts';
import { GridComponent, LegendComponent, TooltipComponent } from 'echarts/components';
import * as echarts from 'echarts/core';
import { CanvasRenderer } from 'echarts/renderers';

// Only the pieces the progress chart draws with.
echarts.use([LineChart, GridComponent, LegendComponent, TooltipComponent, CanvasRenderer]);
