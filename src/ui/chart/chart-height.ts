import { useSyncExternalStore } from 'react';

/** The hyetograph's height on a tall window, px (and in exports, which have no window to fit). */
export const CHART_HEIGHT = 360;
/** The least it shrinks to on a short window, px: below it the bars and the line get too cramped to drag. */
export const CHART_MIN_HEIGHT = 240;
/**
 * What the page holds above and below the plot on the first screen, px: the header, the scenario tools,
 * the caution, the view tabs, the rainfall line, the chart's own title and margins, and the results strip
 * under it (measured at 1280 px wide, where the caution takes two lines).
 */
const AROUND_CHART_PX = 420;

/**
 * The hyetograph's height for a window `innerHeight` px tall: the full height where it fits, less on a laptop
 * screen (1366×768, 1280×720) so that the loss line and the results strip under the chart are in view together
 * without scrolling (issue 16).
 */
export function chartHeightFor(innerHeight: number): number {
  if (!(innerHeight > 0)) return CHART_HEIGHT;
  return Math.round(Math.min(CHART_HEIGHT, Math.max(CHART_MIN_HEIGHT, innerHeight - AROUND_CHART_PX)));
}

const subscribe = (onChange: () => void): (() => void) => {
  window.addEventListener('resize', onChange);
  return () => window.removeEventListener('resize', onChange);
};

/** The hyetograph's height for this window, following resizes (one value for the chart and its drawing layer). */
export function useChartHeight(): number {
  return useSyncExternalStore(
    subscribe,
    () => chartHeightFor(window.innerHeight),
    () => CHART_HEIGHT,
  );
}
