import { InputError } from '../errors';
import { monotoneCubic } from './pchip';
import { responseArray } from './tail';
import type { UnitHydrographTransform } from './types';

/** Seconds per hour and m³ per mm over one m²: ordinates are m³/s per mm over the catchment. */
const S_PER_H = 3600;
const M3_PER_MM_M2 = 1e-3;

/** The given ordinates as a function of time: linear between them, zero outside. */
function ordinateAt(u: ArrayLike<number>, stepH: number, tH: number): number {
  const last = u.length - 1;
  if (tH < 0) return 0;
  const x = tH / stepH;
  if (x >= last) return x === last ? (u[last] as number) : 0;
  const i = Math.floor(x);
  const f = x - i;
  const u0 = u[i] as number;
  return f === 0 ? u0 : u0 + ((u[i + 1] as number) - u0) * f;
}

/**
 * Converts a unit hydrograph of duration D to one of duration Δ (the output
 * step) by the S-curve method (Chow, Maidment & Mays 1988, Applied Hydrology,
 * §7.6, from memory): the S-curve S(t) = Σₖ U_D(t − k·D) is the response to
 * excess falling on and on at 1 mm per D hours, and the Δ-hour unit
 * hydrograph is U_Δ(t) = (D/Δ)·(S(t) − S(t − Δ)). Sampled at the instants
 * j·Δ from the start of the excess; unnormalised weights S(jΔ) − S((j−1)Δ).
 *
 * The S-curve is summed at the given ordinates' times (exact there when D is
 * a whole number of ordinate steps) and read between them on a monotone cubic
 * through those values (Fritsch & Carlson 1980): straight lines between them
 * would make the S-curve a broken line and the finer unit hydrograph a
 * staircase.
 *
 * The S-curve of a unit hydrograph whose base is T reaches its plateau at
 * T − D; a hydrograph read off a chart or rounded rarely sums to a flat
 * plateau, and the summed curve then wobbles ("hunts") for ever. It is held at
 * its value at T − D instead, so the Δ-hour hydrograph ends at T − D + Δ, and
 * any small negative ordinates of the wobble are set to zero. The caller
 * rescales the result to 1 mm; `unitHydrographVolumeMm` says how far the
 * given ordinates were from it.
 */
export function unitHydrographWeights(uh: UnitHydrographTransform, stepH: number): Float64Array {
  const u = uh.ordinatesM3sPerMm;
  const s = uh.stepH;
  const d = uh.durationH;
  const spanH = (u.length - 1) * s;
  const holdH = spanH - d; // > 0, checked by validateTransform
  const summed = (t: number): number => {
    // Only the lagged copies that have begun and not yet ended add.
    const kFirst = Math.max(0, Math.floor((t - spanH) / d));
    const kLast = Math.floor(t / d);
    let sum = 0;
    for (let k = kFirst; k <= kLast; k++) sum += ordinateAt(u, s, t - k * d);
    return sum;
  };
  const knotsH: number[] = [];
  for (let i = 0; i * s < holdH - 1e-9 * s; i++) knotsH.push(i * s);
  knotsH.push(holdH);
  const between = monotoneCubic(knotsH, knotsH.map(summed));
  const held = summed(holdH);
  if (!(held > 0)) {
    throw new InputError(
      'ordinatesM3sPerMm',
      `The unit hydrograph gives no runoff in its first ${holdH} h (its span less its duration), where its ` +
        'S-curve must rise; check the duration and the ordinates.',
    );
  }
  const sCurve = (tH: number): number => (tH < 0 ? 0 : tH >= holdH ? held : between(tH));
  const count = Math.ceil(holdH / stepH) + 1;
  const w = responseArray(count, stepH, holdH + stepH);
  let before = 0;
  for (let j = 0; j < count; j++) {
    const now = sCurve(j * stepH);
    const diff = now - before;
    w[j] = diff > 0 ? diff : 0;
    before = now;
  }
  return w;
}

/**
 * The depth the ordinates hold over the area, mm (trapezoidal rule, the same
 * straight lines as `ordinateAt`). Clean input; see `unitHydrographVolumeMm`.
 */
export function unitHydrographDepthMm(uh: UnitHydrographTransform, areaM2: number): number {
  const u = uh.ordinatesM3sPerMm;
  let sum = 0;
  for (let i = 1; i < u.length; i++) sum += (u[i - 1] as number) + (u[i] as number);
  const volumeM3 = 0.5 * sum * uh.stepH * S_PER_H;
  return volumeM3 / (areaM2 * M3_PER_MM_M2);
}
