import type { SetEvent } from '../../src/scenario/types';
import fc from 'fast-check';
import type { Hydrograph } from '../../src/core/baseflow/types';

/**
 * A triangular direct-runoff hydrograph on top of a baseflow line: baseflow
 * `base(t)`, plus a triangle rising from 0 at `t0` to `peak` at `t1` and back to
 * 0 at `t2`. Sampled at `timesH`, which must include t0, t1 and t2 so the
 * samples trace the shape exactly.
 */
export function triangleOver(
  timesH: readonly number[],
  t0: number,
  t1: number,
  t2: number,
  peak: number,
  base: (t: number) => number,
): Hydrograph {
  const q = timesH.map((t) => {
    let tri = 0;
    if (t > t0 && t <= t1) tri = (peak * (t - t0)) / (t1 - t0);
    else if (t > t1 && t < t2) tri = (peak * (t2 - t)) / (t2 - t1);
    return base(t) + tri;
  });
  return { timesH: Float64Array.from(timesH), dischargeM3s: Float64Array.from(q) };
}

/**
 * Random valid hydrographs: 2 to `maxLength` samples, irregular steps from
 * 0.01 h to 24 h, discharge from 0 (often exactly) to 10⁴ m³/s.
 */
export function hydrographs(maxLength = 60): fc.Arbitrary<Hydrograph> {
  return fc.integer({ min: 2, max: maxLength }).chain((n) =>
    fc
      .record({
        steps: fc.array(fc.double({ min: 0.01, max: 24, noNaN: true }), { minLength: n - 1, maxLength: n - 1 }),
        start: fc.double({ min: -100, max: 100, noNaN: true }),
        q: fc.array(fc.oneof(fc.constant(0), fc.double({ min: 0, max: 1e4, noNaN: true })), {
          minLength: n,
          maxLength: n,
        }),
      })
      .map(({ steps, start, q }) => {
        const timesH = new Float64Array(n);
        timesH[0] = start;
        for (let k = 1; k < n; k++) timesH[k] = (timesH[k - 1] as number) + (steps[k - 1] as number);
        return { timesH, dischargeM3s: Float64Array.from(q, Math.abs) };
      }),
  );
}

/**
 * ∫ max(0, Q − L) dt, m³, from sample `startIndex` to `endTimeH`, by a
 * midpoint sum with `slices` slices per step: an independent check of the
 * exact per-step integration. Only a slice holding a crossing is in error,
 * by at most |slope|·h² against a step integral ∫|Q − L| of at least
 * |slope|·L²/4, so the error is within 4/slices² of ∫|Q − L| dt; `toleranceM3`
 * is that bound with a margin, plus rounding on the scale of ∫(Q + |L|) dt
 * (Q − L cancels when the line lies on the flow).
 */
export function fineVolumeAbove(
  timesH: ArrayLike<number>,
  q: ArrayLike<number>,
  startIndex: number,
  endTimeH: number,
  line: (t: number) => number,
  slices = 400,
): { aboveM3: number; toleranceM3: number } {
  let above = 0;
  let abs = 0;
  let magnitude = 0;
  for (let k = startIndex; k < timesH.length - 1; k++) {
    const t0 = timesH[k] as number;
    const t1 = Math.min(timesH[k + 1] as number, endTimeH);
    if (t1 <= t0) break;
    const q0 = q[k] as number;
    const slope = ((q[k + 1] as number) - q0) / ((timesH[k + 1] as number) - t0);
    const h = (t1 - t0) / slices;
    for (let i = 0; i < slices; i++) {
      const t = t0 + (i + 0.5) * h;
      const d = q0 + slope * (t - t0) - line(t);
      if (d > 0) above += d * h;
      abs += Math.abs(d) * h;
      magnitude += (Math.abs(d) + 2 * Math.abs(line(t))) * h;
    }
  }
  return { aboveM3: above * 3600, toleranceM3: ((8 / (slices * slices)) * abs + 1e-12 * magnitude) * 3600 + 1e-9 };
}

/**
 * The record of a linear reservoir (a Nash cascade of one, storage constant
 * k) at whole hours, for `excessMm` falling evenly over the hour from
 * `wetHourStartH` on `areaM2`: zero until then, at the end of the hour
 * Q = (V/1 h)·(1 − e^(−1/k)), then Q·e^(−(t − end)/k) (Chow, Maidment & Mays
 * 1988, §7.5, the linear reservoir; written from the formula, not from the
 * core).
 */
export function linearReservoirRecord(
  wetHourStartH: number,
  excessMm: number,
  kH: number,
  hours: number,
  areaM2: number,
): { timesH: number[]; directM3s: number[] } {
  const timesH: number[] = [];
  const directM3s: number[] = [];
  const peak = ((excessMm * areaM2 * 1e-3) / 3600) * (1 - Math.exp(-1 / kH));
  for (let t = 0; t <= hours; t++) {
    timesH.push(t);
    const after = t - (wetHourStartH + 1);
    directM3s.push(t <= wetHourStartH ? 0 : peak * Math.exp(-after / kH));
  }
  return { timesH, directM3s };
}

/**
 * An invented event of hourly bars (`depthsMm`) with `observedMm` of runoff
 * observed and its own streamflow record: the linear reservoir's (k = `kH`)
 * response to that depth of excess from `startH`, over 24 h, on no baseflow
 * (constant baseflow separation finds none).
 */
export function eventWithReservoirRecord(
  id: string,
  name: string,
  depthsMm: number[],
  observedMm: number,
  startH: number,
  kH: number,
  areaM2: number,
): SetEvent {
  const { timesH, directM3s } = linearReservoirRecord(startH, observedMm, kH, 24, areaM2);
  return {
    id,
    name,
    storm: { durationsH: depthsMm.map(() => 1), depthsMm },
    observed: { as: 'depth', value: observedMm },
    streamflow: {
      timesH,
      dischargeM3s: directM3s,
      offsetH: 0,
      baseflow: { kind: 'constant' },
      baseflowMemory: {},
      useAsObserved: false,
    },
  };
}
