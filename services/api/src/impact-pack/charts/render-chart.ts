import { Resvg } from '@resvg/resvg-js';
// The whole 'echarts' entry: its tree-shakable subpaths (echarts/core, echarts/charts) are ES
// modules only, which jest on Node 20 cannot require; on the server the bundle size is moot.
import * as echarts from 'echarts';
import type { EChartsOption } from 'echarts';
import { existsSync } from 'node:fs';

/**
 * resvg reads TrueType/OpenType, not the woff files of @fontsource/roboto (tried: the labels came
 * out blank), so charts use DejaVu Sans from Debian's fonts-dejavu. Without those files, resvg
 * falls back to whatever the system has.
 */
export const CHART_FONT_FAMILY = 'DejaVu Sans';
const DEJAVU_FILES = [
  '/usr/share/fonts/truetype/dejavu/DejaVuSans.ttf',
  '/usr/share/fonts/truetype/dejavu/DejaVuSans-Bold.ttf',
];

export interface RenderedChart {
  svg: string;
  png: Buffer;
  width: number;
  height: number;
}

export interface ChartSize {
  width: number;
  height: number;
}

/** Draws an ECharts option server-side to SVG, then to PNG at twice the size for sharp print. */
export function renderChart(option: EChartsOption, size: ChartSize): RenderedChart {
  const chart = echarts.init(null, null, { renderer: 'svg', ssr: true, ...size });
  let svg: string;
  try {
    chart.setOption({ animation: false, textStyle: { fontFamily: CHART_FONT_FAMILY }, ...option });
    svg = chart.renderToSVGString();
  } finally {
    chart.dispose();
  }
  const fontFiles = DEJAVU_FILES.filter((file) => existsSync(file));
  const png = new Resvg(svg, {
    background: 'white',
    fitTo: { mode: 'zoom', value: 2 },
    font: {
      fontFiles,
      loadSystemFonts: fontFiles.length === 0,
      defaultFontFamily: CHART_FONT_FAMILY,
    },
  })
    .render()
    .asPng();
  return { svg, png, ...size };
}
