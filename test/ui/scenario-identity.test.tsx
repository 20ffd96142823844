// @vitest-environment jsdom
// The demo's identity does not leak into the user's work (issue 16): a blank
// "New scenario" in the user's units; catchment name and notes that can be
// edited; a storm pasted over the demo clears the demo's name, catchment,
// notes and observed runoff (and the dialog says so first); an event of the
// event set on the workbench is named, and replacing its storm says so.
import { screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { DEMO_SCENARIO } from '../../src/scenario';
import { FOUR_EVENTS } from '../helpers/event-fixtures';
import { renderWorkbench } from '../helpers/render';
import { FOUR_BARS } from '../helpers/scenario-fixtures';

// The machine running the tests may be busy: the paste dialog's code loads on first use.
const SLOW = { timeout: 15_000 };

async function pasteBars(user: ReturnType<typeof renderWorkbench>['user'], text: string) {
  await user.click(screen.getByRole('button', { name: 'Paste rainfall…' }));
  const dialog = await screen.findByRole('dialog', { name: 'Paste rainfall' }, SLOW);
  await user.click(within(dialog).getByRole('textbox', { name: 'Rainfall text' }));
  await user.paste(text);
  return dialog;
}

describe('a new scenario', () => {
  it('is blank, in the units the user works in, and Undo brings the old one back', async () => {
    const { user, scenario } = renderWorkbench({ ...DEMO_SCENARIO, units: 'us' });
    await user.click(screen.getByRole('button', { name: 'New scenario' }));
    const s = scenario();
    expect(s.name).toBe('');
    expect(s.notes).toBe('');
    expect(s.catchment).toEqual({ name: '', areaM2: 0 });
    expect(s.storm).toEqual({ durationsH: [], depthsMm: [] });
    expect(s.observed).toBeNull();
    expect(s.units).toBe('us');
    expect(screen.getByRole('textbox', { name: 'Scenario name' })).toHaveValue('');
    expect(screen.getByRole('textbox', { name: 'Catchment name' })).toHaveValue('');
    expect(screen.getByText('No rainfall bars yet')).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Undo' }));
    expect(scenario().name).toBe(DEMO_SCENARIO.name);
  });
});

describe('catchment name and notes', () => {
  it('are fields of their own, stored as typed, each edit a named undo step', async () => {
    const { user, scenario, store } = renderWorkbench(FOUR_BARS);
    const name = screen.getByRole('textbox', { name: 'Catchment name' });
    await user.clear(name);
    await user.type(name, 'Upper Weir Creek');
    expect(scenario().catchment.name).toBe('Upper Weir Creek');
    expect(store.getState().undoLabel).toBe('Rename catchment');
    const notes = screen.getByRole('textbox', { name: 'Notes' });
    await user.clear(notes);
    await user.type(notes, 'Gauge moved in 2019.');
    expect(scenario().notes).toBe('Gauge moved in 2019.');
    expect(store.getState().undoLabel).toBe('Edit notes');
  });

  it('refuse notes over their cap with a message, keeping the stored text', async () => {
    const { user, scenario } = renderWorkbench(FOUR_BARS);
    const notes = screen.getByRole('textbox', { name: 'Notes' });
    await user.clear(notes);
    await user.click(notes);
    await user.paste('x'.repeat(10_001));
    expect(notes).toHaveAttribute('aria-invalid', 'true');
    expect(screen.getByText('The notes has 10,001 characters; it may have at most 10,000.')).toBeInTheDocument();
    expect(scenario().notes).toBe('');
  });
});

describe('a storm pasted over the demo', () => {
  it('clears the demo’s name, catchment, notes and observed runoff, and the dialog says so before', async () => {
    const { user, scenario } = renderWorkbench(DEMO_SCENARIO);
    const dialog = await pasteBars(user, '1.5\n2.5\n4\n2\n');
    expect(
      within(dialog).getByText(/The invented demo’s name, catchment, notes and observed runoff are cleared with it/),
    ).toBeInTheDocument();
    const use = within(dialog).getByRole('button', { name: 'Use these bars' });
    await waitFor(() => expect(use).toBeEnabled());
    await user.click(use);
    const s = scenario();
    expect(s.storm.depthsMm).toEqual([1.5, 2.5, 4, 2]);
    expect(s.name).toBe('');
    expect(s.notes).toBe('');
    // The area stays (on screen to change): the README's sample files are for the demo's catchment.
    expect(s.catchment).toEqual({ name: '', areaM2: DEMO_SCENARIO.catchment.areaM2 });
    expect(s.observed).toBeNull();
    // The method in use stays.
    expect(s.method).toEqual(DEMO_SCENARIO.method);
  }, 30_000);

  it('over the user’s own scenario, keeps its name, catchment and notes', async () => {
    const own = { ...FOUR_BARS, name: 'My storm', notes: 'mine', catchment: { name: 'Mine', areaM2: 1e6 } };
    const { user, scenario } = renderWorkbench(own);
    const dialog = await pasteBars(user, '1.5\n2.5\n4\n2\n');
    expect(within(dialog).queryByText(/invented demo/)).toBeNull();
    const use = within(dialog).getByRole('button', { name: 'Use these bars' });
    await waitFor(() => expect(use).toBeEnabled());
    await user.click(use);
    expect(scenario()).toMatchObject({ name: 'My storm', notes: 'mine', catchment: { name: 'Mine', areaM2: 1e6 } });
  }, 30_000);
});

describe('an event of the event set on the workbench', () => {
  it('is named over the rainfall ("Editing event 2 of 4"), and the paste dialog says the event will change', async () => {
    const { user } = renderWorkbench({ ...FOUR_EVENTS, eventSet: { ...FOUR_EVENTS.eventSet, activeId: 'e2' } });
    expect(screen.getByText('Editing event 2 of 4: Middle (invented)')).toBeInTheDocument();
    const dialog = await pasteBars(user, '1\n2\n');
    expect(
      within(dialog).getByText(/The new storm becomes event 2 of 4 \(“Middle \(invented\)”\) in the event set\./),
    ).toBeInTheDocument();
  }, 30_000);

  it('is not claimed when the workbench holds a storm of its own', () => {
    renderWorkbench(FOUR_EVENTS);
    expect(screen.queryByText(/Editing event/)).toBeNull();
  });
});
