import fc from 'fast-check';
import { METHODS, validateMethod, type LossMethod, type Storm } from '../../src/core';
import { MAX_RECORD_H, SHORTEST_STEP_ACCEPTED_H } from '../../src/core/time-limits';

/**
 * Random storms of 1 to `maxBars` bars (hundreds by default) with unequal bar
 * durations (1 min to 3 h), dry bars, spikes and tiny depths, as gauge data
 * has. The size is explicit: fast-check's default size keeps arrays near a
 * dozen elements whatever their maxLength (arbitraries.test.ts checks the reach).
 */
export function stormArb(maxBars = 300): fc.Arbitrary<{ durationsH: number[]; depthsMm: number[] }> {
  const bar = fc.record({
    durationH: fc.double({ min: 1 / 60, max: 3, noNaN: true }),
    depthMm: fc.oneof(
      fc.constant(0),
      // Gauges resolve 0.01–0.2 mm; 1e-6 mm keeps tiny depths without
      // subnormal floats, which no rainfall record holds.
      fc.double({ min: 1e-6, max: 1, noNaN: true }),
      fc.double({ min: 1e-6, max: 80, noNaN: true }),
    ),
  });
  return fc.array(bar, { minLength: 1, maxLength: maxBars, size: 'max' }).map((bars) => ({
    durationsH: bars.map((b) => b.durationH),
    depthsMm: bars.map((b) => b.depthMm),
  }));
}

/** The largest double, 1.7976931348623157e308: the largest depth the core accepts. */
const LARGEST = Number.MAX_VALUE;

/**
 * Random storms at the edges of what validateStorm accepts: bars from the
 * shortest step accepted (a second, less a little slack) to long ones, the
 * whole within a record's longest span; depths of 0, subnormal (down to
 * 5e-324), tiny, ordinary, and up to the largest double, so sums may pass
 * it. No zero or negative durations: those are refused, not computed.
 */
export function extremeStormArb(maxBars = 300): fc.Arbitrary<{ durationsH: number[]; depthsMm: number[] }> {
  const durationH = fc.oneof(
    { arbitrary: fc.constant(SHORTEST_STEP_ACCEPTED_H), weight: 1 },
    { arbitrary: fc.double({ min: SHORTEST_STEP_ACCEPTED_H, max: 3, noNaN: true }), weight: 4 },
    { arbitrary: fc.double({ min: 3, max: 1e5, noNaN: true }), weight: 1 },
  );
  const depthMm = fc.oneof(
    { arbitrary: fc.constant(0), weight: 2 },
    { arbitrary: fc.constant(Number.MIN_VALUE), weight: 1 },
    { arbitrary: fc.double({ min: Number.MIN_VALUE, max: 1e-300, noNaN: true }), weight: 1 },
    { arbitrary: fc.double({ min: 1e-6, max: 80, noNaN: true }), weight: 4 },
    { arbitrary: fc.double({ min: 1e150, max: LARGEST, noNaN: true }), weight: 1 },
    { arbitrary: fc.constant(LARGEST), weight: 1 },
  );
  return fc
    .array(fc.record({ durationH, depthMm }), { minLength: 1, maxLength: maxBars, size: 'max' })
    .map((bars) => ({ durationsH: bars.map((b) => b.durationH), depthsMm: bars.map((b) => b.depthMm) }))
    .filter((storm) => storm.durationsH.reduce((a, b) => a + b, 0) <= MAX_RECORD_H);
}

/** Largest value tried for a parameter with no upper bound: past the storm's reach. */
function upperFor(storm: Storm, method: LossMethod, key: string): number {
  const spec = METHODS[method.kind];
  const param = spec.params.find((p) => p.key === key);
  if (!param) return 1;
  if (Number.isFinite(param.max)) return param.max;
  const reach = param.searchMax ? param.searchMax(storm, method as never) : 100;
  return Math.max(1, reach * 1.5);
}

/**
 * A random valid method of any kind in the core's table, with every parameter
 * inside its bounds (so methods added later are covered automatically).
 */
export function methodArb(storm: Storm): fc.Arbitrary<LossMethod> {
  const kinds = Object.keys(METHODS) as (keyof typeof METHODS)[];
  return fc
    .constantFrom(...kinds)
    .chain((kind) => {
      const spec = METHODS[kind];
      const defaults = spec.defaults as unknown as Record<string, unknown>;
      const fields: Record<string, fc.Arbitrary<unknown>> = {};
      for (const p of spec.params) {
        const lo = p.minExclusive ? p.min + 1e-6 : p.min;
        const hi = Math.max(lo, upperFor(storm, spec.defaults, p.key));
        fields[p.key] = fc.double({ min: lo, max: hi, noNaN: true });
      }
      for (const c of spec.choices ?? []) fields[c.key] = fc.constantFrom(...c.choices.map((x) => x.value));
      return fc.record(fields).map((values) => ({ ...defaults, ...values, kind }) as unknown as LossMethod);
    })
    .filter((m) => {
      try {
        validateMethod(m);
        return true;
      } catch {
        return false; // cross-parameter rules (e.g. f0 ≥ fc) rule some draws out
      }
    });
}
