import { dischargeAtH, findPeakIndex, findStartOfRise } from '../../core';
import { clamp, type InvertibleScale } from '../chart/drag-math';

/**
 * Pixel ↔ time arithmetic for the end-point handle of the straight-line
 * separation. Pure: the chart passes its time scale in. Times here are
 * hours after the record's first sample (the frame of the method's
 * `endTimeH`); the chart's axis is storm time = record time + offsetH.
 */
export interface EndBounds {
  /** Earliest end: the peak, where the recession begins (or the first sample after the start of rise). */
  readonly minH: number;
  /** Latest end: the last sample. */
  readonly maxH: number;
}

/**
 * Where the end point may go: on the recession, from the peak to the last
 * sample. A peak at the start of rise (a record that begins on the peak)
 * leaves the next sample as the earliest end, since the core needs the end
 * later than the start of rise.
 */
function endPointBounds(timesH: ArrayLike<number>, riseIndex: number, peakIndex: number): EndBounds {
  const n = timesH.length;
  const maxH = timesH[n - 1] as number;
  const from = peakIndex > riseIndex ? peakIndex : Math.min(riseIndex + 1, n - 1);
  return { minH: Math.min(timesH[from] as number, maxH), maxH };
}

/**
 * The end time under the pointer (less the grab offset), on whole minutes
 * (a pixel is minutes wide on any record worth dragging over, and gauge
 * times are whole minutes), clamped to the bounds.
 */
export function endTimeAtPointer(
  x: InvertibleScale,
  pointerPx: number,
  grabPx: number,
  offsetH: number,
  bounds: EndBounds,
): number {
  const tH = x.invert(pointerPx - grabPx) - offsetH;
  return clamp(Math.round(tH * 60) / 60, bounds.minH, bounds.maxH);
}

/** Where inside the handle the pointer took hold, px, so the handle does not jump on press. */
export function endGrabOffsetPx(x: InvertibleScale, pointerPx: number, endTimeH: number, offsetH: number): number {
  return pointerPx - x(endTimeH + offsetH);
}

/**
 * Keyboard steps for the handle, h: a power of ten near a twentieth of the
 * recession (0.1 h = 6 min over a few hours, 1 h over a few days), and ten
 * of them for Page Up / Page Down.
 */
export function endPointSteps(bounds: EndBounds): { readonly step: number; readonly coarse: number } {
  const range = bounds.maxH - bounds.minH;
  const step = range > 0 && Number.isFinite(range) ? 10 ** Math.floor(Math.log10(range / 20)) : 1;
  return { step, coarse: step * 10 };
}

/** Where the handle stands and how far it may go, for a record and its straight-line separation. */
export interface HandlePlacement {
  readonly endTimeH: number;
  readonly endM3s: number;
  readonly bounds: EndBounds;
  /** The end is N = A^0.2 days after the peak, not set by hand. */
  readonly automatic: boolean;
}

/**
 * The handle's place from the core's separation when there is one, else (the
 * core refused: no area for N = A^0.2, or N past the record) from the method:
 * its end time, or the last sample, so there is always a handle to drag to a
 * good place. Peak and start of rise come from the core either way.
 */
export function placeEndHandle(
  record: { readonly timesH: readonly number[]; readonly dischargeM3s: readonly number[] },
  method: { readonly riseIndex?: number | undefined; readonly endTimeH?: number | undefined },
  separated: { readonly peakIndex: number; readonly riseIndex: number; readonly endTimeH: number } | null,
): HandlePlacement {
  const { timesH, dischargeM3s } = record;
  const n = timesH.length;
  const peakIndex = separated?.peakIndex ?? findPeakIndex(dischargeM3s);
  const riseIndex =
    separated?.riseIndex ??
    (method.riseIndex !== undefined && method.riseIndex <= n - 1
      ? method.riseIndex
      : findStartOfRise(dischargeM3s, peakIndex));
  const wide = endPointBounds(timesH, riseIndex, peakIndex);
  const wanted = separated?.endTimeH ?? method.endTimeH ?? wide.maxH;
  const riseH = timesH[riseIndex] as number;
  // An end typed in before the peak (the core allows any end after the start of rise) widens the range to it.
  const minH = wanted > riseH && wanted < wide.minH ? wanted : wide.minH;
  const endTimeH = clamp(wanted, minH, wide.maxH);
  return {
    endTimeH,
    endM3s: dischargeAtH(timesH, dischargeM3s, endTimeH),
    bounds: { minH, maxH: wide.maxH },
    automatic: method.endTimeH === undefined,
  };
}
