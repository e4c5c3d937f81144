import { useEffect, useState } from 'react';

// The weights the charts draw with. Loaded once for the whole page, shared by every chart.
const CHART_FONTS = ['400 1em Roboto', '500 1em Roboto'];

let fontsLoaded: Promise<void> | null = null;

function loadChartFonts(): Promise<void> {
  // No font API (an old browser, or jsdom): draw at once with whatever face there is.
  if (typeof document === 'undefined' || !('fonts' in document)) return Promise.resolve();
  fontsLoaded ??= Promise.all(CHART_FONTS.map((font) => document.fonts.load(font))).then(
    () => undefined,
    // A font that fails to load must not keep the chart from drawing with the fallback.
    () => undefined,
  );
  return fontsLoaded;
}

/**
 * True once Roboto is loaded. ECharts paints its text onto the canvas once, so a chart drawn
 * before the web font arrives keeps the fallback face until it is drawn again.
 */
export function useChartFontsReady(): boolean {
  const [ready, setReady] = useState(false);
  useEffect(() => {
    let live = true;
    void loadChartFonts().then(() => {
      if (live) setReady(true);
    });
    return () => {
      live = false;
    };
  }, []);
  return ready;
}
