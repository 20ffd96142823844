// @vitest-environment jsdom
import { act, screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { computeLosses, runoffVolumeM3 } from '../../../src/core';
import { CAUTION_TEXT } from '../../../src/scenario';
import { loadHydrographSide } from '../../../src/store';
import { loadReport } from '../../../src/ui/export';
import { formatPercent, formatValue } from '../../../src/ui/format';
import { FOUR_BARS } from '../../helpers/scenario-fixtures';
import { LAZY_LOAD_MS } from '../../helpers/render';
import { SHARED, renderTools } from '../../helpers/render-tools';

const mm = (v: number): string => `${formatValue(v)} mm`;
const cell = (table: HTMLElement, row: string): string =>
  within(table).getByRole('rowheader', { name: row }).closest('tr')?.querySelector('td')?.textContent ?? '';

describe('printable report', () => {
  it('Print report opens the print dialog; the report is built for printing only, with inputs, chart, results and caution', async () => {
    const observed = { as: 'depth' as const, value: 6, parameter: 'rateMmH', locked: false };
    const { user, calls } = renderTools({ fallback: { ...FOUR_BARS, observed, notes: 'Invented test notes.' } });
    expect(screen.queryByRole('article', { name: 'Printable report' })).toBeNull();
    await user.click(screen.getByRole('button', { name: 'Print report' }));
    // The button waits for the report's code (not part of the first screen) before opening the print dialog.
    await waitFor(() => expect(calls.print).toBe(1), { timeout: LAZY_LOAD_MS });

    act(() => {
      window.dispatchEvent(new Event('beforeprint'));
    });
    const report = screen.getByRole('article', { name: 'Printable report' });
    expect(within(report).getByRole('heading', { name: 'Four bars' })).toBeInTheDocument();
    expect(within(report).getByRole('note')).toHaveTextContent(`Caution. ${CAUTION_TEXT}`);

    const inputs = within(report).getByRole('region', { name: 'Inputs' });
    expect(inputs).toHaveTextContent('4 bars, 20 mm in 2 h');
    expect(inputs).toHaveTextContent('Test catchment, 100 ha');
    expect(inputs).toHaveTextContent('Constant loss rate (φ-index): Loss rate φ = 8 mm/h');
    expect(inputs).toHaveTextContent('6 mm; fitting Loss rate φ');
    expect(inputs).toHaveTextContent('Invented test notes.');

    expect(within(report).getByRole('img', { name: /^Hyetograph of Four bars/ })).toBeInTheDocument();

    const results = within(within(report).getByRole('region', { name: 'Results' })).getByRole('table');
    const core = computeLosses(FOUR_BARS.storm, FOUR_BARS.method);
    expect(cell(results, 'Rainfall depth')).toBe(mm(core.rainMm));
    expect(cell(results, 'Loss depth')).toBe(mm(core.totalLossMm));
    expect(cell(results, 'Rainfall excess depth')).toBe(mm(core.totalExcessMm));
    expect(cell(results, 'Runoff volume')).toBe(`${formatValue(runoffVolumeM3(core.totalExcessMm, 1e6))} m³`);
    expect(cell(results, 'Runoff fraction')).toBe(formatPercent(core.runoffFraction));
    // The answer is not in use (φ is still 8): with bars above φ in (4, 12), 16 − φ = 6 gives φ = 10 mm/h.
    expect(cell(results, 'Fitted parameter')).toBe('— (not in use; Fit would set loss rate φ to 10 mm/h)');

    act(() => {
      window.dispatchEvent(new Event('afterprint'));
    });
    expect(screen.queryByRole('article', { name: 'Printable report' })).toBeNull();
  });

  it('lists the unit hydrograph with the peak worked by hand', async () => {
    // One 1-hour bar of 12 mm under φ = 2 mm/h: 10 mm of excess on 1 km². Triangular, lag 2.5 h: Tp = 3 h,
    // base 8 h; hourly samples of the triangle sum to 4 peaks, so the peak is ¼ × 1e6 m² × 0.010 m / 3600 s
    // = 0.6944 m³/s at 3:00 (= 0.2083·A·Q/Tp, NEH-630 ch. 16, from memory).
    renderTools({
      fallback: {
        ...FOUR_BARS,
        storm: { durationsH: [1], depthsMm: [12] },
        method: { kind: 'constant', rateMmH: 2 },
        hydrograph: { ...FOUR_BARS.hydrograph, transform: { kind: 'triangular', lagH: 2.5 } },
      },
    });
    await act(() => loadReport());
    await act(() => loadHydrographSide());
    act(() => {
      window.dispatchEvent(new Event('beforeprint'));
    });
    const report = screen.getByRole('article', { name: 'Printable report' });
    expect(within(report).getByRole('region', { name: 'Inputs' })).toHaveTextContent(
      'NRCS triangular unit hydrograph: Lag = 2.5 h; peak discharge 0.6944 m³/s at 3:00 after the storm start',
    );
  });

  it('shows the scenario’s own units and says when there is nothing to fit', async () => {
    renderTools({ fallback: { ...SHARED, observed: null } });
    // The page fetches the report's code when idle; printing from the browser's menu finds it ready.
    await act(() => loadReport());
    act(() => {
      window.dispatchEvent(new Event('beforeprint'));
    });
    const report = screen.getByRole('article', { name: 'Printable report' });
    const results = within(within(report).getByRole('region', { name: 'Results' })).getByRole('table');
    expect(cell(results, 'Rainfall depth')).toMatch(/ in$/);
    expect(cell(results, 'Runoff volume')).toMatch(/ acre-ft$/);
    expect(cell(results, 'Fitted parameter')).toBe('— (no observed runoff to fit)');
    expect(within(report).getByRole('region', { name: 'Inputs' })).toHaveTextContent('from 12 Feb 2026 21:45');
  });

  it('lists every bar with its start, duration, rainfall, loss and excess, units in the headings (worked by hand)', async () => {
    renderTools({ fallback: FOUR_BARS });
    await act(() => loadReport());
    act(() => {
      window.dispatchEvent(new Event('beforeprint'));
    });
    const report = screen.getByRole('article', { name: 'Printable report' });
    const bars = within(within(report).getByRole('region', { name: 'Bars' })).getByRole('table');
    const rows = within(bars)
      .getAllByRole('row')
      .map((r) => [...r.querySelectorAll('th, td')].map((c) => c.textContent));
    // Bars of 30 min with 2, 6, 10, 2 mm; φ = 8 mm/h loses at most 8 × 0.5 = 4 mm a bar, so the loss is
    // min(P, 4) = 2, 4, 4, 2 mm and the excess P − loss = 0, 2, 6, 0 mm; starts 0:00, 0:30, 1:00, 1:30.
    expect(rows).toEqual([
      ['Bar', 'Start (h:mm from storm start)', 'Duration (min)', 'Rainfall (mm)', 'Loss (mm)', 'Excess (mm)'],
      ['1', '0:00', '30', '2', '2', '0'],
      ['2', '0:30', '30', '6', '4', '2'],
      ['3', '1:00', '30', '10', '4', '6'],
      ['4', '1:30', '30', '2', '2', '0'],
    ]);
  });

  it('a storm with a clock lists clock times; up to 48 bars are listed, a longer storm points to the CSV export', async () => {
    const view = renderTools({ fallback: SHARED });
    await act(() => loadReport());
    act(() => {
      window.dispatchEvent(new Event('beforeprint'));
    });
    const region = () =>
      within(screen.getByRole('article', { name: 'Printable report' })).getByRole('region', { name: 'Bars' });
    const starts = () =>
      within(within(region()).getByRole('table'))
        .getAllByRole('row')
        .slice(1)
        .map((r) => r.querySelector('td')?.textContent);
    expect(within(region()).getAllByRole('columnheader')[1]).toHaveTextContent('Start (clock)');
    expect(within(region()).getAllByRole('columnheader')[3]).toHaveTextContent('Rainfall (in)');
    // Bars of 15, 15, 30, 60, 30 min from 21:45: 21:45, 22:00, 22:15, 22:45, 23:45, 00:15.
    expect(starts()).toEqual(['21:45', '22:00', '22:15', '22:45', '23:45', '00:15']);

    const many = (n: number) => ({ durationsH: Array<number>(n).fill(0.25), depthsMm: Array<number>(n).fill(1) });
    act(() => view.actions.setStorm(many(48), 'Forty-eight bars'));
    expect(starts()).toHaveLength(48);
    act(() => view.actions.setStorm(many(49), 'Forty-nine bars'));
    const report = screen.getByRole('article', { name: 'Printable report' });
    expect(within(report).queryByRole('region', { name: 'Bars' })).toBeNull();
    expect(report.querySelector('[data-report="bars"]')).toHaveTextContent(
      'The storm has 49 bars, more than the 48 that fit on a printed page: the table of rainfall, loss and excess for each bar is in the CSV export (Export CSV).',
    );
  });
});
