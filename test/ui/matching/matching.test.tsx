// @vitest-environment jsdom
import { screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { calibrate, convertVolume } from '../../../src/core';
import { coreTotals, mmText, renderWorkbench } from '../../helpers/render';
import { FOUR_BARS } from '../../helpers/scenario-fixtures';

const rate = (s: { method: unknown }) => (s.method as { rateMmH: number }).rateMmH;

describe('matching an observed runoff', () => {
  it('Fit sets the loss rate exactly to the core’s answer and the line jumps there', async () => {
    const { user, scenario } = renderWorkbench();
    await user.type(screen.getByRole('textbox', { name: 'Observed runoff (mm)' }), '4.5');
    await user.click(screen.getByRole('button', { name: 'Fit' }));
    const expected = calibrate(FOUR_BARS.storm, FOUR_BARS.method, 'rateMmH', 4.5);
    if (!expected.ok) throw new Error(expected.message);
    expect(rate(scenario())).toBe(expected.value);
    expect(Number(screen.getByRole('slider', { name: 'Loss rate φ' }).getAttribute('aria-valuenow'))).toBe(
      expected.value,
    );
    expect(screen.getByLabelText('Excess depth')).toHaveTextContent(mmText(4.5));
    expect(screen.getByText(/^Fitted: loss rate φ is /)).toBeInTheDocument();
  });

  it('with no answer the core’s reason stands next to the observed runoff, and Fit is off', async () => {
    const { user, scenario } = renderWorkbench();
    const observed = screen.getByRole('textbox', { name: 'Observed runoff (mm)' });
    await user.type(observed, '25');
    expect(observed).toHaveAccessibleDescription(/more than the storm's rainfall \(20 mm\); no loss can produce it/);
    expect(screen.getByRole('button', { name: 'Fit' })).toBeDisabled();
    expect(rate(scenario())).toBe(8);
  });

  it('an out-of-reach parameter is explained in the core’s words', async () => {
    const { user } = renderWorkbench({
      ...FOUR_BARS,
      method: { kind: 'initial-continuing', initialMm: 0, rateMmH: 30 },
    });
    await user.type(screen.getByRole('textbox', { name: 'Observed runoff (mm)' }), '5');
    await user.selectOptions(screen.getByRole('combobox', { name: 'Parameter to fit' }), 'initialMm');
    const expected = calibrate(
      FOUR_BARS.storm,
      { kind: 'initial-continuing', initialMm: 0, rateMmH: 30 },
      'initialMm',
      5,
    );
    expect(expected.ok).toBe(false);
    expect(screen.getByRole('textbox', { name: 'Observed runoff (mm)' })).toHaveAccessibleDescription(
      !expected.ok ? expected.message : '',
    );
  });

  it('a negative observed runoff is refused with a message and the typed text stays', async () => {
    const { user, scenario } = renderWorkbench();
    const observed = screen.getByRole('textbox', { name: 'Observed runoff (mm)' });
    await user.type(observed, '-3');
    expect(observed).toHaveValue('-3');
    expect(observed).toHaveAccessibleDescription(
      '“-3” mm: a rainfall or runoff depth cannot be negative. Not applied.',
    );
    expect(scenario().observed).toBeNull();
  });

  it('keep matched: the line follows the observed runoff as a bar changes', async () => {
    const { user, actions, scenario, store } = renderWorkbench();
    await user.type(screen.getByRole('textbox', { name: 'Observed runoff (mm)' }), '4.5');
    await user.click(screen.getByRole('switch', { name: 'Keep matched' }));
    const line = screen.getByRole('slider', { name: 'Loss rate φ' });
    expect(line).toHaveAttribute('aria-disabled', 'true');
    expect(screen.getByLabelText('Excess depth')).toHaveTextContent(mmText(4.5));
    actions.setBarDepth(2, 16);
    const expected = calibrate(scenario().storm, scenario().method, 'rateMmH', 4.5);
    if (!expected.ok) throw new Error(expected.message);
    expect(await screen.findByText(/^Matched: /)).toBeInTheDocument();
    expect(Number(line.getAttribute('aria-valuenow'))).toBe(expected.value);
    expect(screen.getByLabelText('Excess depth')).toHaveTextContent(mmText(4.5));
    expect(screen.getByRole('textbox', { name: 'Loss rate φ (mm/h)' })).toHaveAttribute('readonly');
    // The locked line does not move from the keyboard.
    line.focus();
    await user.keyboard('{ArrowUp}');
    expect(store.derived.effectiveMethod(scenario())).toEqual(expected.method);
    // Turning the lock off keeps the matched value.
    await user.click(screen.getByRole('switch', { name: 'Keep matched' }));
    expect(rate(scenario())).toBe(expected.value);
    expect(line).not.toHaveAttribute('aria-disabled');
  });

  it('an observed volume needs the catchment area and is matched as a depth over it', async () => {
    const { user, scenario } = renderWorkbench({ ...FOUR_BARS, catchment: { name: '', areaM2: 0 } });
    await user.click(screen.getByRole('radio', { name: 'Volume' }));
    await user.selectOptions(screen.getByRole('combobox', { name: 'Volume unit' }), 'ML');
    const observed = screen.getByRole('textbox', { name: 'Observed runoff' });
    await user.type(observed, '4.5');
    expect(scenario().observed?.value).toBe(convertVolume(4.5, 'ML', 'm3'));
    expect(observed).toHaveAccessibleDescription(/Enter the catchment area/);
    // The hint sends the user to the panel that holds the area, by the heading it shows.
    expect(observed).toHaveAccessibleDescription(/Spread over the catchment area \(set under Catchment and notes\)/);
    expect(screen.getByRole('heading', { name: 'Catchment and notes' })).toBeInTheDocument();
    const area = screen.getByRole('textbox', { name: 'Catchment area' });
    await user.selectOptions(screen.getByRole('combobox', { name: 'Area unit' }), 'km2');
    await user.type(area, '1');
    expect(scenario().catchment.areaM2).toBe(1e6);
    expect(observed).toHaveAccessibleDescription(/4\.5 mm over the catchment area/);
    await user.click(screen.getByRole('button', { name: 'Fit' }));
    const expected = calibrate(FOUR_BARS.storm, FOUR_BARS.method, 'rateMmH', 4.5);
    expect(expected.ok && rate(scenario())).toBe(expected.ok && expected.value);
    expect(screen.getByLabelText('Runoff volume')).toHaveTextContent('4,500 m³');
  });

  it('switching between depth and volume keeps the same runoff', async () => {
    const { user, scenario } = renderWorkbench({
      ...FOUR_BARS,
      observed: { as: 'depth', value: 4.5, parameter: 'rateMmH', locked: false },
    });
    await user.click(screen.getByRole('radio', { name: 'Volume' }));
    expect(scenario().observed).toMatchObject({ as: 'volume', value: 4500 });
    await user.click(screen.getByRole('radio', { name: 'Depth' }));
    expect(scenario().observed).toMatchObject({ as: 'depth', value: 4.5 });
  });

  it('the results stay the core’s while matched through a method switch', async () => {
    const { user, scenario } = renderWorkbench({
      ...FOUR_BARS,
      observed: { as: 'depth', value: 4.5, parameter: 'rateMmH', locked: true },
    });
    await user.selectOptions(screen.getByRole('combobox', { name: 'Loss method' }), 'proportional');
    expect(screen.getByRole('combobox', { name: 'Parameter to fit' })).toHaveValue('coefficient');
    const expected = calibrate(FOUR_BARS.storm, { kind: 'proportional', coefficient: 0.4 }, 'coefficient', 4.5);
    if (!expected.ok) throw new Error(expected.message);
    expect(screen.getByRole('textbox', { name: 'Runoff coefficient' })).toHaveValue(
      String(Number(expected.value.toPrecision(6))),
    );
    expect(screen.getByLabelText('Excess depth')).toHaveTextContent(
      mmText(coreTotals(scenario().storm, expected.method).totalExcessMm),
    );
  });
});
