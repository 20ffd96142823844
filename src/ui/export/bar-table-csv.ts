import {
  UNIT_LABELS,
  barEdgesH,
  convertArea,
  methodNumber,
  methodSpec,
  methodValue,
  paramApplies,
  type LossMethod,
  type AreaUnit,
  type LossResult,
  type UnitSystem,
} from '../../core';
import { CAUTION_TEXT } from '../../scenario';
import { massCurveOf } from '../../store/mass-curve';
import type { Scenario } from '../../scenario/types';
import { formatClockText, wallClockMs } from '../chart/clock';
import { formatValue } from '../format';
import { csvFile, csvNote, csvRow, noteNumber, type CsvCell } from './csv';
import { AREA_CHOICES, displayUnit, paramToDisplay, paramUnitText, toDisplay, unitText } from '../units';
import { scenarioTitle } from '../../scenario/label-text';

/**
 * The bar table as CSV, written through the one CSV writer (./csv.ts: every
 * field quoted, text that could start a formula neutralised): a few leading
 * note lines that start with "#" (the scenario name, the caution, the method
 * and totals; spreadsheets show them as text rows, and CSV readers skip them
 * with a comment setting such as papaparse `comments: '#'`, pandas
 * `comment='#'`), then one header row with the unit of every column, then one
 * row per bar.
 *
 * Numbers in the rows are written to 12 significant figures (`cellNumber`),
 * in the units the screen shows: every value a person typed reads back as
 * typed, and the binary residue of sums and unit conversions is dropped
 * (2.4000000000000004 h is 144 min). Durations and start times are in
 * minutes, as the bar table on screen types them. Losses and excess per bar
 * are the core's, passed in from the store; the three cumulative columns are
 * the storm's mass curve (core `massCurve`: running sums to each bar's end).
 * The catchment area is written in the unit the user chose beside the area
 * field (a preference kept in the store, not in the scenario).
 */
export interface BarTableInput {
  readonly scenario: Scenario;
  /** The method the results were computed with (the fitted one while kept matched). */
  readonly method: LossMethod;
  readonly result: LossResult;
  /** Runoff volume, m³, or null without a catchment area. */
  readonly volumeM3: number | null;
  /** The unit the area field shows (the store's `areaUnit`); the system's display unit when left out. */
  readonly areaUnit?: AreaUnit;
}

/**
 * A number for a row cell: 12 significant figures, more than any typed input or gauge reading carries and
 * fewer than a double's 15–17, so 0.1 + 0.2 is written 0.3 and 2.4 h × 60 is 144.
 */
export function cellNumber(x: number): number {
  return Number.isFinite(x) ? Number(x.toPrecision(12)) : x;
}

/** "Loss rate φ = 8 mm/h; …" for the method's numeric parameters and choices, in display units. */
export function methodParametersText(
  method: LossMethod,
  units: UnitSystem,
  format: (x: number) => string = formatValue,
): string {
  const spec = methodSpec(method.kind);
  const parts: string[] = [];
  // Only what takes part under the other settings (no recovery rate while recovery is off).
  for (const p of spec.params) {
    const v = methodNumber(method, p.key);
    if (v === undefined || !paramApplies(p, method)) continue;
    const unit = paramUnitText(p.unit, units);
    parts.push(`${p.label} = ${format(paramToDisplay(p.unit, v, units))}${unit ? ` ${unit}` : ''}`);
  }
  for (const c of spec.choices ?? []) {
    if (!paramApplies(c, method)) continue;
    const chosen = c.choices.find((o) => o.value === methodValue(method, c.key));
    if (chosen) parts.push(`${c.label}: ${chosen.label}`);
  }
  return parts.join('; ');
}

/** The column headings, with units, for a unit system and storm. */
function barTableHeader(scenario: Scenario): string[] {
  const depth = unitText(displayUnit('depth', scenario.units));
  const rate = unitText(displayUnit('rate', scenario.units));
  const head = ['Bar'];
  if (scenario.storm.startIso !== undefined && wallClockMs(scenario.storm.startIso) !== null)
    head.push('Start (clock)');
  head.push(
    'Start (min from storm start)',
    'Duration (min)',
    `Rainfall depth (${depth})`,
    `Rainfall intensity (${rate})`,
    `Loss (${depth})`,
    `Rainfall excess (${depth})`,
    `Cumulative rainfall (${depth})`,
    `Cumulative loss (${depth})`,
    `Cumulative excess (${depth})`,
  );
  return head;
}

/** "250 ha" in the unit chosen on screen (the system's display unit when none is given or it is not the system's). */
export function areaText(
  areaM2: number,
  units: UnitSystem,
  chosen: AreaUnit | undefined,
  format: (x: number) => string,
): string {
  const unit =
    chosen !== undefined && AREA_CHOICES[units].includes(chosen) ? chosen : (AREA_CHOICES[units][0] as AreaUnit);
  return `${format(convertArea(areaM2, 'm2', unit))} ${UNIT_LABELS[unit] ?? unit}`;
}

/** The note lines naming the loss method and the catchment with its area: what a file's numbers rest on. */
export function methodAndCatchmentNotes(
  scenario: Scenario,
  method: LossMethod,
  areaUnit: AreaUnit | undefined,
): string[] {
  const { units } = scenario;
  const lines = [
    csvNote(`Loss method: ${methodSpec(method.kind).label}; ${methodParametersText(method, units, noteNumber)}`),
  ];
  if (scenario.catchment.name !== '' || scenario.catchment.areaM2 > 0) {
    const area =
      scenario.catchment.areaM2 > 0
        ? areaText(scenario.catchment.areaM2, units, areaUnit, noteNumber)
        : 'area not given';
    lines.push(csvNote(`Catchment: ${scenario.catchment.name === '' ? 'unnamed' : scenario.catchment.name}; ${area}`));
  }
  return lines;
}

export function barTableCsv({ scenario, method, result, volumeM3, areaUnit }: BarTableInput): string {
  const { storm, units } = scenario;
  const depthUnit = unitText(displayUnit('depth', units));
  const show = (mm: number): string => `${noteNumber(toDisplay('depth', mm, units))} ${depthUnit}`;
  const startMs = storm.startIso === undefined ? null : wallClockMs(storm.startIso);

  const lines: string[] = [
    csvNote(`Raincut bar table: ${scenarioTitle(scenario.name)}`),
    csvNote(`Caution: ${CAUTION_TEXT}`),
    ...methodAndCatchmentNotes(scenario, method, areaUnit),
  ];
  if (storm.startIso !== undefined) lines.push(csvNote(`Storm start: ${storm.startIso}`));
  const volume =
    volumeM3 === null
      ? ''
      : `; runoff volume ${noteNumber(toDisplay('volume', volumeM3, units))} ${unitText(displayUnit('volume', units))}`;
  lines.push(
    csvNote(
      `Totals: rainfall ${show(result.rainMm)}; loss ${show(result.totalLossMm)}; rainfall excess ${show(result.totalExcessMm)}` +
        `; runoff fraction ${noteNumber(result.runoffFraction * 100)} %${volume}`,
    ),
    csvNote('Numbers in the rows are to 12 significant figures; each column heading gives its unit.'),
    csvRow(barTableHeader(scenario)),
  );

  const edges = barEdgesH(storm);
  const mass = massCurveOf(storm.depthsMm, result);
  const n = storm.depthsMm.length;
  for (let k = 0; k < n; k++) {
    const depthMm = storm.depthsMm[k] as number;
    const durationH = storm.durationsH[k] as number;
    const startH = edges[k] as number;
    const row: CsvCell[] = [k + 1];
    if (startMs !== null) row.push(formatClockText(startMs + startH * 3_600_000, true));
    row.push(
      cellNumber(startH * 60),
      cellNumber(durationH * 60),
      cellNumber(toDisplay('depth', depthMm, units)),
      cellNumber(toDisplay('rate', depthMm / durationH, units)),
      cellNumber(toDisplay('depth', result.lossMm[k] as number, units)),
      cellNumber(toDisplay('depth', result.excessMm[k] as number, units)),
      cellNumber(toDisplay('depth', mass.rainMm[k] as number, units)),
      cellNumber(toDisplay('depth', mass.lossMm[k] as number, units)),
      cellNumber(toDisplay('depth', mass.excessMm[k] as number, units)),
    );
    lines.push(csvRow(row));
  }
  // A byte-order mark so spreadsheet programs read the file as UTF-8 (φ, ³ in names and notes).
  return csvFile(lines);
}

/** "fenmoor-brook-storm-bars.csv" from the scenario file name. */
export function exportFileName(base: string, suffix: string, extension: string): string {
  return `${base.replace(/\.json$/, '')}-${suffix}.${extension}`;
}
