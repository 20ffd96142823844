// @vitest-environment jsdom
import { screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { lazyPartsLoaded, renderWorkbench } from '../../helpers/render';
import { FOUR_BARS } from '../../helpers/scenario-fixtures';

const openEvents = async (user: ReturnType<typeof renderWorkbench>['user']) => {
  await user.click(screen.getByRole('tab', { name: 'Event set' }));
  await lazyPartsLoaded();
};
const names = (scenario: ReturnType<ReturnType<typeof renderWorkbench>['scenario']>) =>
  scenario.eventSet.events.map((e) => e.name);

describe('the event list', () => {
  it('opens on the workbench; the event set is a tab of its own', async () => {
    const { user } = renderWorkbench(FOUR_BARS);
    expect(screen.getByRole('tab', { name: 'Workbench' })).toHaveAttribute('aria-selected', 'true');
    expect(screen.getByRole('tabpanel', { name: 'Workbench' })).toBeVisible();
    await openEvents(user);
    expect(screen.getByRole('tabpanel', { name: 'Event set' })).toBeVisible();
    expect(screen.getByText('No events yet.')).toBeInTheDocument();
    // An empty set is not an error: no alert until there are events to fit (it said, in red,
    // "Design value: No event has a fitted value…" before a single event was added).
    expect(screen.queryByRole('alert')).toBeNull();
    expect(screen.getByText('The design value is chosen from the fitted values once events are added.')).toBeVisible();
  });

  it('adds the workbench storm as an event, which follows later workbench edits', async () => {
    const { user, scenario, actions } = renderWorkbench(FOUR_BARS);
    await openEvents(user);
    await user.click(screen.getByRole('button', { name: 'Add the workbench storm as an event' }));
    expect(names(scenario())).toEqual(['Event 1']);
    expect(scenario().eventSet.activeId).toBe('e1');
    expect(screen.getByText('on the workbench')).toBeInTheDocument();
    actions.setBarDepth(0, 7);
    expect(scenario().eventSet.events[0]?.storm.depthsMm).toEqual([7, 6, 10, 2]);
  });

  it('renames, reorders and removes events, each one undo step', async () => {
    const { user, scenario, actions } = renderWorkbench(FOUR_BARS);
    await openEvents(user);
    const add = screen.getByRole('button', { name: 'Add the workbench storm as an event' });
    await user.click(add);
    await user.click(add);
    await user.click(add);
    const second = screen.getByRole('textbox', { name: 'Name of event 2' });
    await user.clear(second);
    await user.type(second, 'Autumn');
    expect(names(scenario())).toEqual(['Event 1', 'Autumn', 'Event 3']);

    await user.click(screen.getByRole('button', { name: 'Move Autumn up' }));
    expect(names(scenario())).toEqual(['Autumn', 'Event 1', 'Event 3']);
    expect(screen.getByRole('button', { name: 'Move Autumn up' })).toBeDisabled();
    await user.click(screen.getByRole('button', { name: 'Move Event 1 down' }));
    expect(names(scenario())).toEqual(['Autumn', 'Event 3', 'Event 1']);

    await user.click(screen.getByRole('button', { name: 'Remove Event 3' }));
    expect(names(scenario())).toEqual(['Autumn', 'Event 1']);
    actions.undo();
    expect(names(scenario())).toEqual(['Autumn', 'Event 3', 'Event 1']);
    actions.undo();
    expect(names(scenario())).toEqual(['Autumn', 'Event 1', 'Event 3']);
  });

  it('puts another event on the workbench, bringing its storm and observed runoff', async () => {
    const { user, scenario, actions } = renderWorkbench(FOUR_BARS);
    await openEvents(user);
    await user.click(screen.getByRole('button', { name: 'Add the workbench storm as an event' }));
    actions.setObserved({ as: 'depth', value: 4, parameter: 'rateMmH' });
    await user.click(screen.getByRole('button', { name: 'Add the workbench storm as an event' }));
    actions.setBarDepth(2, 0);
    actions.setObserved({ value: 1 });
    const list = screen.getByRole('region', { name: 'Events of this catchment' });
    await user.click(within(list).getByRole('button', { name: 'Put Event 1 on the workbench' }));
    expect(scenario().storm.depthsMm).toEqual([2, 6, 10, 2]);
    expect(scenario().observed?.value).toBe(4);
    expect(scenario().eventSet.events[1]?.storm.depthsMm).toEqual([2, 6, 0, 2]);
    expect(scenario().eventSet.events[1]?.observed).toEqual({ as: 'depth', value: 1 });
  });
});
