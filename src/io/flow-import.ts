import { DISCHARGE_UNITS, UNIT_LABELS, type DischargeUnit } from '../core';
import { describeSteps, formatAmount, isRegular, formatDuration, formatIsoForPeople, plural } from './describe';
import { DEFAULT_NUMBER_FORMAT, type NumberFormat } from './number-format';
import { guessLayout, pickValueColumn } from './layout-guess';
import { problem, problemList, type ImportProblem, type ProblemList } from './problems';
import { numberStyleOf } from './numbers';
import {
  checkSeriesSettings,
  checkStep,
  columnName,
  openSeries,
  previewOf,
  type ImportHints,
  type Series,
  type SeriesSettings,
} from './series';
import { readPlainColumns } from './plain-columns';
import type { TextRow } from './table-text';
import { formatTimeOfDay, isoAt } from './time-values';
import { spreadsheetDaysFor } from './spreadsheet-days';

/**
 * A streamflow record from pasted text: a time and a discharge per line (or
 * discharges alone at a set step). Each time stamp is the instant of its
 * sample; steps may be irregular. Times become hours after the first sample;
 * discharges become m³/s (L/s × 10⁻³, ft³/s × 0.3048³, both exact).
 */
export interface FlowImportSettings extends SeriesSettings {
  readonly unit: DischargeUnit;
}

/** A discharge record in SI: sample times in hours from the first sample, discharge in m³/s. */
export interface FlowRecord {
  readonly timesH: number[];
  readonly dischargeM3s: number[];
  /** ISO 8601 date-time of the first sample, when the times carry dates (or a date was given for times of day). */
  readonly startIso?: string;
}

/** A FlowRecord as the columnar reader gives it: columns of doubles (handed from a worker without a copy). */
export interface FlowColumns {
  readonly timesH: Float64Array;
  readonly dischargeM3s: Float64Array;
  readonly startIso?: string;
}

export type FlowImportResult =
  | { readonly ok: true; readonly record: FlowRecord; readonly summary: string; readonly problems: readonly [] }
  | { readonly ok: false; readonly summary: string; readonly problems: readonly ImportProblem[] };

export interface FlowImportPreview {
  readonly settings: FlowImportSettings;
  readonly summary: string;
  readonly header: readonly string[] | null;
  readonly rows: readonly TextRow[];
  readonly columnCount: number;
  readonly problems: readonly ImportProblem[];
}

const FLOW_NAME = /flow|discharge|\bq\b|m3|m³|cumec|cms|cfs|l\/s|lps|ft3|ft³|cusec/i;
const isFlowName = (name: string): boolean => FLOW_NAME.test(name);

/** The discharge unit a column name states: "Q (L/s)", "Flow [cfs]", "Discharge m3/s". */
export function flowUnitFromName(name: string): DischargeUnit | undefined {
  // Underscores and points separate words in exported names ("discharge_l_s", "q.lps"): read them as spaces.
  const n = name.toLowerCase().replace(/[_.]+/g, ' ');
  if (/l\/s|\blps\b|\bl\s+s\b|litre|liter|\bl\s*s-1/.test(n)) return 'L/s';
  if (/cfs|ft3|ft³|ft\^3|cusec|cubic\s+f(?:ee|oo)t/.test(n)) return 'ft3/s';
  if (/m3|m³|m\^3|cumec|\bcms\b|cubic\s+met/.test(n)) return 'm3/s';
  return undefined;
}

/** Guesses every setting for a streamflow paste. */
export function guessFlowSettings(text: string, hints: ImportHints = {}): FlowImportSettings {
  const layout = guessLayout(text, isFlowName, numberStyleOf(hints.numberFormat ?? DEFAULT_NUMBER_FORMAT));
  const valueColumn = pickValueColumn(layout, isFlowName);
  const name = columnName(layout.table, valueColumn);
  const step = /(\d+(?:[.,]\d+)?)\s*-?\s*min/i.exec(name);
  const stepMinutes = step
    ? Number((step[1] as string).replace(',', '.'))
    : /hourly/i.test(name)
      ? 60
      : /daily/i.test(name)
        ? 1440
        : 15;
  return {
    separator: layout.separator,
    decimal: layout.decimal,
    grouping: layout.grouping,
    skipBlankLines: false,
    skipLines: layout.skipLines,
    hasHeader: layout.hasHeader,
    dateColumn: layout.dateColumn,
    timeColumn: layout.timeColumn,
    valueColumn,
    timeKind: layout.timeKind,
    dateOrder: layout.dateOrder,
    dateForTimesOfDay: null,
    stepMinutesIfNoTime: stepMinutes > 0 ? stepMinutes : 15,
    unit: flowUnitFromName(name) ?? 'm3/s',
  };
}

function checkFlowSettings(s: FlowImportSettings, problems: ProblemList): void {
  checkSeriesSettings(s, problems);
  if (!Object.prototype.hasOwnProperty.call(DISCHARGE_UNITS, s.unit)) {
    problems.add(problem(0, 0, 'unit', String(s.unit), 'must be m3/s, L/s or ft3/s.'));
  }
}

function unitLabel(unit: DischargeUnit): string {
  return UNIT_LABELS[unit] ?? unit;
}

function describeTimes(s: FlowImportSettings, format: NumberFormat): string {
  if (s.timeKind === 'none' || s.timeColumn === null)
    return `without times, ${formatDuration(s.stepMinutesIfNoTime / 60, format)} apart`;
  const kind =
    s.timeKind === 'clock' ? 'clock times' : s.timeKind === 'elapsed-min' ? 'elapsed minutes' : 'elapsed hours';
  return `with ${kind} in column ${s.timeColumn}`;
}

function failureSummary(series: Series | null, s: FlowImportSettings, count: number, format: NumberFormat): string {
  const text = `${plural(count, 'problem', undefined, format)} to fix before importing.`;
  if (series === null) return text.charAt(0).toUpperCase() + text.slice(1);
  return `Read ${plural(series.table.rows.length, 'data line', undefined, format)} as discharge in ${unitLabel(s.unit)} ${describeTimes(s, format)}; ${text}`;
}

/** What a summary needs of the lines read: by the general reader (a Series) or by columns (plain-columns.ts). */
interface FlowLines {
  readonly times: { readonly firstTimeOfDayMs: number | null } | null;
  readonly blankLinesSkipped: number;
  /** The text's line number of data row k. */
  readonly lineOf: (k: number) => number | undefined;
  /** The first data row as split, for what its time cell says. */
  readonly firstRow: TextRow | undefined;
}

const seriesLines = (series: Series): FlowLines => ({
  times: series.times,
  blankLinesSkipped: series.table.blankLinesSkipped,
  lineOf: (k) => series.table.rows[k]?.line,
  firstRow: series.table.rows[0],
});

function successSummary(
  record: FlowRecord | FlowColumns,
  lines: FlowLines,
  s: FlowImportSettings,
  format: NumberFormat,
): string {
  const { timesH, dischargeM3s } = record;
  const n = timesH.length;
  const steps: number[] = [];
  for (let k = 1; k < n; k++) steps.push((timesH[k] as number) - (timesH[k - 1] as number));
  let peakAt = 0;
  for (let k = 1; k < n; k++) if ((dischargeM3s[k] as number) > (dischargeM3s[peakAt] as number)) peakAt = k;
  const spacing = isRegular(steps)
    ? `every ${describeSteps(steps, format)}`
    : `${describeSteps(steps, format).replace(' (irregular steps)', '')} apart (irregular steps)`;
  let head = `${plural(n, 'sample', undefined, format)} ${spacing}`;
  if (record.startIso !== undefined) head += ` from ${formatIsoForPeople(record.startIso)}`;
  else if (lines.times !== null && lines.times.firstTimeOfDayMs !== null) {
    head += ` from ${formatTimeOfDay(lines.times.firstTimeOfDayMs)} (time of day; no date given)`;
  }
  head += `, spanning ${formatDuration(timesH[n - 1] as number, format)}`;
  const peak = (dischargeM3s[peakAt] as number) / DISCHARGE_UNITS[s.unit];
  const peakLine = lines.lineOf(peakAt);
  const parts = [
    head,
    `discharge in ${unitLabel(s.unit)}`,
    `peak ${formatAmount(peak, format)} ${unitLabel(s.unit)}${peakLine !== undefined ? ` on line ${peakLine}` : ''}`,
  ];
  const notes: string[] = [];
  if (lines.times === null)
    notes.push(`no times, so samples are ${formatDuration(s.stepMinutesIfNoTime / 60, format)} apart as set`);
  const first = lines.firstRow;
  const days = spreadsheetDaysFor(s, first, timesH);
  if (days !== null) notes.push(days);
  if (s.skipLines > 0) notes.push(`${plural(s.skipLines, 'line', undefined, format)} skipped at the top`);
  const blank = lines.blankLinesSkipped;
  if (blank > 0) notes.push(`${plural(blank, 'blank line', undefined, format)} inside the data skipped`);
  return `${parts.join(', ')}${notes.length > 0 ? `; ${notes.join('; ')}` : ''}.`;
}

interface FlowRun {
  readonly result: FlowImportResult;
  readonly series: Series | null;
}

function fail(series: Series | null, s: FlowImportSettings, problems: ProblemList, format: NumberFormat): FlowRun {
  return {
    result: { ok: false, summary: failureSummary(series, s, problems.count, format), problems: problems.list() },
    series,
  };
}

function runFlowImport(text: string, settings: FlowImportSettings, format: NumberFormat): FlowRun {
  const problems = problemList();
  const series = openSeries(text, settings, checkFlowSettings, () => 'discharge', problems);
  if (series === null) return fail(null, settings, problems, format);
  const n = series.table.rows.length;
  if (n === 0) problems.add(problem(0, 0, 'text', '', 'no data lines were found; paste times and discharges.'));
  else if (n === 1)
    problems.add(problem(0, 0, 'text', '', 'a streamflow record needs at least two samples; only one line was found.'));
  if (problems.count > 0) return fail(series, settings, problems, format);

  const factor = DISCHARGE_UNITS[settings.unit];
  const dischargeM3s = series.values.map((v) => v * factor);
  let timesH: number[];
  if (series.times === null) {
    if (!checkStep(settings, problems)) return fail(series, settings, problems, format);
    const dt = settings.stepMinutesIfNoTime / 60;
    timesH = series.values.map((_, k) => k * dt);
  } else timesH = series.times.hours.slice();
  const origin = series.times?.origin ?? null;
  const record: FlowRecord =
    origin === null ? { timesH, dischargeM3s } : { timesH, dischargeM3s, startIso: isoAt(origin, 0) };
  return {
    result: { ok: true, record, summary: successSummary(record, seriesLines(series), settings, format), problems: [] },
    series,
  };
}

/** Reads a streamflow record with the given settings. Never throws; bad input comes back as problems. */
export function applyFlowImport(
  text: string,
  settings: FlowImportSettings,
  format: NumberFormat = DEFAULT_NUMBER_FORMAT,
): FlowImportResult {
  return runFlowImport(text, settings, format).result;
}

/** The preview for given settings: the table as split, the summary and the problems. */
export function previewFlowImport(
  text: string,
  settings: FlowImportSettings,
  format: NumberFormat = DEFAULT_NUMBER_FORMAT,
): FlowImportPreview {
  const { result, series } = runFlowImport(text, settings, format);
  return previewOf(settings, result, series);
}

/** The preview and the result of one run: what a dialog needs, reading a long text once rather than twice. */
export function readFlowImport(
  text: string,
  settings: FlowImportSettings,
  format: NumberFormat = DEFAULT_NUMBER_FORMAT,
): { readonly preview: FlowImportPreview; readonly result: FlowImportResult } {
  const { result, series } = runFlowImport(text, settings, format);
  return { preview: previewOf(settings, result, series), result };
}

/** Guesses the settings and returns the preview they give. */
export function guessFlowImport(text: string, hints: ImportHints = {}): FlowImportPreview {
  return previewFlowImport(
    text,
    guessFlowSettings(typeof text === 'string' ? text : '', hints),
    hints.numberFormat ?? DEFAULT_NUMBER_FORMAT,
  );
}

/** What the columnar reader gives a dialog: the record, its summary and the head of the table. */
export interface PlainFlowRead {
  readonly record: FlowColumns;
  readonly summary: string;
  readonly header: readonly string[] | null;
  /** The first data rows as split (at most the `headRows` asked for). */
  readonly rows: readonly TextRow[];
  readonly rowCount: number;
  readonly columnCount: number;
}

/**
 * A long, plainly written streamflow record (plain-columns.ts) read into
 * columns without a row object per line; null for any text or setting that
 * the general reader must read (and word any problem of). What it gives is
 * what applyFlowImport gives for the same text and settings
 * (test/io/plain-columns-flow.test.ts checks that on random records).
 */
export function readPlainFlow(
  text: string,
  settings: FlowImportSettings,
  format: NumberFormat,
  headRows: number,
): PlainFlowRead | null {
  if (typeof text !== 'string' || settings === null || typeof settings !== 'object') return null;
  const problems = problemList();
  checkFlowSettings(settings, problems);
  if (problems.count > 0) return null;
  const read = readPlainColumns(text, settings, headRows);
  // No line or one line is a problem for the general reader to word.
  if (read === null || read.rowCount < 2) return null;
  const n = read.rowCount;
  const factor = DISCHARGE_UNITS[settings.unit];
  const dischargeM3s = new Float64Array(n);
  for (let k = 0; k < n; k++) dischargeM3s[k] = (read.values[k] as number) * factor;
  let timesH: Float64Array;
  if (read.times === null) {
    if (!checkStep(settings, problems)) return null;
    const dt = settings.stepMinutesIfNoTime / 60;
    timesH = new Float64Array(n);
    for (let k = 0; k < n; k++) timesH[k] = k * dt;
  } else timesH = read.times.hours;
  const origin = read.times?.origin ?? null;
  const record: FlowColumns =
    origin === null ? { timesH, dischargeM3s } : { timesH, dischargeM3s, startIso: isoAt(origin, 0) };
  const first = read.firstLine;
  const summary = successSummary(
    record,
    { times: read.times, blankLinesSkipped: 0, lineOf: (k) => first + k, firstRow: read.headRows[0] },
    settings,
    format,
  );
  return {
    record,
    summary,
    header: read.header?.cells ?? null,
    rows: read.headRows,
    rowCount: n,
    columnCount: read.columnCount,
  };
}
