// @vitest-environment jsdom
import { screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { totalDepthMm } from '../../../src/core';
import { expectAllClose, expectClose } from '../../helpers/tolerance';
import { lazyPartsLoaded, renderWorkbench } from '../../helpers/render';
import { FOUR_BARS } from '../../helpers/scenario-fixtures';

async function openTools(user: ReturnType<typeof renderWorkbench>['user']) {
  const button = screen.getByRole('button', { name: 'Storm tools' });
  expect(button).toHaveAttribute('aria-expanded', 'false');
  await user.click(button);
  expect(button).toHaveAttribute('aria-expanded', 'true');
  await lazyPartsLoaded();
  return screen.getByRole('region', { name: 'Storm tools' });
}

async function fill(user: ReturnType<typeof renderWorkbench>['user'], field: HTMLElement, text: string) {
  await user.clear(field);
  await user.type(field, text);
}

describe('storm tools', () => {
  it('scale every bar by a factor, as one named undo step', async () => {
    const { user, scenario, store } = renderWorkbench();
    const tools = await openTools(user);
    await fill(user, within(tools).getByRole('textbox', { name: 'Scale factor' }), '1.5');
    await user.click(within(tools).getByRole('button', { name: 'Scale bars' }));
    expect(scenario().storm.depthsMm).toEqual([3, 9, 15, 3]);
    expect(store.getState().undoLabel).toBe('Scale storm by 1.5');
    expect(within(tools).getByRole('status')).toHaveTextContent(
      'Every bar multiplied by 1.5: the storm now holds 30 mm.',
    );
  });

  it('the total depth field follows the storm after a scaling and its undo, but keeps what the user typed', async () => {
    const { user } = renderWorkbench();
    const tools = await openTools(user);
    const total = within(tools).getByRole('textbox', { name: 'Total depth (mm)' });
    // FOUR_BARS holds 2 + 6 + 10 + 2 = 20 mm; ×1.5 gives 30 mm.
    expect(total).toHaveValue('20');
    await fill(user, within(tools).getByRole('textbox', { name: 'Scale factor' }), '1.5');
    await user.click(within(tools).getByRole('button', { name: 'Scale bars' }));
    expect(total).toHaveValue('30');
    await user.click(screen.getByRole('button', { name: /^Undo/ }));
    expect(total).toHaveValue('20');
    // Typed text is the user's: a later change to the storm leaves it as typed.
    await fill(user, total, '45');
    await user.click(within(tools).getByRole('button', { name: 'Scale bars' }));
    expect(total).toHaveValue('45');
  });

  it('a factor that is not a number is refused beside its field and the storm is kept', async () => {
    const { user, scenario } = renderWorkbench();
    const tools = await openTools(user);
    const field = within(tools).getByRole('textbox', { name: 'Scale factor' });
    await fill(user, field, 'double');
    await user.click(within(tools).getByRole('button', { name: 'Scale bars' }));
    expect(field).toHaveAttribute('aria-invalid', 'true');
    expect(field).toHaveAccessibleDescription('“double” is not a number.');
    expect(field).toHaveValue('double');
    expect(scenario().storm).toBe(FOUR_BARS.storm);
  });

  it('a factor of 0 is refused, saying why and what to do instead, and the storm keeps its shape to scale later', async () => {
    const { user, scenario, store } = renderWorkbench();
    const tools = await openTools(user);
    const field = within(tools).getByRole('textbox', { name: 'Scale factor' });
    await fill(user, field, '0');
    await user.click(within(tools).getByRole('button', { name: 'Scale bars' }));
    expect(field).toHaveAttribute('aria-invalid', 'true');
    expect(field).toHaveAccessibleDescription(
      'A factor of 0 would leave every bar dry, and no later scaling could bring the storm’s pattern back: nothing is changed. To remove the rain, use Clear storm; to go back a step, Undo.',
    );
    expect(field).toHaveValue('0');
    expect(scenario().storm).toBe(FOUR_BARS.storm);
    expect(store.getState().undoLabel).toBeNull();
    // The shape is still there to scale: 50 mm over a total of 2 + 6 + 10 + 2 = 20 mm is × 2.5,
    // so the bars become 5, 15, 25 and 5 mm.
    await fill(user, within(tools).getByRole('textbox', { name: 'Total depth (mm)' }), '50');
    await user.click(within(tools).getByRole('button', { name: 'Set total depth' }));
    expect(scenario().storm.depthsMm).toEqual([5, 15, 25, 5]);
  });

  it('a total depth of 0 is refused the same way, in the units on screen', async () => {
    const { user, scenario, store } = renderWorkbench({ ...FOUR_BARS, units: 'us' });
    const tools = await openTools(user);
    const field = within(tools).getByRole('textbox', { name: 'Total depth (in)' });
    await fill(user, field, '0');
    await user.keyboard('{Enter}');
    expect(field).toHaveAttribute('aria-invalid', 'true');
    // The field's hint (the storm's total now, 20 mm / 25.4 = 0.7874 in) comes first.
    expect(field).toHaveAccessibleDescription(
      'Now 0.7874 in A total of 0 in would leave every bar dry, and no later scaling could bring the storm’s pattern back: nothing is changed. To remove the rain, use Clear storm; to go back a step, Undo.',
    );
    expect(field).toHaveValue('0');
    expect(scenario().storm).toBe(FOUR_BARS.storm);
    expect(store.getState().undoLabel).toBeNull();
  });

  it('a factor so small that a bar’s rain would lose its digits is refused, naming the bar', async () => {
    const { user, scenario } = renderWorkbench();
    const tools = await openTools(user);
    const field = within(tools).getByRole('textbox', { name: 'Scale factor' });
    // Bar 1: 2 mm × 1e-308 = 2e-308 mm, under 2^-1022 ≈ 2.2251e-308, the smallest depth a double holds in full.
    await fill(user, field, '1e-308');
    await user.click(within(tools).getByRole('button', { name: 'Scale bars' }));
    expect(field).toHaveAttribute('aria-invalid', 'true');
    expect(field).toHaveAccessibleDescription(
      'A factor of 1e-308 would leave bar 1 with too little rain to hold its share of the storm’s pattern, and no later scaling could bring it back: nothing is changed. Use a larger factor; to go back a step, Undo.',
    );
    expect(scenario().storm).toBe(FOUR_BARS.storm);
  });

  it('set the total depth, keeping the storm’s shape (in the units on screen)', async () => {
    const { user, scenario, store } = renderWorkbench({ ...FOUR_BARS, units: 'us' });
    const tools = await openTools(user);
    const field = within(tools).getByRole('textbox', { name: 'Total depth (in)' });
    await fill(user, field, '2');
    await user.keyboard('{Enter}');
    expectClose(totalDepthMm(scenario().storm), 50.8, 1e-12);
    expectAllClose(scenario().storm.depthsMm, [5.08, 15.24, 25.4, 5.08], 1e-12);
    expect(store.getState().undoLabel).toBe('Set total depth to 2 in');
  });

  it('a switch of units rewrites the total depth field in the new unit, so nothing typed is read in the wrong one', async () => {
    const { user } = renderWorkbench();
    const tools = await openTools(user);
    expect(within(tools).getByRole('textbox', { name: 'Total depth (mm)' })).toHaveValue('20');
    await user.click(screen.getByRole('radio', { name: 'US customary' }));
    expect(within(tools).getByRole('textbox', { name: 'Total depth (in)' })).toHaveValue('0.787402');
  });

  it('resample to another step with the depth kept, in one step', async () => {
    const { user, scenario, store } = renderWorkbench();
    const tools = await openTools(user);
    await fill(user, within(tools).getByRole('textbox', { name: 'New time step (min)' }), '20');
    await user.click(within(tools).getByRole('button', { name: 'Resample' }));
    // 2 h in 20-min bars, each taking the rain of its span from the half-hours at 4, 12, 20, 4 mm/h:
    // 4/3; 10 min at 4 + 10 min at 12 = 2/3 + 2; 4; 20/3; 10 min at 20 + 10 min at 4 = 10/3 + 2/3; 4/3.
    expectAllClose(scenario().storm.depthsMm, [4 / 3, 8 / 3, 4, 20 / 3, 4, 4 / 3], 1e-12);
    expectClose(totalDepthMm(scenario().storm), 20, 1e-12);
    expect(scenario().storm.durationsH).toEqual(Array(6).fill(1 / 3));
    expect(store.getState().undoLabel).toBe('Resample to 20-min bars');
    expect(within(tools).getByRole('status')).toHaveTextContent('Now 6 bars of 20 min; 20 mm kept.');
    await user.click(screen.getByRole('button', { name: 'Undo' }));
    expect(scenario().storm).toBe(FOUR_BARS.storm);
  });

  it('a step that would make too many bars is refused with the core’s reason', async () => {
    // Invented: one bar of 300 h. A step of 0.017 min (1.02 s) would make 300 × 60 / 0.017 = 1,058,824 bars.
    const long = { ...FOUR_BARS, storm: { durationsH: [300], depthsMm: [50] } };
    const { user, scenario } = renderWorkbench(long);
    const tools = await openTools(user);
    const field = within(tools).getByRole('textbox', { name: 'New time step (min)' });
    await fill(user, field, '0.017');
    await user.click(within(tools).getByRole('button', { name: 'Resample' }));
    expect(field).toHaveAccessibleDescription(/makes more than 1000000 bars/);
    expect(scenario().storm).toBe(long.storm);
  });

  it('a step shorter than a second is refused before the core is asked', async () => {
    const { user, scenario } = renderWorkbench();
    const tools = await openTools(user);
    const field = within(tools).getByRole('textbox', { name: 'New time step (min)' });
    // 0.0001 min = 0.006 s.
    await fill(user, field, '0.0001');
    await user.click(within(tools).getByRole('button', { name: 'Resample' }));
    // One second is 1/60 min = 0.01667 min to four figures.
    expect(field).toHaveAccessibleDescription(
      /“0\.0001” min is less than a bar or time step can be \(at least 0\.01667 min\)/,
    );
    expect(scenario().storm).toBe(FOUR_BARS.storm);
  });

  it('set and clear the start time; bad text is refused and kept', async () => {
    const { user, scenario, store } = renderWorkbench();
    const tools = await openTools(user);
    const field = within(tools).getByRole('textbox', { name: 'Storm start' });
    expect(within(tools).getByRole('button', { name: 'Clear start' })).toBeDisabled();
    await fill(user, field, '14/07/2026 09:00');
    await user.click(within(tools).getByRole('button', { name: 'Set start' }));
    expect(field).toHaveAccessibleDescription(/write it as YYYY-MM-DD HH:MM/);
    expect(scenario().storm.startIso).toBeUndefined();
    await fill(user, field, '2026-07-14 09:00');
    await user.click(within(tools).getByRole('button', { name: 'Set start' }));
    expect(scenario().storm.startIso).toBe('2026-07-14T09:00:00');
    expect(store.getState().undoLabel).toBe('Set storm start time');
    // The bar table and chart now show clock times.
    expect(screen.getByRole('grid', { name: 'Bar table' })).toHaveTextContent('09:30');
    await user.click(within(tools).getByRole('button', { name: 'Clear start' }));
    expect(scenario().storm.startIso).toBeUndefined();
    expect(store.getState().undoLabel).toBe('Clear storm start time');
  });

  it('clear the storm, and Undo brings every bar back', async () => {
    const { user, scenario, store } = renderWorkbench();
    const tools = await openTools(user);
    await user.click(within(tools).getByRole('button', { name: 'Clear storm' }));
    expect(scenario().storm).toEqual({ durationsH: [], depthsMm: [] });
    expect(store.getState().undoLabel).toBe('Clear storm');
    expect(within(tools).getByRole('status')).toHaveTextContent('All 4 bars removed. Undo brings them back.');
    expect(screen.getByLabelText('Rainfall depth')).toHaveTextContent('0 mm');
    await user.click(screen.getByRole('button', { name: 'Undo' }));
    expect(scenario().storm).toBe(FOUR_BARS.storm);
  });

  it('tools that need bars say so on an empty storm', async () => {
    const { user, scenario } = renderWorkbench({ ...FOUR_BARS, storm: { durationsH: [], depthsMm: [] } });
    const tools = await openTools(user);
    await user.click(within(tools).getByRole('button', { name: 'Scale bars' }));
    expect(within(tools).getByRole('textbox', { name: 'Scale factor' })).toHaveAccessibleDescription(
      'The storm has no bars yet.',
    );
    expect(within(tools).getByRole('button', { name: 'Clear storm' })).toBeDisabled();
    expect(scenario().storm).toEqual({ durationsH: [], depthsMm: [] });
  });
});
