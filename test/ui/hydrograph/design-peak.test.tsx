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

/**
 * The workbench under φ = 2 mm/h with a triangular unit hydrograph (lag 2.5 h) on 1 km², its
 * design storm a uniform 12 mm in one 1-hour step.
 */
async function uniformTwelveMillimetres() {
  const scenario: Scenario = {
    ...FOUR_BARS,
    method: { kind: 'constant', rateMmH: 2 },
    hydrograph: { ...FOUR_BARS.hydrograph, transform: { kind: 'triangular', lagH: 2.5 } },
  };
  const rendered = renderWorkbench(scenario);
  const { user } = rendered;
  await user.click(screen.getByRole('tab', { name: 'Design storm' }));
  await lazyPartsLoaded();
  await user.click(screen.getByRole('radio', { name: 'Uniform depth' }));
  await retype(user, 'Storm duration (min)', '60');
  await retype(user, 'Time step (min)', '60');
  await retype(user, 'Storm depth (mm)', '12');
  return rendered;
}

describe('the design peak', () => {
  it('a uniform 1-hour design storm of 12 mm under φ = 2 mm/h gives the triangular peak worked by hand', async () => {
    await uniformTwelveMillimetres();
    // One 1-hour bar of 12 mm less 2 mm of loss: 10 mm of excess on 1 km². Triangular, lag 2.5 h:
    // Tp = 0.5 + 2.5 = 3 h, base 8 h; hourly samples sum to 4 peaks, so the peak is
    // ¼ × 1e6 m² × 0.010 m / 3600 s = 0.6944 m³/s at 3 h (= 0.2083·A·Q/Tp, NEH-630 ch. 16, from memory).
    const list = screen.getByLabelText('Design storm totals');
    expect(within(list).getByText('Design peak discharge', { selector: 'dt' }).nextElementSibling).toHaveTextContent(
      '0.6944 m³/s at 3:00 after the storm start',
    );
  });

  it('draws the design hydrograph and pins it to compare, its peak and time to peak in the comparison', async () => {
    const { user } = await uniformTwelveMillimetres();
    // The same case as above, worked by hand: peak 0.6944 m³/s at 3 h.
    const figure = screen.getByRole('figure', { name: 'Design hydrograph' });
    const chart = within(figure).getByRole('img', { name: /^Design direct runoff hydrograph/ });
    expect(chart).toHaveAccessibleName('Design direct runoff hydrograph: peak 0.6944 m³/s 3:00 after the storm start.');
    expect(chart.querySelector('[data-layer="computed-direct"]')?.getAttribute('d')).toMatch(
      /^M[\d.]+,[\d.]+(L[\d.]+,[\d.]+)+$/,
    );

    await user.click(screen.getByRole('button', { name: 'Pin the design result to compare' }));
    await user.click(screen.getByRole('tab', { name: 'Workbench' }));
    await lazyPartsLoaded();
    const table = await screen.findByRole('table', { name: /^Totals of the pinned scenarios/ });
    const cells = (name: string) =>
      within(within(table).getByRole('rowheader', { name }).closest('tr') as HTMLElement).getAllByRole('cell');
    expect(cells('Peak discharge')[0]).toHaveTextContent('0.6944 m³/s');
    expect(cells('Time to peak')[0]).toHaveTextContent('3:00 h:mm');
    expect(
      screen.getByRole('img', { name: /^Hydrograph of Design storm: .*peak 0\.6944 m³\/s 3:00/ }),
    ).toBeInTheDocument();
  });
});
