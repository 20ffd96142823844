import { dischargeAtH } from './hydrograph';

/** Seconds per hour: times are in h, discharge in m³/s, volumes in m³. */
const S_PER_H = 3600;

/**
 * ∫ max(0, d) dt over one step of length `dtH` where d varies linearly from
 * `d0` to `d1`: the trapezoid when both ends are ≥ 0, nothing when both are
 * ≤ 0, and otherwise the triangle up to the crossing, which lies a fraction
 * p / (p + m) of the step from the positive end (p the positive end's value,
 * m the negative end's magnitude), so its area is p² / (p + m) · dt / 2.
 * Units: d in m³/s, dt in h, result in m³/s·h.
 */
export function positivePartStep(d0: number, d1: number, dtH: number): number {
  if (d0 >= 0 && d1 >= 0) return 0.5 * (d0 + d1) * dtH;
  if (d0 <= 0 && d1 <= 0) return 0;
  const p = d0 > 0 ? d0 : d1;
  const m = d0 > 0 ? -d1 : -d0;
  return ((p * p) / (p + m)) * 0.5 * dtH;
}

/** ∫ Q dt over the whole record by the trapezoidal rule, m³. */
export function recordVolumeM3(timesH: ArrayLike<number>, dischargeM3s: ArrayLike<number>): number {
  let sum = 0;
  for (let k = 1; k < timesH.length; k++) {
    const dt = (timesH[k] as number) - (timesH[k - 1] as number);
    sum += 0.5 * ((dischargeM3s[k] as number) + (dischargeM3s[k - 1] as number)) * dt;
  }
  return sum * S_PER_H;
}

/**
 * ∫ max(0, Q − L) dt, m³, from sample `startIndex` to `endTimeH`, where the
 * line L takes `lineM3s[k]` at each sample and `endLineM3s` at the end time
 * (which may fall inside a step). Q and L are both linear over each step, so
 * every step, the last partial one included, is integrated exactly by
 * `positivePartStep`.
 */
export function volumeAboveLineM3(
  timesH: ArrayLike<number>,
  dischargeM3s: ArrayLike<number>,
  lineM3s: ArrayLike<number>,
  startIndex: number,
  endTimeH: number,
  endLineM3s: number,
): number {
  const n = timesH.length;
  let sum = 0;
  let k = startIndex;
  let d0 = (dischargeM3s[k] as number) - (lineM3s[k] as number);
  while (k < n - 1 && (timesH[k + 1] as number) <= endTimeH) {
    const d1 = (dischargeM3s[k + 1] as number) - (lineM3s[k + 1] as number);
    sum += positivePartStep(d0, d1, (timesH[k + 1] as number) - (timesH[k] as number));
    d0 = d1;
    k++;
  }
  const tk = timesH[k] as number;
  if (endTimeH > tk) {
    const dEnd = dischargeAtH(timesH, dischargeM3s, endTimeH) - endLineM3s;
    sum += positivePartStep(d0, dEnd, endTimeH - tk);
  }
  return sum * S_PER_H;
}
