import type { EChartsOption } from 'echarts';
import { renderChart } from './render-chart';

const PNG_SIGNATURE = Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]);

const option = (title: string): EChartsOption => ({
  title: { text: title },
  xAxis: { type: 'category', data: ['Jul 2025', 'Aug 2025'] },
  yAxis: { type: 'value' },
  series: [{ type: 'bar', data: [1200, 1500] }],
});

describe('chart rendering', () => {
  it('draws the labels as text in the SVG and a PNG twice the size', () => {
    const chart = renderChart(option('Panels received'), { width: 400, height: 200 });
    expect(chart.svg).toContain('Panels received');
    expect(chart.svg).toContain('Jul 2025');
    expect(chart.png.subarray(0, 8).equals(PNG_SIGNATURE)).toBe(true);
    // IHDR width and height (bytes 16–23): zoomed ×2.
    expect([chart.png.readUInt32BE(16), chart.png.readUInt32BE(20)]).toEqual([800, 400]);
  });

  it('puts glyphs in the PNG: a title changes the pixels (a missing font would draw nothing)', () => {
    const withTitle = renderChart(option('Panels received'), { width: 400, height: 200 }).png;
    const without = renderChart(option(''), { width: 400, height: 200 }).png;
    expect(withTitle.equals(without)).toBe(false);
    expect(withTitle.length).toBeGreaterThan(without.length + 500);
  });
});
