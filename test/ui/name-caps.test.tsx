// @vitest-environment jsdom
import { screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { lazyPartsLoaded, renderWorkbench } from '../helpers/render';
import { FOUR_EVENTS } from '../helpers/event-fixtures';
import { FOUR_BARS } from '../helpers/scenario-fixtures';

// A name over 200 characters (src/scenario/text-limits.ts) stays in its field
// with the reason beside it; the stored name is the last one that fitted.
// Before, the field stored any length, and the document then broke the
// schema's cap on the next reading.

const LONG = 'n'.repeat(200);

describe('name fields keep within the cap, with a message', () => {
  it('the scenario name', async () => {
    const { user, scenario } = renderWorkbench();
    await lazyPartsLoaded();
    const field = screen.getByRole('textbox', { name: 'Scenario name' });
    await user.clear(field);
    await user.click(field);
    await user.paste(LONG);
    expect(scenario().name).toBe(LONG);
    await user.type(field, 'x');
    expect(field).toHaveValue(`${LONG}x`);
    expect(field).toHaveAttribute('aria-invalid', 'true');
    expect(field).toHaveAccessibleDescription('The scenario name has 201 characters; it may have at most 200.');
    expect(scenario().name).toBe(LONG);
    // Back under the cap, the message goes and the name is stored.
    await user.type(field, '{Backspace}{Backspace}');
    expect(field).not.toHaveAttribute('aria-invalid');
    expect(scenario().name).toBe('n'.repeat(199));
  });

  it('an event name', async () => {
    const { user, scenario } = renderWorkbench(FOUR_EVENTS);
    await lazyPartsLoaded();
    await user.click(screen.getByRole('tab', { name: 'Event set' }));
    await lazyPartsLoaded();
    const field = screen.getByRole('textbox', { name: 'Name of event 2' });
    const before = scenario().eventSet.events[1]?.name;
    await user.click(field);
    await user.paste('e'.repeat(250));
    expect(field).toHaveAccessibleDescription(
      `The name of event 2 has ${((before?.length ?? 0) + 250).toLocaleString('en-US')} characters; it may have at most 200.`,
    );
    expect(scenario().eventSet.events[1]?.name).toBe(before);
  });

  it('the stored name is never over the cap, so the saved copy always reads back', () => {
    const { actions, scenario } = renderWorkbench(FOUR_BARS);
    expect(() => actions.setName('n'.repeat(201))).toThrow('The scenario name has 201 characters');
    expect(scenario()).toBe(FOUR_BARS);
  });
});
