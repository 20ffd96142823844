// @vitest-environment jsdom
import { act, screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { LAZY_LOAD_MS, renderWorkbench } from '../../helpers/render';
import { FOUR_BARS } from '../../helpers/scenario-fixtures';

describe('the mass curve toggle on the hyetograph', () => {
  it('is off at first; on, it draws cumulative rain, loss and excess with their totals said in words (worked by hand)', async () => {
    const { user, actions } = renderWorkbench(FOUR_BARS);
    const toggle = screen.getByRole('button', { name: 'Mass curve' });
    expect(toggle).toHaveAttribute('aria-pressed', 'false');
    expect(document.querySelector('[data-layer="mass-curve"]')).toBeNull();

    await user.click(toggle);
    expect(toggle).toHaveAttribute('aria-pressed', 'true');
    // 2 + 6 + 10 + 2 = 20 mm of rain; φ = 8 mm/h over 0.5 h bars loses min(P, 4): 2 + 4 + 4 + 2 = 12 mm; excess 8 mm.
    const curve = await screen.findByRole('img', { name: /^Mass curve/ }, { timeout: LAZY_LOAD_MS });
    expect(curve).toHaveAccessibleName(
      'Mass curve, cumulative depth from the storm start: by the end 20 mm of rainfall, 12 mm of loss, 8 mm of excess.',
    );
    const legend = screen.getByRole('list', { name: 'Mass curve legend' });
    expect(
      within(legend)
        .getAllByRole('listitem')
        .map((li) => li.textContent?.trim()),
    ).toEqual([
      'Cumulative depth (mm), scale at right:',
      'Cumulative rainfall',
      'Cumulative loss',
      'Cumulative excess',
    ]);
    // Three lines, each from the storm start to its end.
    for (const key of ['rainMm', 'lossMm', 'excessMm']) {
      const d = document.querySelector(`[data-curve="${key}"] .mass-curve__line`)?.getAttribute('d') ?? '';
      expect(d).toMatch(/^M[\d.]+,[\d.]+(L[\d.]+,[\d.]+){4}$/);
    }

    // It follows the loss: at φ = 4 mm/h each bar loses min(P, 2) = 2, 2, 2, 2 mm, 8 mm in all; excess 12 mm.
    act(() => actions.setParam('rateMmH', 4));
    expect(
      await screen.findByRole(
        'img',
        {
          name: 'Mass curve, cumulative depth from the storm start: by the end 20 mm of rainfall, 8 mm of loss, 12 mm of excess.',
        },
        { timeout: LAZY_LOAD_MS },
      ),
    ).toBeInTheDocument();

    await user.click(toggle);
    expect(toggle).toHaveAttribute('aria-pressed', 'false');
    expect(document.querySelector('[data-layer="mass-curve"]')).toBeNull();
  });

  it('in US units the scale and the words are in inches', async () => {
    const { user } = renderWorkbench({ ...FOUR_BARS, units: 'us' });
    await user.click(screen.getByRole('button', { name: 'Mass curve' }));
    // 20 mm / 25.4 mm per inch = 0.7874 in; 12 mm = 0.4724 in; 8 mm = 0.315 in (four significant figures).
    expect(
      await screen.findByRole(
        'img',
        {
          name: 'Mass curve, cumulative depth from the storm start: by the end 0.7874 in of rainfall, 0.4724 in of loss, 0.315 in of excess.',
        },
        { timeout: LAZY_LOAD_MS },
      ),
    ).toBeInTheDocument();
    expect(screen.getByRole('list', { name: 'Mass curve legend' })).toHaveTextContent('Cumulative depth (in)');
  });
});
