// @vitest-environment jsdom
// Issue 16, "Numbers typed into any field", and issue 11's "never Infinity, NaN
// or 300-digit numbers": each defect as a person meets it on the workbench.
// Expected values are worked by hand beside each check.
import { screen, within } from '@testing-library/react';
import { afterEach, describe, expect, it } from 'vitest';
import type { Scenario } from '../../src/scenario/types';
import {
  NUMBER_FORMAT_KEY,
  chooseNumberFormat,
  currentNumberFormat,
  formatForLanguage,
  startNumberFormat,
} from '../../src/ui/number-format';
import { totalsOf } from '../../src/store/totals';
import { lazyPartsLoaded, renderWorkbench } from '../helpers/render';
import { FOUR_BARS } from '../helpers/scenario-fixtures';

// FOUR_BARS (invented): four 30-min bars of 2, 6, 10, 2 mm (4, 12, 20, 4 mm/h), 20 mm in all, 1 km², φ = 8 mm/h.
const CURVE_NUMBER: Scenario = { ...FOUR_BARS, method: { kind: 'curve-number', cn: 75, iaRatio: 0.2 } };
const PROPORTIONAL: Scenario = { ...FOUR_BARS, method: { kind: 'proportional', coefficient: 0.4 } };

afterEach(() => {
  startNumberFormat({ storage: null, language: 'en-US' });
  chooseNumberFormat('1,234.5');
});

/**
 * Every number on screen as text: no NaN, no Infinity, no long run of digits
 * (the formatter writes at most 15; a message quotes typed text cut at 23
 * characters).
 */
function expectNoWildNumbers(): void {
  const text = document.body.textContent ?? '';
  expect(text).not.toMatch(/NaN|Infinity/);
  expect(text).not.toMatch(/\d{24,}/);
}

describe('a number typed with thousands separators means what the screen means by them', () => {
  it('"4,500" typed as an observed volume is 4,500 m³, not 4.5 m³', async () => {
    const { user, scenario } = renderWorkbench();
    await lazyPartsLoaded();
    await user.click(screen.getByRole('radio', { name: 'Volume' }));
    const observed = screen.getByRole('textbox', { name: 'Observed runoff' });
    await user.type(observed, '4,500');
    expect(scenario().observed?.value).toBe(4500);
    // 4,500 m³ over 1 km² = 4,500 / 1,000,000 m = 4.5 mm.
    expect(observed).toHaveAccessibleDescription(/^4\.5 mm over the catchment area/);
  });

  it('"2,500" typed as an area in ha is 25 km², not 2.5 ha', async () => {
    const { user, scenario } = renderWorkbench();
    await lazyPartsLoaded();
    const area = screen.getByRole('textbox', { name: 'Catchment area' });
    await user.clear(area);
    await user.type(area, '2,500');
    // 2,500 ha × 10,000 m²/ha = 25,000,000 m².
    expect(scenario().catchment.areaM2).toBe(25_000_000);
    await user.tab();
    expect(area).toHaveValue('2,500');
  });

  it('in the 1.234,5 format the same area is typed "2.500" and a decimal "0,5"', async () => {
    chooseNumberFormat('1.234,5');
    const { user, scenario } = renderWorkbench();
    await lazyPartsLoaded();
    const area = screen.getByRole('textbox', { name: 'Catchment area' });
    // 1 km² shows as 100 ha.
    expect(area).toHaveValue('100');
    await user.clear(area);
    await user.type(area, '2.500');
    expect(scenario().catchment.areaM2).toBe(25_000_000);
    await user.clear(area);
    await user.type(area, '0,5');
    // 0.5 ha = 5,000 m².
    expect(scenario().catchment.areaM2).toBe(5_000);
    await user.tab();
    expect(area).toHaveValue('0,5');
    await user.clear(area);
    await user.type(area, '2.5');
    expect(area).toHaveAccessibleDescription(
      /^“2\.5”: in the number format 1\.234,5 a point stands only between .* Not applied; still 0,5 ha\.$/,
    );
    expect(scenario().catchment.areaM2).toBe(5_000);
  });
});

describe('a typed parameter out of range is not applied anywhere', () => {
  it('CN "120" leaves CN 75 in the results and the history, and says so (not CN 12)', async () => {
    const { user, scenario, store } = renderWorkbench(CURVE_NUMBER);
    await lazyPartsLoaded();
    const cn = screen.getByRole('textbox', { name: 'Curve number CN' });
    await user.clear(cn);
    await user.type(cn, '120');
    expect(scenario().method).toEqual({ kind: 'curve-number', cn: 75, iaRatio: 0.2 });
    // CN 75: S = 25400/75 − 254 = 84.667 mm, Iₐ = 0.2 S = 16.933 mm,
    // Q = (20 − 16.933)² / (20 − 16.933 + 84.667) = 9.4044 / 87.733 = 0.1072 mm.
    expect(screen.getByLabelText('Excess depth')).toHaveTextContent('0.1072 mm');
    expect(cn).toHaveValue('120');
    expect(cn).toHaveAccessibleDescription(/Not applied; still 75\.$/);
    expect(store.getState().history.past).toHaveLength(0);
    expect(store.getState().undoLabel).toBeNull();
  });

  it('runoff coefficient "1.5" leaves 0.4 in use: 8 mm of excess, not 20', async () => {
    const { user, scenario } = renderWorkbench(PROPORTIONAL);
    await lazyPartsLoaded();
    const c = screen.getByRole('textbox', { name: 'Runoff coefficient' });
    await user.clear(c);
    await user.type(c, '1.5');
    expect(scenario().method).toEqual({ kind: 'proportional', coefficient: 0.4 });
    // 0.4 × 20 mm = 8 mm.
    expect(screen.getByLabelText('Excess depth')).toHaveTextContent('8 mm');
    expect(c).toHaveAccessibleDescription(/Not applied; still 0\.4\.$/);
  });

  it('a good value typed after a refused one is applied as one undo step', async () => {
    const { user, scenario, store } = renderWorkbench(PROPORTIONAL);
    await lazyPartsLoaded();
    const c = screen.getByRole('textbox', { name: 'Runoff coefficient' });
    await user.clear(c);
    await user.type(c, '1.5');
    await user.clear(c);
    await user.type(c, '0.25');
    expect(scenario().method).toEqual({ kind: 'proportional', coefficient: 0.25 });
    expect(store.getState().history.past).toHaveLength(1);
    await user.click(screen.getByRole('button', { name: 'Undo' }));
    expect(scenario().method).toEqual({ kind: 'proportional', coefficient: 0.4 });
  });
});

describe('values beyond what a field can mean are refused, quoting what was typed', () => {
  it('an observed depth of 10³⁰⁰ mm is refused and nothing on screen prints a wild number', async () => {
    const { user, scenario } = renderWorkbench();
    await lazyPartsLoaded();
    const observed = screen.getByRole('textbox', { name: 'Observed runoff (mm)' });
    await user.type(observed, '1e300');
    expect(scenario().observed).toBeNull();
    expect(observed).toHaveAccessibleDescription(
      /^“1e300” mm is more than a rainfall or runoff depth can be \(at most 30,000 mm\): .*Cherrapunji.* Not applied\.$/,
    );
    expectNoWildNumbers();
  });

  it('a loss rate of a 300-digit number is refused, quoted cut short', async () => {
    const { user, scenario } = renderWorkbench();
    await lazyPartsLoaded();
    const rate = screen.getByRole('textbox', { name: 'Loss rate φ (mm/h)' });
    await user.clear(rate);
    await user.click(rate);
    await user.paste(`9${'9'.repeat(299)}`);
    expect(scenario().method).toEqual({ kind: 'constant', rateMmH: 8 });
    expect(rate).toHaveAccessibleDescription(/“9{23}…” mm\/h is more than a loss rate/);
    expectNoWildNumbers();
  });

  it('99,999,999 mm in a bar is refused in the bar table, and the bar keeps its depth', async () => {
    const { user, scenario } = renderWorkbench();
    await lazyPartsLoaded();
    const table = screen.getByRole('grid', { name: 'Bar table' });
    const depth = within(table)
      .getAllByRole('gridcell')
      .find((c) => c.getAttribute('aria-colindex') === '4');
    if (!depth) throw new Error('no depth cell');
    await user.click(depth);
    await user.keyboard('99,999,999{Enter}');
    expect(scenario().storm).toBe(FOUR_BARS.storm);
    expect(screen.getByRole('textbox', { name: 'Bar 1 depth' })).toHaveAccessibleDescription(
      /^Bar 1 depth: “99,999,999” mm is more than a rainfall or runoff depth can be \(at most 30,000 mm\)/,
    );
    expectNoWildNumbers();
  });
});

describe('matching reads as applied only when it is', () => {
  it('Fit is off while the observed runoff typed is not a number, and the stale answer goes', async () => {
    const { user } = renderWorkbench();
    await lazyPartsLoaded();
    const observed = screen.getByRole('textbox', { name: 'Observed runoff (mm)' });
    await user.type(observed, '4.5');
    // Bars above φ ∈ (4, 12): (6 − 0.5φ) + (10 − 0.5φ) = 16 − φ = 4.5 → φ = 11.5 mm/h.
    expect(
      screen.getByText('Fit would set loss rate φ to 11.5 mm/h, giving the observed 4.5 mm of runoff.'),
    ).toBeVisible();
    expect(screen.getByRole('button', { name: 'Fit' })).toBeEnabled();
    await user.type(observed, 'x');
    expect(screen.getByRole('button', { name: 'Fit' })).toBeDisabled();
    expect(screen.queryByText(/Fit would set/)).toBeNull();
    expect(screen.getByText(/The observed runoff typed is not applied/)).toBeVisible();
    await user.type(observed, '{Backspace}');
    expect(screen.getByRole('button', { name: 'Fit' })).toBeEnabled();
  });

  it('the preview says "Fit would set …" until Fit is pressed; then the value is called fitted', async () => {
    const { user, store, scenario } = renderWorkbench();
    await lazyPartsLoaded();
    await user.type(screen.getByRole('textbox', { name: 'Observed runoff (mm)' }), '4.5');
    expect(screen.queryByText(/^Fitted:/)).toBeNull();
    // The report and the compare table take their totals from totalsOf: nothing fitted is in use yet.
    const before = totalsOf(scenario(), store.derived);
    expect(before.fitted).toBeNull();
    expect(before.proposed?.value).toBe(11.5);
    await user.click(screen.getByRole('button', { name: 'Fit' }));
    expect(screen.getByText('Fitted: loss rate φ is 11.5 mm/h, giving the observed 4.5 mm of runoff.')).toBeVisible();
    expect(screen.getByRole('button', { name: 'Fit' })).toBeDisabled();
    expect(totalsOf(scenario(), store.derived).fitted?.value).toBe(11.5);
    // Moving the line by hand puts the fitted value out of use again.
    await user.clear(screen.getByRole('textbox', { name: 'Loss rate φ (mm/h)' }));
    await user.type(screen.getByRole('textbox', { name: 'Loss rate φ (mm/h)' }), '9');
    expect(totalsOf(scenario(), store.derived).fitted).toBeNull();
    expect(screen.getByText(/^Fit would set loss rate φ to 11\.5 mm\/h/)).toBeVisible();
  });

  it('with Keep matched on a volume, typing an area of 0 on the way to 0.5 km² holds the fit', async () => {
    const { user, scenario, store } = renderWorkbench({
      ...FOUR_BARS,
      observed: { as: 'volume', value: 4500, parameter: 'rateMmH', locked: true },
    });
    const line = screen.getByRole('slider', { name: 'Loss rate φ' });
    // 4,500 m³ over 1 km² is 4.5 mm: φ = 16 − 4.5 = 11.5 mm/h (as above).
    expect(line).toHaveAttribute('aria-valuenow', '11.5');
    await user.selectOptions(screen.getByRole('combobox', { name: 'Area unit' }), 'km2');
    const area = screen.getByRole('textbox', { name: 'Catchment area' });
    await user.clear(area);
    await user.type(area, '0');
    expect(scenario().catchment.areaM2).toBe(1e6);
    expect(line).toHaveAttribute('aria-valuenow', '11.5');
    expect(area).toHaveAccessibleDescription(/greater than 0 .* Not applied; still 1 km²\.$/);
    await user.type(area, '.5');
    // 4,500 m³ over 0.5 km² is 9 mm: 16 − φ = 9 → φ = 7 mm/h, inside (4, 12).
    expect(scenario().catchment.areaM2).toBe(500_000);
    expect(line).toHaveAttribute('aria-valuenow', '7');
    expect(store.getState().history.past).toHaveLength(1);
  });
});

describe('storm tools, drawing and design storms read numbers the one way, within what they can mean', () => {
  async function openTools(user: ReturnType<typeof renderWorkbench>['user']) {
    await user.click(screen.getByRole('button', { name: 'Storm tools' }));
    await lazyPartsLoaded();
    return screen.getByRole('region', { name: 'Storm tools' });
  }
  async function fill(user: ReturnType<typeof renderWorkbench>['user'], field: HTMLElement, text: string) {
    await user.clear(field);
    await user.type(field, text);
  }

  it('a scale factor that would give a bar of 10³⁰⁰ mm is refused, and the storm is kept', async () => {
    const { user, scenario } = renderWorkbench();
    await lazyPartsLoaded();
    const tools = await openTools(user);
    const factor = within(tools).getByRole('textbox', { name: 'Scale factor' });
    await fill(user, factor, '1e300');
    await user.click(within(tools).getByRole('button', { name: 'Scale bars' }));
    expect(scenario().storm).toBe(FOUR_BARS.storm);
    // Bar 1 holds 2 mm: ×10³⁰⁰ is 2e300 mm.
    expect(factor).toHaveAccessibleDescription(
      /^Bar 1 would hold 2e300 mm, which is more than a rainfall or runoff depth can be \(at most 30,000 mm\)/,
    );
    expectNoWildNumbers();
  });

  it('a total depth of "99,999,999" mm is refused, quoted; "1,000" is a thousand millimetres', async () => {
    const { user, scenario } = renderWorkbench();
    await lazyPartsLoaded();
    const tools = await openTools(user);
    const total = within(tools).getByRole('textbox', { name: 'Total depth (mm)' });
    await fill(user, total, '99,999,999');
    await user.click(within(tools).getByRole('button', { name: 'Set total depth' }));
    expect(scenario().storm).toBe(FOUR_BARS.storm);
    expect(total).toHaveAccessibleDescription(/“99,999,999” mm is more than a rainfall or runoff depth can be/);
    await fill(user, total, '1,000');
    await user.click(within(tools).getByRole('button', { name: 'Set total depth' }));
    // 20 mm scaled to 1,000 mm: every bar × 50 → 100, 300, 500, 100 mm.
    expect(scenario().storm.depthsMm).toEqual([100, 300, 500, 100]);
  });

  it('a resampling step of a year and more is refused in the field’s own unit', async () => {
    const { user, scenario } = renderWorkbench();
    await lazyPartsLoaded();
    const tools = await openTools(user);
    const step = within(tools).getByRole('textbox', { name: 'New time step (min)' });
    await fill(user, step, '1e9');
    await user.click(within(tools).getByRole('button', { name: 'Resample' }));
    expect(scenario().storm).toBe(FOUR_BARS.storm);
    // A year of 366 days is 527,040 min.
    expect(step).toHaveAccessibleDescription(
      /“1e9” min is more than a bar or time step can be \(at most 527,040 min\)/,
    );
  });

  it('a new empty storm of "1,500" bars has fifteen hundred bars; a bar duration of 10³⁰⁰ min is refused', async () => {
    const { user, scenario } = renderWorkbench();
    await lazyPartsLoaded();
    await user.click(screen.getByRole('button', { name: 'Draw bars' }));
    await lazyPartsLoaded();
    const panel = screen.getByRole('region', { name: 'Drawing bars' });
    const count = within(panel).getByRole('textbox', { name: 'Number of bars' });
    const step = within(panel).getByRole('textbox', { name: 'Bar duration (min)' });
    await fill(user, count, '1,500');
    await fill(user, step, '1e300');
    await user.click(within(panel).getByRole('button', { name: 'Start a new empty storm' }));
    expect(scenario().storm).toBe(FOUR_BARS.storm);
    expect(step).toHaveAccessibleDescription(/^“1e300” min is more than a bar or time step can be/);
    await fill(user, step, '5');
    await user.click(within(panel).getByRole('button', { name: 'Start a new empty storm' }));
    expect(scenario().storm.depthsMm).toHaveLength(1500);
    expect(within(panel).getByRole('status')).toHaveTextContent('1,500 dry bars of 5 min');
  });
});

describe('the design storm form reads numbers the one way', () => {
  it('a uniform storm of "1,000" mm holds a thousand millimetres; 10³⁰⁰ mm is refused by name', async () => {
    const { user } = renderWorkbench();
    await lazyPartsLoaded();
    await user.click(screen.getByRole('tab', { name: 'Design storm' }));
    await lazyPartsLoaded();
    await user.click(screen.getByRole('radio', { name: 'Uniform depth' }));
    const depth = screen.getByRole('textbox', { name: 'Storm depth (mm)' });
    await user.clear(depth);
    await user.type(depth, '1e300');
    expect(screen.getByRole('alert')).toHaveTextContent(
      /^Storm depth: “1e300” mm is more than a rainfall or runoff depth can be \(at most 30,000 mm\)/,
    );
    await user.clear(depth);
    await user.type(depth, '1,000');
    const totals = screen.getByLabelText('Design storm totals');
    expect(within(totals).getByText('Rainfall depth', { selector: 'dt' }).nextElementSibling).toHaveTextContent(
      '1,000 mm',
    );
    expectNoWildNumbers();
  }, 20_000);
});

describe('rain beyond the world’s records is flagged in plain words above the chart', () => {
  it('500 mm typed into a 30-min bar is applied, and the Rainfall region says it passes the records', async () => {
    const { user, scenario } = renderWorkbench();
    await lazyPartsLoaded();
    const rainfall = screen.getByRole('region', { name: 'Rainfall' });
    expect(within(rainfall).queryByRole('note')).toBeNull();
    const table = screen.getByRole('grid', { name: 'Bar table' });
    const depth = within(table)
      .getAllByRole('gridcell')
      .filter((c) => c.getAttribute('aria-colindex') === '4')[2];
    if (!depth) throw new Error('no depth cell for bar 3');
    await user.click(depth);
    await user.keyboard('500{Enter}');
    expect(scenario().storm.depthsMm).toEqual([2, 6, 500, 2]);
    // 30 min: 422 × 0.5^0.475 = 422 × e^(−0.475 × 0.693147) = 422 × 0.719461 = 303.6 mm (Jennings 1950, from memory).
    expect(within(rainfall).getByRole('note')).toHaveTextContent(
      'Bar 3 holds 500 mm in 30 min, more than the world’s greatest recorded rainfalls (about 303.6 mm in 30 min; Jennings 1950, from memory). Check the unit and the bar durations.',
    );
  });
});

describe('the number format is the reader’s, kept in this browser and never in the scenario', () => {
  it('choosing 1 234,5 rewrites every number on screen and reads typed numbers that way', async () => {
    const { user, scenario } = renderWorkbench();
    await lazyPartsLoaded();
    const before = scenario();
    // FOUR_BARS with φ = 8 mm/h: excess 6 − 4 + 10 − 4 = 8 mm over 1 km² = 8,000 m³.
    expect(screen.getByLabelText('Runoff volume')).toHaveTextContent('8,000 m³');
    await user.selectOptions(screen.getByRole('combobox', { name: 'Number format' }), '1 234,5');
    expect(screen.getByLabelText('Runoff volume').textContent).toBe('8\u202f000 m³');
    expect(screen.getByRole('combobox', { name: 'Number format' })).toHaveFocus();
    const rate = screen.getByRole('textbox', { name: 'Loss rate φ (mm/h)' });
    await user.clear(rate);
    await user.type(rate, '7,5');
    expect(scenario().method).toEqual({ kind: 'constant', rateMmH: 7.5 });
    // The scenario itself carries no number format.
    expect(Object.keys(scenario())).toEqual(Object.keys(before));
  });

  it('starts from the saved choice, else from the browser’s language', () => {
    const saved = { data: new Map([[NUMBER_FORMAT_KEY, '1.234,5']]) };
    const storage = {
      getItem: (k: string) => saved.data.get(k) ?? null,
      setItem: (k: string, v: string) => void saved.data.set(k, v),
    };
    startNumberFormat({ storage, language: 'en-US' });
    expect(currentNumberFormat().id).toBe('1.234,5');
    chooseNumberFormat('1 234.5');
    expect(saved.data.get(NUMBER_FORMAT_KEY)).toBe('1 234.5');
    startNumberFormat({ storage: null, language: 'de-DE' });
    expect(currentNumberFormat().id).toBe('1.234,5');
    expect(formatForLanguage('fr-FR').id).toBe('1 234,5');
    expect(formatForLanguage('en-GB').id).toBe('1,234.5');
    expect(formatForLanguage('not a language').id).toBe('1,234.5');
  });
});
