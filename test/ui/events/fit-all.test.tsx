// @vitest-environment jsdom
import { screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { calibrate } from '../../../src/core';
import { lazyPartsLoaded, renderWorkbench } from '../../helpers/render';
import { FOUR_EVENTS, HAND_FITS } from '../../helpers/event-fixtures';

async function openFits() {
  const view = renderWorkbench(FOUR_EVENTS);
  await view.user.click(screen.getByRole('tab', { name: 'Event set' }));
  await lazyPartsLoaded();
  return view;
}

const rowOf = (table: HTMLElement, name: string) => within(table).getByRole('row', { name: new RegExp(`^${name}`) });
const summaryValue = (term: string) => {
  const list = screen.getByLabelText('Spread of the fitted values');
  const dt = within(list).getByText(term, { selector: 'dt' });
  return dt.nextElementSibling?.textContent;
};

describe('fit all events', () => {
  it('lists each event with its rain, observed runoff, runoff fraction and the fit calibrate gives alone', async () => {
    await openFits();
    const table = screen.getByRole('table', { name: 'Fitted loss rate φ for each event' });
    expect(rowOf(table, 'Small \\(invented\\)')).toHaveTextContent('Small (invented)20 mm4 mm20 %12 mm/h');
    expect(rowOf(table, 'Middle \\(invented\\)')).toHaveTextContent('8 mm40 %8 mm/h');
    expect(rowOf(table, 'Dry \\(invented\\)')).toHaveTextContent('2 mm10 %16 mm/h');
    for (const [mm, phi] of [
      [4, 12],
      [8, 8],
      [2, 16],
    ] as const) {
      const alone = calibrate(FOUR_EVENTS.storm, FOUR_EVENTS.method, 'rateMmH', mm);
      expect(alone.ok && alone.value).toBeCloseTo(phi, 9);
    }
  });

  it("marks the event without an answer and says why, in calibrate's words", async () => {
    await openFits();
    const table = screen.getByRole('table', { name: 'Fitted loss rate φ for each event' });
    const wet = rowOf(table, 'Too wet \\(invented\\)');
    const alone = calibrate(FOUR_EVENTS.storm, FOUR_EVENTS.method, 'rateMmH', 25);
    expect(alone.ok).toBe(false);
    expect(wet).toHaveTextContent('No answer:');
    expect(wet).toHaveTextContent(alone.ok ? '' : alone.message);
  });

  it('summarises the fitted values as worked by hand: 3 fitted, 1 without, mean and median 12, 8 to 16', async () => {
    await openFits();
    expect(summaryValue('Events fitted')).toBe('3');
    expect(summaryValue('Without an answer')).toBe('1');
    expect(summaryValue('Mean')).toBe(`${HAND_FITS.mean} mm/h`);
    expect(summaryValue('Median')).toBe(`${HAND_FITS.median} mm/h`);
    expect(summaryValue('Smallest')).toBe(`${HAND_FITS.min} mm/h`);
    expect(summaryValue('Largest')).toBe(`${HAND_FITS.max} mm/h`);
  });

  it('draws each fitted value against its rainfall in a figure with a text summary', async () => {
    await openFits();
    const figure = screen.getByRole('figure', { name: /3 events, from 20 to 20 mm of rain/ });
    expect(figure.querySelectorAll('circle')).toHaveLength(3);
    expect(within(figure).getByRole('img')).toHaveAccessibleName(/the design value 12 mm\/h is dashed/);
  });

  it("shows each event's runoff and error with the median, and new errors when the smallest is picked", async () => {
    const { user, scenario } = await openFits();
    const table = screen.getByRole('table', { name: "Each event's runoff with the design value" });
    // φ = 12: only the 20 mm/h bar runs off, (20 − 12) × 0.5 = 4 mm.
    expect(rowOf(table, 'Small \\(invented\\)')).toHaveTextContent('4 mm4 mm0 mm0 %');
    expect(rowOf(table, 'Middle \\(invented\\)')).toHaveTextContent('8 mm4 mm-4 mm-50 %');
    expect(rowOf(table, 'Dry \\(invented\\)')).toHaveTextContent('2 mm4 mm+2 mm+100 %');
    await user.click(screen.getByRole('radio', { name: 'Smallest' }));
    expect(scenario().eventSet.designPick).toBe('min');
    // φ = 8: (20 − 8) × 0.5 + (12 − 8) × 0.5 = 8 mm.
    expect(rowOf(table, 'Small \\(invented\\)')).toHaveTextContent('4 mm8 mm+4 mm+100 %');
    expect(rowOf(table, 'Middle \\(invented\\)')).toHaveTextContent('8 mm8 mm0 mm0 %');
    expect(rowOf(table, 'Dry \\(invented\\)')).toHaveTextContent('2 mm8 mm+6 mm+300 %');
    expect(screen.getByRole('status')).toHaveTextContent('Design loss rate φ: 8 mm/h');
  });

  it("takes a design value of the user's own, and keeps bad text with a message", async () => {
    const { user, scenario } = await openFits();
    const own = screen.getByRole('textbox', { name: /Own design value/ });
    await user.clear(own);
    await user.type(own, '10');
    expect(scenario().eventSet.designPick).toEqual({ value: 10 });
    await user.tab();
    // One keystroke replacing the whole text, so no good value is typed on the way.
    await user.type(own, 'O', { initialSelectionStart: 0, initialSelectionEnd: 2 });
    expect(own).toHaveValue('O');
    expect(screen.getByText('“O” is not a number. Not applied; still 10 mm/h.')).toBeInTheDocument();
    expect(scenario().eventSet.designPick).toEqual({ value: 10 });
  });
});
