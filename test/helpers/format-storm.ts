/**
 * A small test-side formatter: writes a storm out as a person might paste it,
 * in any of the layouts the importer reads, and says which settings describe
 * what it wrote. The round-trip properties parse this text back.
 *
 * It works from the values as pasted (depths, intensities or cumulative
 * readings in the pasted unit) and bar durations in whole minutes, so the
 * expected storm is known without going through the importer's arithmetic.
 */
import type { RainImportSettings, RainUnit, RainValueKind, Separator, TimeMarks } from '../../src/io';

export type TimeFormat = 'iso' | 'iso-zone' | 'hhmm' | 'date+time' | 'elapsed-min' | 'elapsed-h' | 'none';

export interface PasteSpec {
  /** Bar durations, whole minutes. */
  readonly durMin: readonly number[];
  /** Per bar, in the pasted unit: depth (mm or in), intensity (mm/h or in/h), or the cumulative increment. */
  readonly values: readonly number[];
  readonly valueKind: RainValueKind;
  readonly unit: RainUnit;
  readonly separator: Separator;
  readonly decimal: 'point' | 'comma';
  readonly timeFormat: TimeFormat;
  readonly timeMarks: TimeMarks;
  /** Cumulative only: whether the text starts with a base reading (counted from the first value) or counts from zero. */
  readonly cumulativeFrom: 'zero' | 'first-value';
  /** Cumulative only: the base reading's level. */
  readonly baseLevel: number;
  /** Storm start, minutes after 2000-01-01T00:00 (wall clock). */
  readonly startMin: number;
  /** Elapsed times: the number written at the storm start. */
  readonly elapsedOrigin: number;
  readonly zone: 'Z' | '+05:30' | '-03:00';
  readonly dateTimeJoin: 'T' | ' ';
  readonly dateOrder: 'day-month' | 'month-day';
  readonly header: boolean;
  /** A leading bar-number column, so the time and value are not in columns 1 and 2. */
  readonly indexColumn: boolean;
  readonly crlf: boolean;
  readonly trailingNewline: boolean;
  /** Column names for the header, when the defaults ("Time", "Rain") will not do. */
  readonly names?: { readonly time?: string; readonly value?: string };
}

export interface Paste {
  readonly text: string;
  readonly settings: RainImportSettings;
  /** The storm the text stands for: durations h, depths mm. */
  readonly durationsH: number[];
  readonly depthsMm: number[];
  readonly startIso: string | undefined;
}

const SEPARATOR_CHAR: Record<Separator, string> = {
  tab: '\t',
  comma: ',',
  semicolon: ';',
  space: ' ',
  fixed: ' ',
  none: '',
};
const MM_PER_UNIT = { mm: 1, in: 25.4 } as const;
const EPOCH_2000 = Date.UTC(2000, 0, 1);

const pad = (n: number, w = 2): string => String(n).padStart(w, '0');

function wall(min: number): Date {
  return new Date(EPOCH_2000 + min * 60_000);
}

function isoMinutes(min: number, join: string): string {
  const d = wall(min);
  return `${d.getUTCFullYear()}-${pad(d.getUTCMonth() + 1)}-${pad(d.getUTCDate())}${join}${pad(d.getUTCHours())}:${pad(d.getUTCMinutes())}`;
}

function hhmm(min: number): string {
  const d = wall(min);
  return `${pad(d.getUTCHours())}:${pad(d.getUTCMinutes())}`;
}

function slashedDate(min: number, order: 'day-month' | 'month-day'): string {
  const d = wall(min);
  const day = pad(d.getUTCDate());
  const month = pad(d.getUTCMonth() + 1);
  return `${order === 'day-month' ? day : month}/${order === 'day-month' ? month : day}/${d.getUTCFullYear()}`;
}

function isoDate(min: number): string {
  return isoMinutes(min, 'T').slice(0, 10);
}

/** Writes a number with the decimal mark; quoted when a decimal comma would clash with comma separators. */
function num(value: number, spec: PasteSpec): string {
  const text = spec.decimal === 'comma' ? String(value).replace('.', ',') : String(value);
  return spec.decimal === 'comma' && spec.separator === 'comma' && text.includes(',') ? `"${text}"` : text;
}

/**
 * The durations the text can carry. With stamps at bar ends the first bar's
 * length is not in the text (it takes the first gap), and with stamps at bar
 * starts the last bar's is not (it takes the last gap); the formatter makes
 * those bars match their neighbours, as a regular record does.
 */
export function representableDurations(spec: PasteSpec): number[] {
  const d = spec.durMin.slice();
  const n = d.length;
  if (spec.timeFormat === 'none') return d.map(() => d[0] as number);
  const cumulative = spec.valueKind === 'cumulative';
  if (n >= 2) {
    if (cumulative ? spec.cumulativeFrom === 'zero' : spec.timeMarks === 'end') d[0] = d[1] as number;
    else if (!cumulative) d[n - 1] = d[n - 2] as number;
  }
  return d;
}

export function formatPaste(spec: PasteSpec): Paste {
  const durMin = representableDurations(spec);
  const n = durMin.length;
  const edges = [0];
  for (const d of durMin) edges.push((edges[edges.length - 1] as number) + d);
  const hasTimes = spec.timeFormat !== 'none';
  const cumulative = spec.valueKind === 'cumulative';
  const sep = SEPARATOR_CHAR[spec.separator];

  // Rows as (minutes after the storm start, value written).
  const rows: { atMin: number; value: number }[] = [];
  if (cumulative) {
    let level = spec.cumulativeFrom === 'first-value' ? spec.baseLevel : 0;
    if (spec.cumulativeFrom === 'first-value') rows.push({ atMin: 0, value: level });
    for (let k = 0; k < n; k++) {
      level += spec.values[k] as number;
      rows.push({ atMin: edges[k + 1] as number, value: level });
    }
  } else {
    for (let k = 0; k < n; k++) {
      rows.push({
        atMin: (spec.timeMarks === 'end' ? edges[k + 1] : edges[k]) as number,
        value: spec.values[k] as number,
      });
    }
  }

  const timeCells = (atMin: number): string[] => {
    const m = spec.startMin + atMin;
    switch (spec.timeFormat) {
      case 'iso':
        return [isoMinutes(m, spec.dateTimeJoin)];
      case 'iso-zone':
        return [`${isoMinutes(m, 'T')}${spec.zone}`];
      case 'hhmm':
        return [hhmm(m)];
      case 'date+time':
        return [slashedDate(m, spec.dateOrder), hhmm(m)];
      case 'elapsed-min':
        return [num(spec.elapsedOrigin + atMin, spec)];
      case 'elapsed-h':
        return [num((spec.elapsedOrigin + atMin) / 60, spec)];
      case 'none':
        return [];
    }
  };

  const lines: string[] = [];
  const timeWidth = spec.timeFormat === 'date+time' ? 2 : hasTimes ? 1 : 0;
  if (spec.header) {
    const timeName = spec.names?.time ?? 'Time';
    const timeNames = timeWidth === 2 ? ['Date', timeName] : timeWidth === 1 ? [timeName] : [];
    const names = [...(spec.indexColumn ? ['Bar'] : []), ...timeNames, spec.names?.value ?? 'Rain'];
    lines.push(names.join(sep));
  }
  rows.forEach((row, k) => {
    lines.push([...(spec.indexColumn ? [String(k + 1)] : []), ...timeCells(row.atMin), num(row.value, spec)].join(sep));
  });
  const eol = spec.crlf ? '\r\n' : '\n';
  const text = lines.join(eol) + (spec.trailingNewline ? eol : '');

  const first = spec.indexColumn ? 2 : 1;
  const timeKind =
    spec.timeFormat === 'elapsed-min'
      ? 'elapsed-min'
      : spec.timeFormat === 'elapsed-h'
        ? 'elapsed-h'
        : hasTimes
          ? 'clock'
          : 'none';
  const firstStampMin = (rows[0] as { atMin: number }).atMin;
  const settings: RainImportSettings = {
    separator: spec.separator,
    decimal: spec.decimal,
    skipLines: 0,
    hasHeader: spec.header,
    dateColumn: timeWidth === 2 ? first : null,
    timeColumn: timeWidth === 2 ? first + 1 : timeWidth === 1 ? first : null,
    valueColumn: first + timeWidth,
    timeKind,
    dateOrder: spec.dateOrder,
    dateForTimesOfDay: spec.timeFormat === 'hhmm' ? isoDate(spec.startMin + firstStampMin) : null,
    // Used without times, and for a lone stamp: the one bar's length.
    stepMinutesIfNoTime: durMin[0] as number,
    valueKind: spec.valueKind,
    // The text was written from bars: a long step is a long bar, not a gap in a gauge record.
    gaps: 'keep',
    unit: spec.unit,
    timeMarks: spec.timeMarks,
    cumulativeFrom: spec.cumulativeFrom,
  };

  const mm = MM_PER_UNIT[spec.unit];
  const durationsH = durMin.map((d) => d / 60);
  const depthsMm = spec.values.map((v, k) =>
    spec.valueKind === 'intensity' ? v * mm * (durationsH[k] as number) : v * mm,
  );
  const onCalendar =
    spec.timeFormat === 'iso' ||
    spec.timeFormat === 'iso-zone' ||
    spec.timeFormat === 'hhmm' ||
    spec.timeFormat === 'date+time';
  const zone = spec.timeFormat === 'iso-zone' ? spec.zone : '';
  const startIso = onCalendar ? `${isoMinutes(spec.startMin, 'T')}:00${zone}` : undefined;
  return { text, settings, durationsH, depthsMm, startIso };
}
