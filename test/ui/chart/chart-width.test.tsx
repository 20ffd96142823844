// @vitest-environment jsdom
import { act, screen, waitFor } from '@testing-library/react';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { chartHeightFor } from '../../../src/ui/chart/chart-height';
import { chartFrame, intensityPath } from '../../../src/ui/chart/frame';
import { STAGED_FROM_BARS } from '../../../src/ui/chart/staged-frame';
import { LAZY_LOAD_MS, renderWorkbench } from '../../helpers/render';
import { FOUR_BARS } from '../../helpers/scenario-fixtures';

/** n bars of 5 minutes, wet and dry in turn by tens (invented). */
function longStorm(n: number) {
  return {
    durationsH: new Array<number>(n).fill(1 / 12),
    depthsMm: Array.from({ length: n }, (_, k) => (Math.floor(k / 10) % 2) * (0.2 + (k % 7) * 0.1)),
  };
}

/** A ResizeObserver that reports only when told, as the browser does after its layout; jsdom has none. */
class TestResizeObserver {
  static watching: { el: Element; report: (width: number) => void }[] = [];
  constructor(private readonly callback: ResizeObserverCallback) {}
  observe(el: Element): void {
    TestResizeObserver.watching.push({
      el,
      report: (width) =>
        this.callback([{ target: el, contentRect: { width } } as unknown as ResizeObserverEntry], this),
    });
  }
  unobserve(): void {}
  disconnect(): void {}
}

/** Reports the chart box laid out `width` px wide. */
function layChartOut(container: HTMLElement, width: number): void {
  const box = container.querySelector('.chart__box');
  const watch = TestResizeObserver.watching.find((w) => w.el === box);
  if (!watch) throw new Error('the chart box is not observed');
  act(() => watch.report(width));
}

describe('the hyetograph’s width', () => {
  let asked: ReturnType<typeof vi.spyOn>;
  beforeEach(() => {
    TestResizeObserver.watching = [];
    vi.stubGlobal('ResizeObserver', TestResizeObserver);
    asked = vi.spyOn(HTMLElement.prototype, 'getBoundingClientRect');
  });
  afterEach(() => {
    vi.unstubAllGlobals();
    asked.mockRestore();
  });

  const chartBoxAsked = (container: HTMLElement): boolean =>
    asked.mock.contexts.some((el: unknown) => el === container.querySelector('.chart__box'));

  it('of a long storm is taken from the page’s layout, never asked at mount, and its bars drawn at that width', async () => {
    const storm = longStorm(STAGED_FROM_BARS);
    const { container } = renderWorkbench({ ...FOUR_BARS, storm });
    // Asking for the width at mount lays out the whole page in the mounting task.
    expect(chartBoxAsked(container)).toBe(false);
    // Until the layout reports, the chart says it is drawing and starts no frame.
    expect(screen.getByText('Drawing 200,000 bars…')).toHaveAttribute('role', 'status');
    await new Promise((done) => setTimeout(done, 200));
    expect(container.querySelector('[data-layer="rain"]')).toBeNull();
    layChartOut(container, 700);
    await waitFor(() => expect(container.querySelector('[data-layer="rain"]')).not.toBeNull(), {
      timeout: LAZY_LOAD_MS * 5,
    });
    expect(chartBoxAsked(container)).toBe(false);
    const frame = chartFrame(storm, 700, chartHeightFor(window.innerHeight), 'si');
    expect(container.querySelector('[data-layer="rain"]')?.getAttribute('d')).toBe(
      intensityPath(frame, storm.depthsMm, storm.durationsH),
    );
    expect(container.querySelector('.chart__svg')?.getAttribute('width')).toBe('700');
  });

  it('of a short storm is asked at mount, so its first drawing has the box’s width', () => {
    const { container } = renderWorkbench(FOUR_BARS);
    expect(chartBoxAsked(container)).toBe(true);
    expect(container.querySelector('[data-layer="rain"]')).not.toBeNull();
  });
});
