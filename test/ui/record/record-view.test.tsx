// @vitest-environment jsdom
import { screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { lazyPartsLoaded, LAZY_LOAD_MS, renderWorkbench } from '../../helpers/render';
import { FOUR_BARS } from '../../helpers/scenario-fixtures';

// An invented record (no real gauge): eleven bars of 60 min (the paste's step
// for a column without times), 2, 0, 0, 0, 3, 1, 0, 0, 0, 0, 4 mm.
//
// Worked by hand, dry spell 6 h (the view's start): the spells are bars 1–3
// (3 h) and 6–9 (4 h), both shorter, so one event, bars 0–10: 2 + 3 + 1 + 4 =
// 10 mm over 11 h, peak 4 mm/h.
// Dry spell 3 h: both spells separate: events at 0:00 (bar 0, 2 mm, 1 h, peak
// 2 mm/h), 4:00 (bars 4–5, 3 + 1 = 4 mm, 2 h, peak 3 mm/h) and 10:00 (bar 10,
// 4 mm, 1 h, peak 4 mm/h).
// Dry spell 4 h: bars 1–3 (3 h) no longer separate: 0:00 (bars 0–5, 6 mm,
// 6 h, peak 3 mm/h) and 10:00 (4 mm).
// Dry spell 3 h with smallest event 3 mm: the 2 mm event is left out: 4:00 and 10:00.
const RECORD = '2\n0\n0\n0\n3\n1\n0\n0\n0\n0\n4\n';

type User = ReturnType<typeof renderWorkbench>['user'];

async function openView(user: User) {
  await user.click(screen.getByRole('tab', { name: 'Long record' }));
  await lazyPartsLoaded();
  return screen.getByRole('tabpanel', { name: 'Long record' });
}

async function pasteRecord(user: User, text: string) {
  await user.click(screen.getByRole('button', { name: 'Paste rainfall record…' }));
  const dialog = await screen.findByRole('dialog', { name: 'Paste a long rainfall record' }, { timeout: LAZY_LOAD_MS });
  await user.click(within(dialog).getByRole('textbox', { name: 'Rainfall record text' }));
  await user.paste(text);
  const use = within(dialog).getByRole('button', { name: 'Use this record' });
  await waitFor(() => expect(use).toBeEnabled());
  await user.click(use);
}

/** The table's rows as [start, duration, depth, peak]. */
function rows(): string[][] {
  const table = screen.getByRole('table', { name: 'Events found in the record' });
  return within(table)
    .getAllByRole('row')
    .slice(1)
    .map((row) =>
      within(row)
        .getAllByRole('cell')
        .slice(2)
        .map((c) => c.textContent ?? ''),
    );
}

async function setField(user: User, name: RegExp, text: string) {
  const field = screen.getByRole('textbox', { name });
  await user.clear(field);
  await user.type(field, text);
  // Leaving the field ends its typing session (a refusal goes back to the value from before the session).
  await user.tab();
  return field;
}

describe('cutting a long record into events', () => {
  it('is a view of its own beside the event set and the design storm', async () => {
    const { user } = renderWorkbench(FOUR_BARS);
    const tabs = screen.getAllByRole('tab').map((t) => t.textContent);
    expect(tabs).toEqual(['Workbench', 'Rain over runoff', 'Event set', 'Design storm', 'Long record']);
    const view = await openView(user);
    expect(within(view).getByText('No rainfall record yet.', { exact: false })).toBeInTheDocument();
  });

  it('finds the events as the dry spell and the smallest depth change, live', async () => {
    const { user } = renderWorkbench(FOUR_BARS);
    await openView(user);
    await pasteRecord(user, RECORD);
    expect(screen.getByText(/11 bars over 11 h, 10 mm in all/)).toBeInTheDocument();
    expect(screen.getByRole('heading', { name: '1 event found, 1 picked' })).toBeInTheDocument();
    expect(rows()).toEqual([['0:00', '11 h', '10', '4']]);

    await setField(user, /Dry spell that separates events/, '3');
    expect(screen.getByRole('heading', { name: '3 events found, 3 picked' })).toBeInTheDocument();
    expect(rows()).toEqual([
      ['0:00', '1 h', '2', '2'],
      ['4:00', '2 h', '4', '3'],
      ['10:00', '1 h', '4', '4'],
    ]);

    await setField(user, /Dry spell that separates events/, '4');
    expect(rows()).toEqual([
      ['0:00', '6 h', '6', '3'],
      ['10:00', '1 h', '4', '4'],
    ]);

    // Text that is not a number is refused beside the field; the last good value stays in force.
    await setField(user, /Dry spell that separates events/, 'abc');
    expect(screen.getByText(/Not applied; still 4 h\./)).toBeInTheDocument();
    expect(rows()).toHaveLength(2);

    await setField(user, /Dry spell that separates events/, '3');
    await setField(user, /Smallest event kept/, '3');
    expect(rows()).toEqual([
      ['4:00', '2 h', '4', '3'],
      ['10:00', '1 h', '4', '4'],
    ]);
  });

  it('adds the picked events to the event set in one undoable step', async () => {
    const { user, scenario, actions } = renderWorkbench(FOUR_BARS);
    await openView(user);
    await pasteRecord(user, RECORD);
    await setField(user, /Dry spell that separates events/, '3');
    // All are picked at first; leave out the one at 4:00.
    await user.click(screen.getByRole('checkbox', { name: 'Pick event 2, from 4:00' }));
    expect(screen.getByRole('heading', { name: '3 events found, 2 picked' })).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Add 2 picked events to the event set' }));
    const events = scenario().eventSet.events;
    expect(events.map((e) => e.name)).toEqual(['Event from 0:00', 'Event from 10:00']);
    expect(events.map((e) => e.storm.depthsMm)).toEqual([[2], [4]]);
    expect(screen.getByText(/Added 2 events to the event set/)).toBeInTheDocument();
    // The workbench keeps its own storm.
    expect(scenario().storm).toEqual(FOUR_BARS.storm);
    actions.undo();
    expect(scenario().eventSet.events).toEqual([]);
  });

  it('gives each event its window of a streamflow record over the same period', async () => {
    // Hourly discharge from 00:00 to 13:00 (invented), on the rainfall's clock from its start (neither has a date).
    // Dry spell 3 h and 2 h kept after the rain: the event at 4:00 (bars 4–5, 4 h to 6 h) takes 4 h to 8 h,
    // samples 4 to 8: 2, 5, 9, 6, 4 m³/s at 0 to 4 h from its start.
    const q = [1, 1, 1, 1, 2, 5, 9, 6, 4, 3, 2, 2, 1, 1];
    const flowText = q.map((v, h) => `${String(h).padStart(2, '0')}:00\t${v}`).join('\n');
    const { user, scenario } = renderWorkbench(FOUR_BARS);
    await openView(user);
    await pasteRecord(user, RECORD);
    await user.click(screen.getByRole('button', { name: 'Paste streamflow record…' }));
    const dialog = await screen.findByRole(
      'dialog',
      { name: 'Paste a long streamflow record' },
      { timeout: LAZY_LOAD_MS },
    );
    await user.click(within(dialog).getByRole('textbox', { name: 'Streamflow record text' }));
    await user.paste(flowText);
    const use = within(dialog).getByRole('button', { name: 'Use this record' });
    await waitFor(() => expect(use).toBeEnabled());
    await user.click(use);
    expect(screen.getByText(/14 samples over 13 h/)).toBeInTheDocument();
    await setField(user, /Dry spell that separates events/, '3');
    await setField(user, /Streamflow kept after the rain/, '2');
    await user.click(screen.getByRole('checkbox', { name: 'Pick event 1, from 0:00' }));
    await user.click(screen.getByRole('checkbox', { name: 'Pick event 3, from 10:00' }));
    await user.click(screen.getByRole('button', { name: 'Add 1 picked event to the event set' }));
    const flow = scenario().eventSet.events[0]?.streamflow;
    expect(flow?.dischargeM3s).toEqual([2, 5, 9, 6, 4]);
    expect(flow?.timesH).toEqual([0, 1, 2, 3, 4]);
    expect(flow?.offsetH).toBe(0);
  });
});
