import { formatCount } from '../format';

/** Steps between elapsed-time ticks, minutes: round numbers on a clock face, then whole hours and days. */
const STEPS_MIN = [1, 2, 5, 10, 15, 20, 30, 60, 120, 180, 240, 360, 720, 1440, 2880, 4320, 10080];

/** "1:30", "−0:20", "26:00": elapsed time in hours and minutes (the hours run on past a day). */
export function formatElapsed(hours: number): string {
  const totalMin = Math.round(Math.abs(hours) * 60);
  const h = Math.floor(totalMin / 60);
  const m = totalMin - h * 60;
  return `${hours < 0 && totalMin > 0 ? '−' : ''}${formatCount(h)}:${String(m).padStart(2, '0')}`;
}

/**
 * Where the ticks of an elapsed-time axis go, hours from the storm start, over [fromH, toH]: at most `count`
 * of them, a round number of minutes apart, and — when the bars are all `barStepH` long — on bar edges, so
 * a tick sits under the start of a bar (a 10-min storm gets ticks every 30 or 60 min, never every 25).
 */
export function elapsedTicksH(fromH: number, toH: number, count: number, barStepH: number | null): number[] {
  const spanMin = (toH - fromH) * 60;
  if (!(spanMin > 0) || !Number.isFinite(spanMin)) return [fromH];
  const barMin = barStepH !== null && barStepH > 0 ? barStepH * 60 : null;
  const fits = (step: number): boolean => spanMin / step <= Math.max(1, count);
  // A step on the bar grid: a multiple of the bar's minutes (to a thousandth of a minute).
  const onBars = (step: number): boolean =>
    barMin === null || Math.abs(step / barMin - Math.round(step / barMin)) < 1e-6;
  // A round step on the bar grid; else whole bars (7-min bars: every 14 min); else a round step; else weeks.
  const perTick = spanMin / Math.max(1, count);
  // Whole bars only while they leave at least two intervals (a storm of one long bar gets round steps).
  const wholeBars = barMin !== null ? barMin * Math.ceil(perTick / barMin - 1e-9) : undefined;
  const step =
    STEPS_MIN.find((s) => fits(s) && onBars(s) && spanMin / s >= 2) ??
    (wholeBars !== undefined && spanMin / wholeBars >= 2 ? wholeBars : undefined) ??
    STEPS_MIN.find(fits) ??
    Math.ceil(perTick / 10080) * 10080;
  const ticks: number[] = [];
  const first = Math.ceil((fromH * 60) / step - 1e-9);
  for (let k = first; k * step <= toH * 60 + 1e-9; k++) ticks.push((k * step) / 60);
  return ticks;
}
