// @vitest-environment jsdom
import { screen, waitFor } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
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

describe('the hyetograph of a long storm', () => {
  it('says it is drawing, page answering, then draws the same bars a one-go frame gives', async () => {
    const storm = longStorm(STAGED_FROM_BARS);
    const { container } = renderWorkbench({ ...FOUR_BARS, storm });
    // The first render shows the storm's count and no bars yet: the frame is worked out in later tasks.
    expect(screen.getByText('Drawing 200,000 bars…')).toHaveAttribute('role', 'status');
    expect(container.querySelector('[data-layer="rain"]')).toBeNull();
    await waitFor(() => expect(container.querySelector('[data-layer="rain"]')).not.toBeNull(), {
      timeout: LAZY_LOAD_MS * 5,
    });
    expect(screen.queryByText('Drawing 200,000 bars…')).toBeNull();
    // jsdom lays nothing out: the chart keeps its fallback width, 880 px.
    const frame = chartFrame(storm, 880, chartHeightFor(window.innerHeight), 'si');
    expect(container.querySelector('[data-layer="rain"]')?.getAttribute('d')).toBe(
      intensityPath(frame, storm.depthsMm, storm.durationsH),
    );
    expect(screen.getByRole('slider', { name: 'Loss rate φ' })).toBeInTheDocument();
  });
});
