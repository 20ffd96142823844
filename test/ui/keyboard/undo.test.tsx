// @vitest-environment jsdom
import { screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { renderWorkbench } from '../../helpers/render';
import { FOUR_BARS } from '../../helpers/scenario-fixtures';

const rate = (s: { method: unknown }) => (s.method as { rateMmH: number }).rateMmH;

describe('undo and redo', () => {
  it('the buttons undo and redo, and say what they would change', async () => {
    const { user, scenario } = renderWorkbench();
    const undo = screen.getByRole('button', { name: 'Undo' });
    const redo = screen.getByRole('button', { name: 'Redo' });
    expect(undo).toBeDisabled();
    expect(redo).toBeDisabled();
    await user.click(screen.getByRole('radio', { name: 'US customary' }));
    expect(undo).toHaveAccessibleDescription('Undo: Show US customary units (Ctrl+Z)');
    await user.click(undo);
    expect(scenario().units).toBe('si');
    expect(redo).toBeEnabled();
    await user.click(redo);
    expect(scenario().units).toBe('us');
  });

  it('Ctrl+Z undoes, Ctrl+Shift+Z and Ctrl+Y redo', async () => {
    const { user, scenario, actions } = renderWorkbench();
    actions.setParam('rateMmH', 3);
    actions.setBarDepth(0, 7);
    await user.keyboard('{Control>}z{/Control}');
    expect(scenario().storm.depthsMm[0]).toBe(2);
    await user.keyboard('{Control>}z{/Control}');
    expect(rate(scenario())).toBe(8);
    await user.keyboard('{Control>}{Shift>}z{/Shift}{/Control}');
    expect(rate(scenario())).toBe(3);
    await user.keyboard('{Control>}y{/Control}');
    expect(scenario().storm.depthsMm[0]).toBe(7);
  });

  it('undo reaches a drag of the line as one step', async () => {
    const { user, actions, scenario } = renderWorkbench();
    actions.beginGesture('Drag loss rate φ');
    actions.setParam('rateMmH', 6);
    actions.setParam('rateMmH', 4);
    actions.endGesture();
    await user.keyboard('{Control>}z{/Control}');
    expect(rate(scenario())).toBe(8);
    expect(screen.getByRole('slider', { name: 'Loss rate φ' })).toHaveAttribute('aria-valuenow', '8');
  });

  it('inside a text field, Ctrl+Z is left to the field', async () => {
    const { user, store } = renderWorkbench();
    const name = screen.getByRole('textbox', { name: 'Scenario name' });
    await user.click(screen.getByRole('radio', { name: 'US customary' }));
    await user.click(name);
    await user.keyboard('{Control>}z{/Control}');
    expect(store.getState().scenario.units).toBe('us');
  });

  it('undo brings back an edit from a field, and the field shows it', async () => {
    const { user, scenario } = renderWorkbench();
    const rateField = screen.getByRole('textbox', { name: 'Loss rate φ (mm/h)' });
    await user.clear(rateField);
    await user.type(rateField, '3');
    await user.tab();
    await user.click(screen.getByRole('button', { name: 'Undo' }));
    expect(scenario()).toEqual(FOUR_BARS);
    expect(rateField).toHaveValue('8');
  });
});
