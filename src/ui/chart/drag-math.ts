/**
 * Pixel ↔ value arithmetic for dragging and stepping the loss-rate line.
 * Pure: the chart passes its y scale in, so this is tested without a DOM.
 */
export interface InvertibleScale {
  (value: number): number;
  invert(px: number): number;
}

export const clamp = (v: number, min: number, max: number): number => (v < min ? min : v > max ? max : v);

/**
 * Where inside the line the pointer took hold, in pixels. Each move is
 * recomputed from this grab offset and the pointer, so the line does not jump
 * by the few pixels between the press and the line's centre.
 */
export function grabOffsetPx(scale: InvertibleScale, pointerPx: number, value: number): number {
  return pointerPx - scale(value);
}

/** The value under the pointer (less the grab offset), clamped to [min, max]. */
export function valueAtPointer(
  scale: InvertibleScale,
  pointerPx: number,
  grabPx: number,
  min: number,
  max: number,
): number {
  return clamp(scale.invert(pointerPx - grabPx), min, max);
}

/** A fine keyboard step for a line whose axis runs to `top`: a power of ten near top/100. */
export function fineStep(top: number): number {
  if (!(top > 0) || !Number.isFinite(top)) return 1;
  return 10 ** Math.floor(Math.log10(top / 100));
}

/** `value` on the grid of `step` (the arrow keys' step), without binary residue (no 6.000000000000001). */
export function snapToStep(value: number, step: number): number {
  if (!(step > 0) || !Number.isFinite(value)) return value;
  return Number((Math.round(value / step) * step).toPrecision(12));
}

export interface KeySteps {
  readonly step: number;
  /** Page Up / Page Down step. */
  readonly coarse: number;
  readonly min: number;
  readonly max: number;
}

/**
 * The value after a key press on the slider, or null when the key is not one
 * the slider uses. Arrows: one step; Page Up/Down: one coarse step; Home/End:
 * the ends. Stepped values land on the step grid (no 0.30000000000000004).
 */
export function valueAfterKey(key: string, value: number, steps: KeySteps): number | null {
  const { step, coarse, min, max } = steps;
  const onGrid = (v: number, s: number): number => Number((Math.round(v / s) * s).toPrecision(12));
  switch (key) {
    case 'ArrowUp':
    case 'ArrowRight':
      return clamp(onGrid(value + step, step), min, max);
    case 'ArrowDown':
    case 'ArrowLeft':
      return clamp(onGrid(value - step, step), min, max);
    case 'PageUp':
      return clamp(onGrid(value + coarse, step), min, max);
    case 'PageDown':
      return clamp(onGrid(value - coarse, step), min, max);
    case 'Home':
      return min;
    case 'End':
      return max;
    default:
      return null;
  }
}
