import type { UnitSystem } from '../../../core';
import { clamp, fineStep, type InvertibleScale } from '../../chart/drag-math';
import { fromDisplay, toDisplay } from '../../units';

/**
 * Pixel arithmetic for drawing bars with the pointer. Pure: the drawing layer
 * passes in the chart's bar edges and y scale (rate, mm/h → px), so this is
 * tested without a DOM.
 */

/** The bar under x (px): the last bar whose left edge is at or left of x, clamped to the storm. */
export function barAt(edgesPx: ArrayLike<number>, x: number): number {
  const n = edgesPx.length - 1;
  if (n <= 0) return -1;
  let lo = 0;
  let hi = n - 1;
  while (lo < hi) {
    const mid = (lo + hi + 1) >> 1;
    if ((edgesPx[mid] as number) <= x) lo = mid;
    else hi = mid - 1;
  }
  return lo;
}

/** A point of a stroke: x in px, the rate drawn there in mm/h. */
export interface StrokePoint {
  readonly x: number;
  readonly rateMmH: number;
}

/**
 * Paints every bar a stroke segment passes over, so a fast sweep that skips
 * pixels between two pointer events leaves no bar behind. Each bar takes the
 * segment's rate at the bar's centre (held at the segment's ends), a straight
 * line between the two pointer positions. Calls `paint(k, rateMmH)` for each
 * bar from left to right.
 */
export function paintSegment(
  edgesPx: ArrayLike<number>,
  from: StrokePoint,
  to: StrokePoint,
  paint: (k: number, rateMmH: number) => void,
): void {
  const n = edgesPx.length - 1;
  if (n <= 0) return;
  const left = Math.min(from.x, to.x);
  const right = Math.max(from.x, to.x);
  const first = barAt(edgesPx, left);
  const last = barAt(edgesPx, right);
  const span = to.x - from.x;
  for (let k = first; k <= last; k++) {
    const centre = clamp(((edgesPx[k] as number) + (edgesPx[k + 1] as number)) / 2, left, right);
    const t = span === 0 ? 1 : (centre - from.x) / span;
    paint(k, from.rateMmH + t * (to.rateMmH - from.rateMmH));
  }
}

/**
 * The rate under a pointer at y (px), never below zero and at most `maxMmH`,
 * put on a round grid in the units on screen: a power of ten near a
 * hundredth of the axis (0.1 mm/h on a 0–60 mm/h axis, 0.01 in/h on a
 * 0–2.5 in/h one), so drawn bars read as the values a person would type.
 */
export function rateAtPointer(
  y: InvertibleScale,
  pointerY: number,
  maxMmH: number,
  topDisplay: number,
  system: UnitSystem,
): number {
  const raw = clamp(y.invert(pointerY), 0, maxMmH);
  const step = fineStep(topDisplay);
  const display = Number((Math.round(toDisplay('rate', raw, system) / step) * step).toPrecision(12));
  return clamp(fromDisplay('rate', display, system), 0, maxMmH);
}
