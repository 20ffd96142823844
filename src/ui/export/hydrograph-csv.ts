import {
  TRANSFORMS,
  hasOrdinates,
  transformValue,
  type AreaUnit,
  type HydrographComparison,
  type LossMethod,
  type RunoffHydrograph,
  type Transform,
} from '../../core';
import { CAUTION_TEXT } from '../../scenario';
import type { Scenario } from '../../scenario/types';
import { formatClockText, wallClockMs } from '../chart/clock';
import { dischargeToDisplay, dischargeUnitText } from '../observed/discharge';
import { displayUnit, toDisplay, unitText } from '../units';
import { methodAndCatchmentNotes } from './bar-table-csv';
import { csvFile, csvNote, csvRow, noteNumber as note, type CsvCell } from './csv';
import { scenarioTitle } from '../../scenario/label-text';
import { NO_RUNOFF_TEXT } from '../results/hours-minutes';

/** "Lag = 0.75 h; peak rate factor = 484": a transform's parameters for notes and the report. */
export function transformParametersText(transform: Transform, format: (x: number) => string = note): string {
  const parts: string[] = [];
  for (const p of TRANSFORMS[transform.kind].params) {
    const v = transformValue(transform, p.key);
    if (v === undefined) continue;
    parts.push(`${p.label} = ${format(v)}${p.unit === 'h' ? ' h' : ''}`);
  }
  if (hasOrdinates(transform)) parts.push(`${transform.ordinatesM3sPerMm.length} ordinates (m³/s per mm)`);
  return parts.join('; ');
}

export interface HydrographCsvInput {
  readonly scenario: Scenario;
  /** The loss method in effect, whose excess was routed. */
  readonly method: LossMethod;
  readonly transform: Transform;
  readonly hydrograph: RunoffHydrograph;
  /** Against the observed direct runoff, when there is a separated record. */
  readonly comparison: HydrographComparison | null;
  /** The unit the area is shown in on screen. */
  readonly areaUnit?: AreaUnit | undefined;
}

/**
 * The computed direct runoff hydrograph as CSV, through the one CSV writer
 * (every field quoted, text that could start a formula neutralised): note
 * lines starting with "#" (the scenario, the caution, the transform, the peak
 * and, against a record, the errors), a header row with the unit of every
 * column, then one row per sample, unrounded, discharge in the screen's unit.
 */
export function hydrographCsv({
  scenario,
  method,
  transform,
  hydrograph,
  comparison,
  areaUnit,
}: HydrographCsvInput): string {
  const { units } = scenario;
  const q = dischargeUnitText(units);
  const startMs = scenario.storm.startIso === undefined ? null : wallClockMs(scenario.storm.startIso);
  const lines: string[] = [
    csvNote(`Raincut runoff hydrograph: ${scenarioTitle(scenario.name)}`),
    csvNote(`Caution: ${CAUTION_TEXT}`),
    // The discharge rests on the excess (the loss method) and the area: a file read alone must name both.
    ...methodAndCatchmentNotes(scenario, method, areaUnit),
    csvNote(`Unit hydrograph: ${TRANSFORMS[transform.kind].label}; ${transformParametersText(transform)}`),
    csvNote(
      `Peak discharge ${note(dischargeToDisplay(hydrograph.peakM3s, units))} ${q} ` +
        (hydrograph.peakM3s > 0
          ? `at ${note(hydrograph.timeOfPeakH)} h after the storm start`
          : `(${NO_RUNOFF_TEXT})`) +
        `; direct runoff volume ${note(toDisplay('volume', hydrograph.volumeM3, units))} ` +
        unitText(displayUnit('volume', units)),
    ),
  ];
  if (comparison) {
    const pct = (x: number | null) => (x === null ? '—' : `${note(x)} %`);
    lines.push(
      csvNote(
        `Against the observed direct runoff: peak error ${pct(comparison.peakErrorPct)}; timing error ` +
          `${note(comparison.timingErrorH)} h; volume error ${pct(comparison.volumeErrorPct)}; ` +
          `Nash–Sutcliffe efficiency ${comparison.nse === null ? '—' : note(comparison.nse)}`,
      ),
    );
  }
  lines.push(csvNote('Numbers in the rows are unrounded; each column heading gives its unit.'));
  const head = ['Time (h from storm start)'];
  if (startMs !== null) head.push('Time (clock)');
  head.push(`Computed direct runoff (${q})`);
  lines.push(csvRow(head));
  const { timesH, dischargeM3s } = hydrograph;
  for (let i = 0; i < timesH.length; i++) {
    const t = timesH[i] as number;
    const row: CsvCell[] = [t];
    if (startMs !== null) row.push(formatClockText(startMs + t * 3_600_000, true));
    row.push(dischargeToDisplay(dischargeM3s[i] as number, units));
    lines.push(csvRow(row));
  }
  return csvFile(lines);
}
