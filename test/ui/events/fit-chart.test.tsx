// @vitest-environment jsdom
import { render, screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { FitChart } from '../../../src/ui/events/FitChart';

const same = (v: number): number => v;

describe('the event set’s chart', () => {
  it('with no fitted event shows a plain message, not an axis with broken ticks', () => {
    const { container } = render(
      <FitChart
        rows={[]}
        parameterLabel="Loss rate φ"
        unit="mm/h"
        depthUnit="mm"
        showValue={same}
        showDepth={same}
        designValue={null}
      />,
    );
    expect(screen.getByText(/Nothing to plot yet/)).toBeInTheDocument();
    // Before: an empty y axis from 0 to 1e-9, labelled 0.0000000002 … 0.000000001.
    expect(container.querySelector('svg')).toBeNull();
    expect(container.textContent).not.toMatch(/0\.0000/);
    expect(screen.getByRole('figure')).toHaveAccessibleName('No event has a fitted loss rate φ to plot.');
  });
});
