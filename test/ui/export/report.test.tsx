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

    const results = within(report).getByRole('table');
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
    const results = within(report).getByRole('table');
    expect(cell(results, 'Rainfall depth')).toMatch(/ in$/);
    expect(cell(results, 'Runoff volume')).toMatch(/ acre-ft$/);
    expect(cell(results, 'Fitted parameter')).toBe('— (no observed runoff to fit)');
    expect(within(report).getByRole('region', { name: 'Inputs' })).toHaveTextContent('from 12 Feb 2026 21:45');
  });
});
