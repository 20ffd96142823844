import { DEPTH_UNITS, RATE_UNITS, isInputError, validateStorm, type Storm } from '../core';
import { describeSteps, formatAmount, formatCount, formatDuration, formatIsoForPeople, plural } from './describe';
import { DEFAULT_NUMBER_FORMAT, type NumberFormat } from './number-format';
import { breachMessage, checkPlausible, stormBeyondRecords } from './plausible';
import { guessLayout, pickValueColumn } from './layout-guess';
import { numberStyleOf, parseNumber } from './numbers';
import { problem, problemList, type ImportProblem, type ProblemList } from './problems';
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
import { plainArray, readPlainColumns, type ColumnTimes } from './plain-columns';
import type { TextRow } from './table-text';
import { formatTimeOfDay, isoAt, parseClock, type TimeLine } from './time-values';
import { spreadsheetDaysFor } from './spreadsheet-days';

/**
 * Rainfall from pasted text: one column of values, or a time and a value.
 *
 * Conventions (each one a setting the user can change in the preview):
 *
 * - Depth or intensity per bar with times: by default a time stamp marks the
 *   END of its bar (`timeMarks: 'end'`). Gauges and loggers report the rain
 *   that fell in the interval ending at the stamp, so "10:10  1.2" is 1.2 mm
 *   between 10:00 and 10:10. Each bar runs from the previous stamp to its own;
 *   the first bar has no previous stamp and takes the first gap (the step from
 *   the first stamp to the second). The storm starts one first-gap before the
 *   first stamp. With `timeMarks: 'start'` a stamp opens its bar, each bar runs
 *   to the next stamp and the last bar takes the last gap. Elapsed times that
 *   begin at 0 are guessed as starts (0 is the storm's start), all else as ends.
 * - A step longer than the record's own (the most frequent step) is a gap:
 *   by default (`gaps: 'fill'`) the reading keeps one step for its rain and
 *   the rest of the gap becomes dry bars of the step, so 0.6 mm two hours
 *   after the previous reading of a 15-min record stays 0.6 mm in 15 min;
 *   `gaps: 'keep'` makes it one 2-h bar. A record whose steps mostly differ
 *   has no step of its own: its bars keep their unequal durations.
 * - Cumulative depths are readings at instants; bars are the differences
 *   between successive readings, and a reading below the one before is an
 *   error. `cumulativeFrom: 'first-value'` (the guess when there are times, or
 *   when the first value is 0) takes the first reading as the starting level,
 *   so n readings give n − 1 bars; `'zero'` counts from nothing, so the first
 *   value is the first bar's depth (with times, that bar takes the first gap).
 *   `timeMarks` does not apply to cumulative readings.
 * - Intensities are in mm/h or in/h (the `unit` setting gives the length);
 *   depth = intensity × bar duration. Inches convert exactly, 1 in = 25.4 mm.
 * - Without times, bars follow each other at `stepMinutesIfNoTime`.
 * - The storm is placed on the calendar (`startIso`) only when the times carry
 *   dates, or when they are times of day and the user gives the date of the
 *   first one (`dateForTimesOfDay`). Times without a zone give a start without
 *   a zone ("2024-05-01T09:50:00"), as the demo scenario's start is written.
 */
export type RainValueKind = 'depth' | 'intensity' | 'cumulative';
export type RainUnit = 'mm' | 'in';
/** Whether a time stamp marks the end (the usual gauge record) or the start of its bar. */
export type TimeMarks = 'end' | 'start';
/** Whether cumulative readings count from zero or from the first reading. */
export type CumulativeFrom = 'zero' | 'first-value';
/**
 * What a step longer than the record's own step becomes. 'fill' (the
 * default): the reading's rain keeps the record's step, at the end of the
 * gap for stamps that mark the end of their bar and for cumulative
 * readings, at its start for stamps that mark the start, and the rest of
 * the gap is dry bars of the step. 'keep': one long bar, its rain spread
 * over the whole gap (a lower intensity).
 */
export type GapChoice = 'fill' | 'keep';

export interface RainImportSettings extends SeriesSettings {
  readonly valueKind: RainValueKind;
  /** mm or in; for intensities, mm/h or in/h. */
  readonly unit: RainUnit;
  readonly timeMarks: TimeMarks;
  readonly cumulativeFrom: CumulativeFrom;
  /** Steps longer than the record's step, when there are times (default 'fill'). */
  readonly gaps?: GapChoice | undefined;
}

/** A storm as imported: plain arrays, SI units (durations h, depths mm). */
export interface ImportedStorm extends Storm {
  readonly durationsH: number[];
  readonly depthsMm: number[];
}

/** A storm as the readers build it: columns of doubles, SI units (durations h, depths mm). */
export interface StormColumns extends Storm {
  readonly durationsH: Float64Array;
  readonly depthsMm: Float64Array;
}

/** The storm in plain arrays, as the scenario holds it. */
export function importedStorm(columns: StormColumns): ImportedStorm {
  const durationsH = plainArray(columns.durationsH);
  const depthsMm = plainArray(columns.depthsMm);
  return columns.startIso === undefined
    ? { durationsH, depthsMm }
    : { durationsH, depthsMm, startIso: columns.startIso };
}

export type RainImportResult =
  | { readonly ok: true; readonly storm: ImportedStorm; readonly summary: string; readonly problems: readonly [] }
  | { readonly ok: false; readonly summary: string; readonly problems: readonly ImportProblem[] };

/** What the paste dialog shows before anything is applied. */
export interface RainImportPreview {
  /** Every guess, as a setting to show and let the user correct. */
  readonly settings: RainImportSettings;
  /** One sentence: what was understood, or how many problems stand in the way. */
  readonly summary: string;
  readonly header: readonly string[] | null;
  /** The data rows as split, with their line numbers. */
  readonly rows: readonly TextRow[];
  readonly columnCount: number;
  readonly problems: readonly ImportProblem[];
}

const VALUE_KIND_WORDS: Record<RainValueKind, string> = {
  depth: 'depth',
  intensity: 'intensity',
  cumulative: 'cumulative depth',
};

// "in" counts only as a unit in brackets or with /h, so "time in min" is not taken for rain.
const RAIN_NAME = /rain|precip|depth|\bmm\b|inch|[([]in\b|\bin\/h|intens|cumul|\bcum\b|accum|mass\b|\bp\b|\bi\b/i;
const isRainName = (name: string): boolean => RAIN_NAME.test(name);

/** Kind, unit and step that a column name states, e.g. "Intensity (in/h)", "Cumulative rain [mm]", "10-min rain". */
export function rainHintsFromName(name: string): { kind?: RainValueKind; unit?: RainUnit; stepMinutes?: number } {
  // Underscores and points separate words in exported names ("depth_in", "rain_mm_h"): read them as spaces.
  const n = name.toLowerCase().replace(/[_.]+/g, ' ');
  const hints: { kind?: RainValueKind; unit?: RainUnit; stepMinutes?: number } = {};
  if (/intens|rate|\/\s*h(?:r|our)?\b|per\s+h(?:(?:ou)?r)?\b|\b(?:mm|in)\s+h(?:r|our)?\b|mm\/h|in\/h|iph|mmph/.test(n))
    hints.kind = 'intensity';
  else if (/cumul|\bcum\b|accum|mass\b|running/.test(n)) hints.kind = 'cumulative';
  else if (/depth|increment|per\s+(?:bar|interval|step)/.test(n)) hints.kind = 'depth';
  if (/\bmm\b|millim/.test(n)) hints.unit = 'mm';
  else if (/inch|\bin\b|\(in|\[in|in\/h|iph|"/.test(n)) hints.unit = 'in';
  const step = /(\d+(?:[.,]\d+)?)\s*-?\s*min/.exec(n);
  if (step) hints.stepMinutes = Number((step[1] as string).replace(',', '.'));
  else if (/hourly/.test(n)) hints.stepMinutes = 60;
  else if (/daily/.test(n)) hints.stepMinutes = 1440;
  return hints;
}

/** The value cell a row holds: its one cell when read along a line, else the value column's. */
function valueCell(row: TextRow, s: RainImportSettings): string {
  return (row.column !== undefined ? row.cells[0] : row.cells[s.valueColumn - 1]) ?? '';
}

/** Readings that only ever rise over several lines are most likely a gauge's cumulative record. */
function looksCumulative(values: readonly number[]): boolean {
  const finite = values.filter((v) => !Number.isNaN(v));
  if (finite.length < 6) return false;
  for (let i = 1; i < finite.length; i++) if ((finite[i] as number) < (finite[i - 1] as number)) return false;
  return (finite[finite.length - 1] as number) > (finite[0] as number);
}

/** Guesses every setting for a rainfall paste. */
export function guessRainSettings(text: string, hints: ImportHints = {}): RainImportSettings {
  const layout = guessLayout(text, isRainName, numberStyleOf(hints.numberFormat ?? DEFAULT_NUMBER_FORMAT));
  const valueColumn = pickValueColumn(layout, isRainName);
  const named = rainHintsFromName(columnName(layout.table, valueColumn));
  const sample = layout.table.rows.slice(0, 500);
  const values = sample.map((r) => parseNumber(r.cells[valueColumn - 1] ?? '', layout.decimal, layout.grouping));
  const valueKind: RainValueKind = named.kind ?? (looksCumulative(values) ? 'cumulative' : 'depth');
  const hasTimes = layout.timeColumn !== null;
  let timeMarks: TimeMarks = 'end';
  const firstRow = sample.find((r) => r.cells.length > 0);
  const firstTimeCell = layout.timeColumn === null ? '' : (firstRow?.cells[layout.timeColumn - 1] ?? '');
  if (layout.timeKind === 'elapsed-min' || layout.timeKind === 'elapsed-h') {
    if (parseNumber(firstTimeCell, layout.decimal, layout.grouping) === 0) timeMarks = 'start';
  } else if (layout.timeKind === 'clock' && layout.dateColumn === null) {
    // A daily record stamped with dates alone gives each day's rain under that day's date.
    const first = parseClock(firstTimeCell, layout.dateOrder);
    if (first.ok && first.value.date !== null && !first.value.hasTime) timeMarks = 'start';
  }
  const firstValue = values.find((v) => !Number.isNaN(v));
  const cumulativeFrom: CumulativeFrom = hasTimes || firstValue === 0 ? 'first-value' : 'zero';
  const screenStep = hints.stepMinutes !== undefined && hints.stepMinutes > 0 && Number.isFinite(hints.stepMinutes);
  return {
    separator: layout.separator,
    decimal: layout.decimal,
    grouping: layout.grouping,
    valuesAlong: layout.valuesAlong,
    skipBlankLines: false,
    skipLines: layout.skipLines,
    hasHeader: layout.hasHeader,
    dateColumn: layout.dateColumn,
    timeColumn: layout.timeColumn,
    valueColumn,
    timeKind: layout.timeKind,
    dateOrder: layout.dateOrder,
    dateForTimesOfDay: null,
    stepMinutesIfNoTime:
      named.stepMinutes !== undefined && named.stepMinutes > 0
        ? named.stepMinutes
        : screenStep
          ? (hints.stepMinutes as number)
          : 60,
    valueKind,
    unit: named.unit ?? 'mm',
    timeMarks,
    cumulativeFrom,
    gaps: 'fill',
  };
}

function checkRainSettings(s: RainImportSettings, problems: ProblemList): void {
  checkSeriesSettings(s, problems);
  if (!(s.valueKind in VALUE_KIND_WORDS)) {
    problems.add(problem(0, 0, 'valueKind', String(s.valueKind), 'must be depth, intensity or cumulative.'));
  }
  if (s.unit !== 'mm' && s.unit !== 'in') problems.add(problem(0, 0, 'unit', String(s.unit), 'must be mm or in.'));
  if (s.timeMarks !== 'end' && s.timeMarks !== 'start') {
    problems.add(problem(0, 0, 'timeMarks', String(s.timeMarks), 'must be end or start.'));
  }
  if (s.cumulativeFrom !== 'zero' && s.cumulativeFrom !== 'first-value') {
    problems.add(problem(0, 0, 'cumulativeFrom', String(s.cumulativeFrom), 'must be zero or first-value.'));
  }
  if (s.gaps !== undefined && s.gaps !== 'fill' && s.gaps !== 'keep') {
    problems.add(problem(0, 0, 'gaps', String(s.gaps), 'must be fill or keep.'));
  }
}

/** Each cumulative reading must be at least the one before; a fall is reported where it happens. */
function checkCumulative(series: Series, s: RainImportSettings, problems: ProblemList): void {
  let prev: { value: number; line: number; cell: string } | null = null;
  series.table.rows.forEach((row, i) => {
    const v = series.values[i] as number;
    if (Number.isNaN(v)) return;
    const cell = valueCell(row, s);
    if (prev !== null && v < prev.value) {
      problems.add(
        problem(
          row.line,
          row.column ?? s.valueColumn,
          'cumulative depth',
          cell,
          `the cumulative depth falls from ${prev.cell} on line ${prev.line}; cumulative readings cannot decrease (a gauge reset or a typing slip?).`,
        ),
      );
    }
    prev = { value: v, line: row.line, cell };
  });
}

/** Steps longer than the record's own step, found between time stamps. */
export interface RecordGaps {
  /** The record's step, hours: the most frequent step between stamps. */
  readonly stepH: number;
  readonly count: number;
  /** The longest gap: its length (hours) and the lines of the stamps before and after it. */
  readonly longest: { readonly lengthH: number; readonly fromLine: number; readonly toLine: number } | null;
  /** Lines of the stamps that end the first gaps (at most GAP_LINES_LISTED), in text order. */
  readonly endLines: readonly number[];
}

/** Lines named in the summary for the gaps; the count says how many more. */
export const GAP_LINES_LISTED = 5;

/** Steps are compared to the millisecond: stamps are read to the millisecond. */
const stepKey = (h: number): number => Math.round(h * 3_600_000);

/**
 * A step longer than the record's by less than this share of a step is the
 * rounding of the stamps, not a gap: elapsed hours written to 4 decimals
 * step by 0.0833 or 0.0834 h at 5 min, and a spreadsheet's day numbers to 6
 * decimals by 0.086 s either way. No reading can be missed in a twentieth of
 * a step (our rule, no source).
 */
const ROUNDING_SHARE = 0.05;

/** Whether a step of lengthH is a gap in a record of stepH: longer by more than the stamps' rounding. */
const isGap = (lengthH: number, stepH: number): boolean => lengthH - stepH > ROUNDING_SHARE * stepH;

/**
 * The record's step (the most frequent step between successive stamps; the
 * shortest of equally frequent ones) and the steps longer than it; null
 * when fewer than half the steps are the most frequent one (a record of
 * unequal bars, which has no step of its own). A record of two steps
 * (5 min, then 10 min for a while) shows its longer steps as gaps; the
 * preview says so and "keep" leaves them as they are.
 */
export function findGaps(hours: ArrayLike<number>, lineOf: (row: number) => number): RecordGaps | null {
  const n = hours.length;
  if (n < 3) return null;
  const counts = new Map<number, number>();
  for (let k = 1; k < n; k++) {
    const key = stepKey((hours[k] as number) - (hours[k - 1] as number));
    counts.set(key, (counts.get(key) ?? 0) + 1);
  }
  let stepKeyMs = 0;
  let most = 0;
  for (const [key, count] of counts) {
    if (count > most || (count === most && key < stepKeyMs)) {
      stepKeyMs = key;
      most = count;
    }
  }
  // A record whose steps mostly differ (a storm of unequal bars written out with its times) has no step of its own to fill with.
  if (most * 2 < n - 1) return null;
  const stepH = stepKeyMs / 3_600_000;
  let count = 0;
  let longest: RecordGaps['longest'] = null;
  const endLines: number[] = [];
  for (let k = 1; k < n; k++) {
    const lengthH = (hours[k] as number) - (hours[k - 1] as number);
    if (!isGap(lengthH, stepH)) continue;
    count++;
    if (endLines.length < GAP_LINES_LISTED) endLines.push(lineOf(k));
    if (longest === null || lengthH > longest.lengthH) {
      longest = { lengthH, fromLine: lineOf(k - 1), toLine: lineOf(k) };
    }
  }
  return count === 0 ? { stepH, count, longest: null, endLines } : { stepH, count, longest, endLines };
}

interface Bars {
  durationsH: Float64Array;
  depthsMm: Float64Array;
  /** Hours from the first time stamp to the storm's start (0 or negative). */
  startOffsetH: number;
  /** For each bar, the data row it was read from; -1 for a dry bar that fills a gap. */
  rowOfBar: Int32Array;
}

/**
 * One bar per reading, as the stamps give them: each row's bar (its row
 * index, its duration), before gaps are filled.
 */
function readingBars(
  n: number,
  hours: ArrayLike<number> | null,
  s: RainImportSettings,
  problems: ProblemList,
): { rows: Int32Array; durationsH: Float64Array; startOffsetH: number } | null {
  const cumulative = s.valueKind === 'cumulative';
  const fromFirst = cumulative && s.cumulativeFrom === 'first-value';
  const first = fromFirst ? 1 : 0;
  // Columns made at their length: on a record of 10⁶ readings, growing arrays cost more than the reading.
  const rows = new Int32Array(n - first);
  const durationsH = new Float64Array(n - first);
  let startOffsetH = 0;
  for (let k = first; k < n; k++) rows[k - first] = k;
  if (hours === null) {
    if (!checkStep(s, problems)) return null;
    durationsH.fill(s.stepMinutesIfNoTime / 60);
  } else if (fromFirst) {
    for (let k = 1; k < n; k++) durationsH[k - 1] = (hours[k] as number) - (hours[k - 1] as number);
  } else if (n === 1) {
    // One stamp gives no step: the bar takes the step setting.
    if (!checkStep(s, problems)) return null;
    const dt = s.stepMinutesIfNoTime / 60;
    durationsH[0] = dt;
    startOffsetH = s.timeMarks === 'end' || cumulative ? -dt : 0;
  } else if (s.timeMarks === 'end' || cumulative) {
    durationsH[0] = (hours[1] as number) - (hours[0] as number);
    for (let k = 1; k < n; k++) durationsH[k] = (hours[k] as number) - (hours[k - 1] as number);
    startOffsetH = -(durationsH[0] as number);
  } else {
    for (let k = 0; k < n - 1; k++) durationsH[k] = (hours[k + 1] as number) - (hours[k] as number);
    durationsH[n - 1] = (hours[n - 1] as number) - (hours[n - 2] as number);
  }
  return { rows, durationsH, startOffsetH };
}

/**
 * Bars from clean values (all finite, ≥ 0) and, when given, clean times
 * (strictly rising hours). Adds a problem and returns null when the rows are
 * too few for the settings. With gaps filled, a reading whose step is
 * longer than the record's keeps one step of it for its rain, and the rest
 * of the gap becomes dry bars of the step (a shorter dry bar first, then
 * whole steps, for a gap that is not a whole number of steps).
 */
function buildBars(
  values: ArrayLike<number>,
  hours: ArrayLike<number> | null,
  gaps: RecordGaps | null,
  s: RainImportSettings,
  problems: ProblemList,
): Bars | null {
  const n = values.length;
  const cumulative = s.valueKind === 'cumulative';
  const fromFirst = cumulative && s.cumulativeFrom === 'first-value';
  if (fromFirst && n < 2) {
    problems.add(
      problem(
        0,
        0,
        'text',
        '',
        'cumulative readings counted from the first reading need at least two lines; set "count from zero" if the first value is already a depth.',
      ),
    );
    return null;
  }
  const read = readingBars(n, hours, s, problems);
  if (read === null) return null;
  let { durationsH, startOffsetH } = read;
  let rowOfBar = read.rows;
  if (gaps !== null && gaps.count > 0 && (s.gaps ?? 'fill') === 'fill') {
    const step = gaps.stepH;
    const wetFirst = !cumulative && s.timeMarks === 'start';
    const filledDurations: number[] = [];
    const filledRows: number[] = [];
    const last = durationsH.length - 1;
    for (let b = 0; b <= last; b++) {
      const d = durationsH[b] as number;
      const row = rowOfBar[b] as number;
      // The first bar of end stamps (and the last of start stamps) has no stamp of its own on the far side: it takes the step.
      const edge = hours !== null && !fromFirst && (wetFirst ? b === last : b === 0);
      if (!isGap(d, step)) {
        filledDurations.push(d);
        filledRows.push(row);
        continue;
      }
      if (edge) {
        filledDurations.push(step);
        filledRows.push(row);
        if (b === 0) startOffsetH = -step;
        continue;
      }
      const dry = d - step;
      const whole = Math.floor(stepKey(dry) / stepKey(step));
      const rest = dry - whole * step;
      // A rest within the stamps' rounding is no dry bar: the wet bar keeps it, so the bars still span the stamps.
      const restIsBar = rest > ROUNDING_SHARE * step;
      const wet = restIsBar ? step : step + rest;
      if (wetFirst) {
        filledDurations.push(wet);
        filledRows.push(row);
      }
      if (restIsBar) {
        filledDurations.push(rest);
        filledRows.push(-1);
      }
      for (let w = 0; w < whole; w++) {
        filledDurations.push(step);
        filledRows.push(-1);
      }
      if (!wetFirst) {
        filledDurations.push(wet);
        filledRows.push(row);
      }
    }
    durationsH = Float64Array.from(filledDurations);
    rowOfBar = Int32Array.from(filledRows);
  }
  const bars = durationsH.length;
  const depthsMm = new Float64Array(bars);
  if (cumulative) {
    const mm = DEPTH_UNITS[s.unit];
    for (let b = 0; b < bars; b++) {
      const k = rowOfBar[b] as number;
      if (k >= 0) {
        const before = k === 0 ? (fromFirst ? (values[0] as number) : 0) : (values[k - 1] as number);
        depthsMm[b] = ((values[k] as number) - before) * mm;
      }
    }
  } else if (s.valueKind === 'intensity') {
    const mmH = RATE_UNITS[s.unit === 'mm' ? 'mm/h' : 'in/h'];
    for (let b = 0; b < bars; b++) {
      const k = rowOfBar[b] as number;
      depthsMm[b] = k < 0 ? 0 : (values[k] as number) * mmH * (durationsH[b] as number);
    }
  } else {
    const mm = DEPTH_UNITS[s.unit];
    for (let b = 0; b < bars; b++) {
      const k = rowOfBar[b] as number;
      depthsMm[b] = k < 0 ? 0 : (values[k] as number) * mm;
    }
  }
  return { durationsH, depthsMm, startOffsetH, rowOfBar };
}

function describeTimes(s: RainImportSettings, format: NumberFormat): string {
  const along = s.valuesAlong === 'line' ? 'along each line, ' : '';
  if (s.timeKind === 'none' || s.timeColumn === null)
    return `${along}without times, at ${formatDuration(s.stepMinutesIfNoTime / 60, format)} steps`;
  const kind =
    s.timeKind === 'clock' ? 'clock times' : s.timeKind === 'elapsed-min' ? 'elapsed minutes' : 'elapsed hours';
  return `with ${kind} in column ${s.timeColumn}`;
}

function unitWords(s: RainImportSettings): string {
  return s.valueKind === 'intensity' ? `${s.unit}/h` : s.unit;
}

function kindPlural(kind: RainValueKind): string {
  return kind === 'depth' ? 'depths' : kind === 'intensity' ? 'intensities' : 'cumulative depths';
}

function failureSummary(series: Series | null, s: RainImportSettings, count: number, format: NumberFormat): string {
  const lines =
    series === null
      ? ''
      : `Read ${plural(series.table.rows.length, s.valuesAlong === 'line' ? 'value' : 'data line', undefined, format)} as ${kindPlural(s.valueKind)} in ${unitWords(s)} ${describeTimes(s, format)}; `;
  const text = `${plural(count, 'problem', undefined, format)} to fix before importing.`;
  return lines === '' ? text.charAt(0).toUpperCase() + text.slice(1) : lines + text;
}

function successSummary(
  storm: StormColumns,
  startOffsetH: number,
  series: RainColumns,
  s: RainImportSettings,
  format: NumberFormat,
  gaps: RecordGaps | null,
): string {
  const n = storm.durationsH.length;
  let total = 0;
  for (const p of storm.depthsMm) total += p;
  const parts: string[] = [];
  let head = `${plural(n, 'bar', undefined, format)} of ${describeSteps(storm.durationsH, format)}`;
  if (storm.startIso !== undefined) head += ` from ${formatIsoForPeople(storm.startIso)}`;
  else if (series.times !== null && series.times.firstTimeOfDayMs !== null) {
    const dayMs = 24 * 3_600_000;
    const startMs = (((series.times.firstTimeOfDayMs + startOffsetH * 3_600_000) % dayMs) + dayMs) % dayMs;
    head += ` from ${formatTimeOfDay(startMs)} (time of day; no date given)`;
  }
  parts.push(head);
  parts.push(`${kindPlural(s.valueKind)} in ${unitWords(s)}`);
  parts.push(
    s.unit === 'in'
      ? `total ${formatAmount(total / DEPTH_UNITS.in, format)} in (${formatAmount(total, format)} mm)`
      : `total ${formatAmount(total, format)} mm`,
  );
  const notes: string[] = [];
  if (series.times !== null) {
    if (s.valueKind !== 'cumulative') notes.push(`time stamps mark the ${s.timeMarks} of each bar`);
    const first = series.rowAt(0);
    const hours = series.times.hours;
    const days = spreadsheetDaysFor(s, first, hours);
    if (days !== null) notes.push(days);
  } else {
    const along = s.valuesAlong === 'line' ? 'values read along each line; ' : '';
    notes.push(`${along}no times, so bars are ${formatDuration(s.stepMinutesIfNoTime / 60, format)} apart as set`);
    const unread = unreadDurations(series.header, s);
    if (unread !== null) notes.push(unread);
  }
  if (s.valueKind === 'cumulative') {
    const first = series.rowAt(0);
    if (s.cumulativeFrom === 'zero') notes.push('counted from zero');
    else if (first !== undefined && series.values[0] !== 0) {
      notes.push(`counted from the first reading, ${valueCell(first, s)} on line ${first.line}`);
    }
  }
  if (gaps !== null && gaps.longest !== null) notes.push(gapWords(gaps, s, format));
  if (s.skipLines > 0) notes.push(`${plural(s.skipLines, 'line', undefined, format)} skipped at the top`);
  const blank = series.blankLinesSkipped;
  if (blank > 0) notes.push(`${plural(blank, 'blank line', undefined, format)} inside the data skipped`);
  const beyond = stormBeyondRecords(storm);
  if (beyond.first !== null) {
    const b = beyond.first;
    const others = beyond.count > 1 ? ` (and ${plural(beyond.count - 1, 'other bar', undefined, format)})` : '';
    notes.push(
      `check the unit and the step: bar ${formatCount(b.bar + 1, format)}${others} holds ${formatAmount(b.depthMm, format)} mm in ${formatDuration(b.durationH, format)}, more than the world’s greatest recorded rainfalls (about ${formatAmount(b.recordMm, format)} mm in that time; Jennings 1950, from memory)`,
    );
  }
  return `${parts.join(', ')}${notes.length > 0 ? `; ${notes.join('; ')}` : ''}.`;
}

/** The gaps in words: how many, the longest and where, the lines of the first, and what was done with them. */
function gapWords(gaps: RecordGaps, s: RainImportSettings, format: NumberFormat): string {
  const step = formatDuration(gaps.stepH, format);
  const longest = gaps.longest as NonNullable<RecordGaps['longest']>;
  const where = `the longest ${formatDuration(longest.lengthH, format)} between lines ${formatCount(longest.fromLine, format)} and ${formatCount(longest.toLine, format)}`;
  const others =
    gaps.count > 1
      ? `; gaps end on line${gaps.endLines.length > 1 ? 's' : ''} ${gaps.endLines.map((l) => formatCount(l, format)).join(', ')}${gaps.count > gaps.endLines.length ? ` and ${plural(gaps.count - gaps.endLines.length, 'more line', undefined, format)}` : ''}`
      : '';
  const done =
    (s.gaps ?? 'fill') === 'fill'
      ? `each reading keeps one ${step} bar and the rest of its gap is dry ${step} bars`
      : 'each reading after a gap is one long bar over the whole gap';
  return `${plural(gaps.count, 'gap', undefined, format)} longer than the record’s ${step} step (${where}${others}): ${done}`;
}

/**
 * Bars holding more than any rainfall depth can be (src/io/plausible.ts)
 * are refused where they were read: the line and column of the value (for
 * cumulative readings, of the reading that ends the bar).
 */
function checkBarDepths(
  bars: Bars,
  series: RainColumns,
  s: RainImportSettings,
  problems: ProblemList,
  format: NumberFormat,
): void {
  for (let k = 0; k < bars.depthsMm.length; k++) {
    const depthMm = bars.depthsMm[k] as number;
    const breach = checkPlausible('depth', depthMm);
    if (breach === null) continue;
    const row = series.rowAt(bars.rowOfBar[k] as number);
    const column = row?.column ?? s.valueColumn;
    const cell = row === undefined ? '' : valueCell(row, s);
    problems.add(
      problem(
        row?.line ?? 0,
        column,
        VALUE_KIND_WORDS[s.valueKind],
        cell,
        breachMessage(
          breach,
          `the bar read here holds ${formatAmount(depthMm, format)} mm, which`,
          `${formatAmount(breach.limit, format)} mm`,
        ),
      ),
    );
  }
}

interface RainRun {
  readonly result: RainImportResult;
  /** The table as split, or null when the settings did not allow splitting. */
  readonly series: Series | null;
}

function fail(series: Series | null, s: RainImportSettings, problems: ProblemList, format: NumberFormat): RainRun {
  return {
    result: { ok: false, summary: failureSummary(series, s, problems.count, format), problems: problems.list() },
    series,
  };
}

/**
 * What the bars are made from, whichever reader read the text (the general
 * one, series.ts, or the columnar one for long plain records,
 * plain-columns.ts): the value column, the times, and the rows for messages.
 */
interface RainColumns {
  readonly values: ArrayLike<number>;
  readonly times: ColumnTimes | TimeLine | null;
  readonly rowCount: number;
  readonly blankLinesSkipped: number;
  /** Data row k as split (its line and cells), for messages and notes. */
  readonly rowAt: (k: number) => TextRow | undefined;
  /** Line of data row k. */
  readonly lineOf: (k: number) => number;
  /** The column names, when the text has a header. */
  readonly header?: readonly string[] | null | undefined;
}

function seriesColumns(series: Series): RainColumns {
  const rows = series.table.rows;
  return {
    values: series.values,
    times: series.times,
    rowCount: rows.length,
    blankLinesSkipped: series.table.blankLinesSkipped,
    rowAt: (k) => rows[k],
    lineOf: (k) => (rows[k] as TextRow).line,
    header: series.table.header?.cells ?? null,
  };
}

// A column that names bar lengths rather than clock times ("duration_min", "Interval (h)", "dt").
const DURATION_NAME = /durat|interval|\bdt\b|length|\bstep\b/i;

/**
 * The note for a column named for durations that is not read: the bars take
 * the step set, whatever that column says (1440 min bars read as 10-min ones
 * would be 144 times as intense), or null.
 */
function unreadDurations(header: readonly string[] | null | undefined, s: RainImportSettings): string | null {
  if (!header) return null;
  for (let c = 0; c < header.length; c++) {
    const name = (header[c] as string).trim();
    if (c + 1 === s.valueColumn || !DURATION_NAME.test(name)) continue;
    return `column ${c + 1}, “${name}”, is not read: bars are as long as the time step set, not as that column says`;
  }
  return null;
}

/** From clean columns to the storm and its summary; null when a problem was added. */
function finishRain(
  columns: RainColumns,
  settings: RainImportSettings,
  format: NumberFormat,
  problems: ProblemList,
): { readonly storm: StormColumns; readonly summary: string } | null {
  const hours = columns.times?.hours ?? null;
  const gaps = hours === null ? null : findGaps(hours, columns.lineOf);
  const bars = buildBars(columns.values, hours, gaps, settings, problems);
  if (bars === null) return null;
  checkBarDepths(bars, columns, settings, problems, format);
  if (problems.count > 0) return null;
  const origin = columns.times?.origin ?? null;
  const storm: StormColumns =
    origin === null
      ? { durationsH: bars.durationsH, depthsMm: bars.depthsMm }
      : { durationsH: bars.durationsH, depthsMm: bars.depthsMm, startIso: isoAt(origin, bars.startOffsetH) };
  try {
    // The core's own check, as a last guard: the steps above should make it pass.
    validateStorm(storm);
  } catch (error) {
    const reason = isInputError(error) ? error.message : String(error);
    problems.add(problem(0, 0, 'text', '', `the storm read from the text is not valid: ${reason}`));
    return null;
  }
  return { storm, summary: successSummary(storm, bars.startOffsetH, columns, settings, format, gaps) };
}

function runRainImport(text: string, settings: RainImportSettings, format: NumberFormat): RainRun {
  const problems = problemList();
  const series = openSeries(text, settings, checkRainSettings, (s) => VALUE_KIND_WORDS[s.valueKind], problems);
  if (series === null) return fail(null, settings, problems, format);
  if (series.table.rows.length === 0) {
    problems.add(problem(0, 0, 'text', '', 'no data lines were found; paste a column of values, or times and values.'));
  }
  if (settings.valueKind === 'cumulative') checkCumulative(series, settings, problems);
  if (problems.count > 0) return fail(series, settings, problems, format);
  const done = finishRain(seriesColumns(series), settings, format, problems);
  if (done === null) return fail(series, settings, problems, format);
  return { result: { ok: true, storm: importedStorm(done.storm), summary: done.summary, problems: [] }, series };
}

/** What the columnar reader gives a dialog: the storm, its summary and the head of the table. */
export interface PlainRainRead {
  readonly storm: StormColumns;
  readonly summary: string;
  readonly header: readonly string[] | null;
  /** The first data rows as split (at most the `headRows` asked for). */
  readonly rows: readonly TextRow[];
  readonly rowCount: number;
  readonly columnCount: number;
}

/**
 * A long, plainly written record (plain-columns.ts) read into a storm
 * without a row object per line; null for any text or setting that the
 * general reader must read (and word any problem of). What it gives is what
 * runRainImport gives for the same text and settings.
 */
export function readPlainRain(
  text: string,
  settings: RainImportSettings,
  format: NumberFormat,
  headRows: number,
): PlainRainRead | null {
  if (typeof text !== 'string' || settings === null || typeof settings !== 'object') return null;
  const problems = problemList();
  checkRainSettings(settings, problems);
  if (problems.count > 0) return null;
  const read = readPlainColumns(text, settings, headRows);
  if (read === null || read.rowCount === 0) return null;
  const values = read.values;
  if (settings.valueKind === 'cumulative') {
    for (let k = 1; k < values.length; k++) if ((values[k] as number) < (values[k - 1] as number)) return null;
  }
  const first = read.firstLine;
  const done = finishRain(
    {
      values,
      times: read.times,
      rowCount: read.rowCount,
      blankLinesSkipped: 0,
      rowAt: (k) => read.headRows[k],
      lineOf: (k) => first + k,
    },
    settings,
    format,
    problems,
  );
  if (done === null || problems.count > 0) return null;
  return {
    storm: done.storm,
    summary: done.summary,
    header: read.header?.cells ?? null,
    rows: read.headRows,
    rowCount: read.rowCount,
    columnCount: read.columnCount,
  };
}

/**
 * Reads a storm from pasted text with the given settings. Never throws: any
 * bad line, cell or setting is returned as a problem, and nothing is
 * imported unless there are none.
 */
export function applyRainImport(
  text: string,
  settings: RainImportSettings,
  format: NumberFormat = DEFAULT_NUMBER_FORMAT,
): RainImportResult {
  const plain = readPlainRain(text, settings, format, 0);
  if (plain !== null) return { ok: true, storm: importedStorm(plain.storm), summary: plain.summary, problems: [] };
  return runRainImport(text, settings, format).result;
}

/** The preview for given settings: the table as split, the summary and the problems. */
export function previewRainImport(
  text: string,
  settings: RainImportSettings,
  format: NumberFormat = DEFAULT_NUMBER_FORMAT,
): RainImportPreview {
  const { result, series } = runRainImport(text, settings, format);
  return previewOf(settings, result, series);
}

/** The preview and the result of one run: what a dialog needs, reading a long text once rather than twice. */
export function readRainImport(
  text: string,
  settings: RainImportSettings,
  format: NumberFormat = DEFAULT_NUMBER_FORMAT,
): { readonly preview: RainImportPreview; readonly result: RainImportResult } {
  const { result, series } = runRainImport(text, settings, format);
  return { preview: previewOf(settings, result, series), result };
}

/** Guesses the settings and returns the preview they give. */
export function guessRainImport(text: string, hints: ImportHints = {}): RainImportPreview {
  return previewRainImport(
    text,
    guessRainSettings(typeof text === 'string' ? text : '', hints),
    hints.numberFormat ?? DEFAULT_NUMBER_FORMAT,
  );
}
