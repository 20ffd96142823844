// @vitest-environment jsdom
import { screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { alternatingBlockStorm, computeLosses, uniformStorm } from '../../../src/core';
import { formatValue } from '../../../src/ui/format';
import { lazyPartsLoaded, renderWorkbench } from '../../helpers/render';
import { FOUR_EVENTS } from '../../helpers/event-fixtures';
import { FOUR_BARS } from '../../helpers/scenario-fixtures';

async function openDesign(scenario = FOUR_EVENTS) {
  const view = renderWorkbench(scenario);
  await view.user.click(screen.getByRole('tab', { name: 'Design storm' }));
  await lazyPartsLoaded();
  return view;
}

const total = (term: string) => {
  const list = screen.getByLabelText('Design storm totals');
  return within(list).getByText(term, { selector: 'dt' }).nextElementSibling?.textContent;
};

async function retype(user: ReturnType<typeof renderWorkbench>['user'], name: string, text: string) {
  const field = screen.getByRole('textbox', { name });
  await user.clear(field);
  if (text !== '') await user.type(field, text);
  return field;
}

describe('the design storm view', () => {
  it('builds an alternating block storm from the IDF formula typed in, and applies the median φ of the events', async () => {
    const { user } = await openDesign();
    await retype(user, 'a', '900');
    await retype(user, 'Storm duration (min)', '60');
    const idf = { kind: 'a/(t+b)^c', durationUnit: 'min', intensityUnit: 'mm/h', a: 900, b: 10, c: 0.75 } as const;
    const storm = alternatingBlockStorm({ idf, durationH: 1, stepH: 10 / 60, peakFraction: 0.5 });
    const r = computeLosses(storm, { kind: 'constant', rateMmH: 12 });
    expect(screen.getByRole('img', { name: /6 bars, peak intensity/ })).toBeInTheDocument();
    expect(total('Rainfall depth')).toBe(`${formatValue(r.rainMm)} mm`);
    expect(total('Excess depth')).toBe(`${formatValue(r.totalExcessMm)} mm`);
    expect(total('Runoff fraction')).toBe(`${formatValue(r.runoffFraction * 100)} %`);
    expect(screen.getByRole('combobox', { name: 'Loss to apply' })).toHaveDisplayValue(
      /Design value from the events \(Loss rate φ 12 mm\/h\)/,
    );
  });

  it('names the field in its messages and keeps what was typed', async () => {
    const { user } = await openDesign();
    const c = await retype(user, 'c', '1.5');
    expect(screen.getByRole('alert')).toHaveTextContent(
      /^c: The IDF exponent c must be greater than 0 and at most 1 \(got 1.5\)/,
    );
    expect(c).toHaveAttribute('aria-invalid', 'true');
    expect(c).toHaveValue('1.5');
    await retype(user, 'c', '0.75');
    // The defect: the fields are in minutes, the message was in hours ("The storm duration (2.083 h) is not a
    // whole number of time steps of 0.1167 h"): it now speaks the fields' minutes, as typed.
    await retype(user, 'Time step (min)', '7');
    expect(screen.getByRole('alert')).toHaveTextContent(
      'Time step: The storm duration (120 min) is not a whole number of time steps of 7 min; choose a step that divides it.',
    );
    await retype(user, 'Time step (min)', '200');
    expect(screen.getByRole('alert')).toHaveTextContent(
      'Time step: The time step (200 min) is longer than the storm (120 min).',
    );
    await retype(user, 'Time step (min)', '');
    expect(screen.getByRole('alert')).toHaveTextContent('Time step: Enter a number.');
  });

  it('reads an IDF table and says which row and column is wrong', async () => {
    const { user } = await openDesign();
    await user.click(screen.getByRole('radio', { name: 'IDF table, alternating block' }));
    const table = screen.getByRole('textbox', { name: 'IDF table' });
    await user.clear(table);
    await user.type(table, '10 90{enter}30 5x{enter}120 20');
    expect(screen.getByRole('alert')).toHaveTextContent(
      'IDF table, row 2, column 2 (intensity): “5x” is not a plain number; leave out any unit or word.',
    );
    expect(table).toHaveValue('10 90\n30 5x\n120 20');
    await user.clear(table);
    await user.type(table, '10 90{enter}30 52{enter}60 33{enter}120 20');
    expect(screen.queryByRole('alert')).toBeNull();
    expect(screen.getByRole('img', { name: /IDF table: 12 bars/ })).toBeInTheDocument();
  });

  it('makes a uniform storm scaled to a total depth, and puts it on the workbench as one undoable edit', async () => {
    const { user, scenario, actions } = await openDesign(FOUR_BARS);
    await user.click(screen.getByRole('radio', { name: 'Uniform depth' }));
    await retype(user, 'Storm depth (mm)', '30');
    await user.click(screen.getByRole('checkbox', { name: 'Scale to a total depth' }));
    await retype(user, 'Scaled total depth (mm)', '45');
    const storm = uniformStorm({ depthMm: 45, durationH: 2, stepH: 10 / 60 });
    expect(total('Rainfall depth')).toBe('45 mm');
    // No events in FOUR_BARS: the workbench's method (φ = 8 mm/h) is applied, and says so.
    expect(screen.getByText(/No design value yet/)).toBeInTheDocument();
    expect(total('Excess depth')).toBe(
      `${formatValue(computeLosses(storm, { kind: 'constant', rateMmH: 8 }).totalExcessMm)} mm`,
    );
    await user.click(screen.getByRole('button', { name: 'Put the design storm on the workbench' }));
    expect(scenario().storm.depthsMm).toHaveLength(12);
    expect(scenario().storm.depthsMm.reduce((a, b) => a + b, 0)).toBeCloseTo(45, 9);
    expect(scenario().observed).toBeNull();
    actions.undo();
    expect(scenario().storm).toEqual(FOUR_BARS.storm);
  });

  it('follows the SI / US switch: depths in inches, intensities in in/h, the storm the same', async () => {
    const { user, actions } = await openDesign(FOUR_BARS);
    await user.click(screen.getByRole('radio', { name: 'Uniform depth' }));
    await retype(user, 'Storm depth (mm)', '50.8');
    actions.setUnits('us');
    // 50.8 mm = 2 in exactly (1 in = 25.4 mm, NIST SP 811).
    expect(await screen.findByRole('textbox', { name: 'Storm depth (in)' })).toHaveValue('2');
    expect(total('Rainfall depth')).toBe('2 in');
    await retype(user, 'Storm depth (in)', '3');
    // 3 in = 76.2 mm, shown in inches.
    expect(total('Rainfall depth')).toBe('3 in');
    await user.click(screen.getByRole('radio', { name: /IDF formula/ }));
    expect(screen.getByRole('combobox', { name: 'Unit of i' })).toHaveValue('in/h');
    // The invented a = 1200 mm/h·min^c becomes 1200 / 25.4 = 47.2441 in/h·min^c (six significant figures).
    expect(screen.getByRole('textbox', { name: 'a' })).toHaveValue('47.2441');
    actions.setUnits('si');
    expect(await screen.findByRole('textbox', { name: 'a' })).toHaveValue('1,200');
  });
});
