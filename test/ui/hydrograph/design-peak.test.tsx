// @vitest-environment jsdom
// The design storm's peak discharge through the workbench's unit hydrograph (issue 13).
import { screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import type { Scenario } from '../../../src/scenario/types';
import { lazyPartsLoaded, renderWorkbench } from '../../helpers/render';
import { FOUR_BARS } from '../../helpers/scenario-fixtures';

async function retype(user: ReturnType<typeof renderWorkbench>['user'], name: string, text: string) {
  const field = screen.getByRole('textbox', { name });
  await user.clear(field);
  await user.type(field, text);
}

describe('the design peak', () => {
  it('a uniform 1-hour design storm of 12 mm under φ = 2 mm/h gives the triangular peak worked by hand', async () => {
    const scenario: Scenario = {
      ...FOUR_BARS,
      method: { kind: 'constant', rateMmH: 2 },
      hydrograph: { ...FOUR_BARS.hydrograph, transform: { kind: 'triangular', lagH: 2.5 } },
    };
    const { user } = renderWorkbench(scenario);
    await user.click(screen.getByRole('tab', { name: 'Design storm' }));
    await lazyPartsLoaded();
    await user.click(screen.getByRole('radio', { name: 'Uniform depth' }));
    await retype(user, 'Storm duration (min)', '60');
    await retype(user, 'Time step (min)', '60');
    await retype(user, 'Storm depth (mm)', '12');
    // One 1-hour bar of 12 mm less 2 mm of loss: 10 mm of excess on 1 km². Triangular, lag 2.5 h:
    // Tp = 0.5 + 2.5 = 3 h, base 8 h; hourly samples sum to 4 peaks, so the peak is
    // ¼ × 1e6 m² × 0.010 m / 3600 s = 0.6944 m³/s at 3 h (= 0.2083·A·Q/Tp, NEH-630 ch. 16, from memory).
    const list = screen.getByLabelText('Design storm totals');
    expect(within(list).getByText('Design peak discharge', { selector: 'dt' }).nextElementSibling).toHaveTextContent(
      '0.6944 m³/s at 3:00 after the storm start',
    );
  });
});
