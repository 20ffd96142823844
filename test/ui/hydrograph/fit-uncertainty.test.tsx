// @vitest-environment jsdom
// How sure the loss fit is (issue 13): an uncertainty on the observed runoff,
// the fitted parameter with the fits at the two ends, and the calibration chart.
import { screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import type { Scenario } from '../../../src/scenario/types';
import { lazyPartsLoaded, renderWorkbench } from '../../helpers/render';
import { FOUR_BARS } from '../../helpers/scenario-fixtures';

/** FOUR_BARS (2, 6, 10, 2 mm in half hours: 4, 12, 20, 4 mm/h on 1 km²) with 10 mm observed. */
const OBSERVED: Scenario = { ...FOUR_BARS, observed: { as: 'depth', value: 10, parameter: 'rateMmH', locked: false } };

describe('how sure the loss fit is', () => {
  it('shows the φ fitted to the observed runoff ± 10 % as an interval worked by hand, with the chart', async () => {
    const { user, scenario } = renderWorkbench(OBSERVED);
    await lazyPartsLoaded();
    const field = await screen.findByRole('textbox', { name: 'Uncertainty of the observed runoff (± %)' });
    expect(field).toHaveValue('0');
    // None: no interval, but the curve the fit sits on is drawn.
    expect(document.querySelector('[data-answer="fit-interval"]')).toBeNull();
    expect(document.querySelector('[data-layer="runoff-curve"]')).not.toBeNull();
    await user.clear(field);
    await user.type(field, '10');
    expect(scenario().observedUncertaintyPct).toBe(10);
    // For 4 < φ < 12 mm/h the two middle bars (6 and 10 mm, 1 h together) run off: R = 16 − φ·1 h,
    // so φ = 16 − R: 6 mm/h for 10 mm, 7 for 9 mm (−10 %), 5 for 11 mm (+10 %) (Chow et al. 1988, §5.2).
    expect(document.querySelector('[data-answer="fit-interval"]')).toHaveTextContent(
      'Loss rate φ for the observed runoff: 6 mm/h; for it ± 10 %: from 5 mm/h to 7 mm/h.',
    );
    expect(document.querySelector('[data-layer="observed-band"]')).not.toBeNull();
    expect(document.querySelector('[data-layer="fitted-range"]')).not.toBeNull();
    // The fit itself does not change: Fit would still set 6 mm/h.
    expect(document.getElementById('fit-answer')).toHaveTextContent(/Fit would set loss rate φ to 6 mm\/h/);
  });

  it('refuses 100 % or more, and text that is not a number, keeping the uncertainty in use', async () => {
    const { user, scenario } = renderWorkbench({ ...OBSERVED, observedUncertaintyPct: 10 });
    await lazyPartsLoaded();
    const field = await screen.findByRole('textbox', { name: 'Uncertainty of the observed runoff (± %)' });
    await user.clear(field);
    await user.type(field, '150');
    // Written as the interval writes it, "± 10 %" (it read "still 10 ± %", the unit's sign after the number).
    expect(field.closest('.field')).toHaveTextContent(/Not applied; still ± 10 %\./);
    await user.clear(field);
    await user.type(field, 'ten');
    expect(field.closest('.field')).toHaveTextContent(/Not applied/);
    expect(scenario().observedUncertaintyPct).toBe(10);
  });
});
