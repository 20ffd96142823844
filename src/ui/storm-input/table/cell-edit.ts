import { MAX_RECORD_H, MAX_RECORD_YEARS, barEdgesH, isBarDurationH, type Storm, type UnitSystem } from '../../../core';
import { withBarStartH } from '../../../core/storm-tools';
import { parseNumber } from '../../parse-number';
import { displayUnit, fromDisplay, unitText } from '../../units';
import { barTimeText, readBarTime, shiftStartIso, type BarClock } from '../bar-times';

/** The editable columns of the bar table. */
export type EditableColumn = 'start' | 'duration' | 'depth';

/** What a typed cell asks for, checked before anything reaches the store; or why it cannot be applied. */
export type CellEdit =
  | { readonly ok: true; readonly kind: 'depth'; readonly depthMm: number }
  | { readonly ok: true; readonly kind: 'duration'; readonly durationH: number }
  | { readonly ok: true; readonly kind: 'storm'; readonly storm: Storm; readonly label: string }
  | { readonly ok: true; readonly kind: 'start'; readonly startIso: string }
  | { readonly ok: true; readonly kind: 'none' }
  | { readonly ok: false; readonly message: string };

const MAX_RECORD_MIN_TEXT = (MAX_RECORD_H * 60).toLocaleString('en-US');

const NAMES: Record<EditableColumn, string> = { start: 'start', duration: 'duration', depth: 'depth' };

/** "Bar 3 depth: “abc” is not a number." */
function bad(k: number, column: EditableColumn, message: string): CellEdit {
  return { ok: false, message: `Bar ${k + 1} ${NAMES[column]}: ${message}` };
}

/** A number message from parse-number starts with a capital or a quote; keep it, just end it well. */
function numberMessage(message: string): string {
  return message.endsWith('.') ? message : `${message}.`;
}

/**
 * Reads the text typed into bar k's cell. Durations are typed in minutes,
 * depths in the screen's depth unit, starts as the table writes them.
 */
export function readCell(
  storm: Storm,
  k: number,
  column: EditableColumn,
  text: string,
  system: UnitSystem,
  clock: BarClock,
): CellEdit {
  if (column === 'depth') {
    const parsed = parseNumber(text);
    if (!parsed.ok) return bad(k, column, numberMessage(parsed.message));
    if (parsed.value < 0) {
      return bad(
        k,
        column,
        `rainfall depth cannot be negative (got ${text.trim()} ${unitText(displayUnit('depth', system))}).`,
      );
    }
    return { ok: true, kind: 'depth', depthMm: fromDisplay('depth', parsed.value, system) };
  }
  if (column === 'duration') {
    const parsed = parseNumber(text);
    if (!parsed.ok) return bad(k, column, numberMessage(parsed.message));
    if (!(parsed.value > 0)) return bad(k, column, `a bar must last more than 0 min (got ${text.trim()} min).`);
    // The core's limits of time (core/time-limits.ts), said in the minutes that were typed.
    if (!isBarDurationH(parsed.value / 60)) {
      return bad(
        k,
        column,
        `a bar lasts from 1 second (0.0167 min) to ${MAX_RECORD_YEARS} years (${MAX_RECORD_MIN_TEXT} min); got ${text.trim()} min.`,
      );
    }
    return { ok: true, kind: 'duration', durationH: parsed.value / 60 };
  }
  const edges = barEdgesH(storm);
  const nowH = edges[k] as number;
  const read = readBarTime(clock, text, nowH);
  if (!read.ok) return bad(k, column, read.message);
  const startH = read.hours;
  // Equal to the present start to a millisecond: nothing to change.
  if (Math.abs(startH - nowH) * 3_600_000 < 0.5) return { ok: true, kind: 'none' };
  if (k === 0) {
    if (clock.startMs === null || storm.startIso === undefined) {
      return bad(
        k,
        column,
        'the first bar starts the storm, at 0:00. To put the storm on a clock, set its start in Storm tools.',
      );
    }
    const iso = shiftStartIso(storm.startIso, startH);
    if (iso === null) return bad(k, column, `the storm start "${storm.startIso}" cannot be read.`);
    return { ok: true, kind: 'start', startIso: iso };
  }
  const lo = edges[k - 1] as number;
  const hi = edges[k + 1] as number;
  if (!(startH > lo) || !(startH < hi)) {
    return bad(
      k,
      column,
      `must fall after bar ${k} starts (${barTimeText(clock, lo)}) and before bar ${k + 1} ends (${barTimeText(clock, hi)}); ` +
        'change durations to move the later bars.',
    );
  }
  return { ok: true, kind: 'storm', storm: withBarStartH(storm, k, startH), label: `Set bar ${k + 1} start time` };
}
