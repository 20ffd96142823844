import { barEdgesH, type LossResult, type UnitSystem } from '../../core';
import type { Scenario } from '../../scenario/types';
import { formatClockText, wallClockMs } from '../chart/clock';
import { formatCount, formatValue } from '../format';
import { hoursMinutes } from '../results/hours-minutes';
import { displayUnit, toDisplay, unitText } from '../units';

/**
 * The most bars the printed report lists: with rows of about 4.5 mm
 * (export.css), 48 rows and the heading fill a US Letter page less its
 * margins, the shorter of Letter and A4 (our own measure of the print
 * layout; test/browser/share.spec.mjs prints 48 bars on both and checks the
 * page count). A longer storm's table is in the CSV export, and the report
 * says so.
 */
export const REPORT_MAX_BARS = 48;

/**
 * The bar table on paper: start (clock time when the storm has one, else
 * h:mm from the storm start), duration, and rainfall, loss and excess per bar
 * in the units on screen, each heading with its unit. It starts on a page of
 * its own, after the one-page summary.
 */
export function ReportBars({
  storm,
  units,
  result,
}: {
  storm: Scenario['storm'];
  units: UnitSystem;
  result: Pick<LossResult, 'lossMm' | 'excessMm'> | null;
}) {
  const n = storm.depthsMm.length;
  if (n === 0) return null;
  if (n > REPORT_MAX_BARS) {
    return (
      <p className="report__bars-note" data-report="bars">
        The storm has {formatCount(n)} bars, more than the {REPORT_MAX_BARS} that fit on a printed page: the table of
        rainfall, loss and excess for each bar is in the CSV export (Export CSV).
      </p>
    );
  }
  const depth = unitText(displayUnit('depth', units));
  const startMs = storm.startIso === undefined ? null : wallClockMs(storm.startIso);
  const edges = barEdgesH(storm);
  const shown = (mm: number | undefined): string =>
    mm === undefined ? '—' : formatValue(toDisplay('depth', mm, units));
  return (
    <section className="report__bars" aria-label="Bars" data-report="bars">
      <h3>Rainfall, loss and excess for each bar</h3>
      <table>
        <thead>
          <tr>
            <th scope="col">Bar</th>
            <th scope="col">{startMs === null ? 'Start (h:mm from storm start)' : 'Start (clock)'}</th>
            <th scope="col">Duration (min)</th>
            <th scope="col">Rainfall ({depth})</th>
            <th scope="col">Loss ({depth})</th>
            <th scope="col">Excess ({depth})</th>
          </tr>
        </thead>
        <tbody>
          {storm.depthsMm.map((mm, k) => {
            const startH = edges[k] as number;
            return (
              <tr key={k}>
                <th scope="row">{k + 1}</th>
                <td>
                  {startMs === null ? hoursMinutes(startH) : formatClockText(startMs + startH * 3_600_000, false)}
                </td>
                <td>{formatValue((storm.durationsH[k] as number) * 60)}</td>
                <td>{shown(mm)}</td>
                <td>{shown(result?.lossMm[k])}</td>
                <td>{shown(result?.excessMm[k])}</td>
              </tr>
            );
          })}
        </tbody>
      </table>
    </section>
  );
}
