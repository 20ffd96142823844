import fc from 'fast-check';
import {
  BASEFLOW_KINDS,
  BASEFLOW_METHODS,
  FIRST_CLOCK_YEAR,
  LAST_CLOCK_YEAR,
  MAX_RECORD_H,
  METHODS,
  METHOD_KINDS,
  MIN_STEP_H,
  validateBaseflowMethod,
  validateMethod,
  type BaseflowKind,
  type BaseflowMethod,
  type BaseflowMethodSpec,
  type LossKind,
  type LossMethod,
  type MethodSpec,
  TRANSFORMS,
  TRANSFORM_KINDS,
  TRANSFORM_OBJECTIVES,
  type Transform,
  type TransformKind,
  type TransformParam,
} from '../../src/core';
import { CURRENT_SCENARIO_VERSION, type Scenario } from '../../src/scenario';
import type { HydrographSettings, Streamflow } from '../../src/scenario/types';
import { baseflowRecordProblem } from '../../src/scenario/baseflow-check';

// Sizes are explicit (size: 'max'): fast-check's default size keeps arrays
// and strings near a dozen elements whatever their maxLength, so without it
// a "300-bar" storm never passed 10 bars. test/helpers/scenario-arbitraries.test.ts
// checks that each generator reaches its maximum.
/** Most bars in a generated storm. */
export const MAX_BARS = 300;
/** Most samples in a generated streamflow record. */
export const MAX_SAMPLES = 300;
/** Most events in a generated event set. */
export const MAX_SET_EVENTS = 3;

// -0 is read back as 0 (tested on its own), so generated documents avoid it.
const unsignedZero = (x: number): number => (x === 0 ? 0 : x);

/** Any finite double ≥ 0, from the smallest subnormal to the largest double. */
const anyNonNegative = fc
  .double({ min: 0, max: Number.MAX_VALUE, noNaN: true, noDefaultInfinity: true })
  .map(unsignedZero);

/** A rain depth: gauge resolution (0.1 mm), arbitrary precision, or an extreme double. */
const depthMm = fc.oneof(
  { weight: 4, arbitrary: fc.integer({ min: 0, max: 600 }).map((n) => n / 10) },
  { weight: 2, arbitrary: fc.double({ min: 0, max: 200, noNaN: true }).map(unsignedZero) },
  { weight: 1, arbitrary: anyNonNegative },
);

/**
 * Any bar duration the schema takes, from one second to the longest bar a
 * storm of MAX_BARS may hold, its ends included (extreme but valid:
 * core/time-limits.ts).
 */
const anyDuration = fc.oneof(
  fc.constantFrom(MIN_STEP_H, MAX_RECORD_H / (MAX_BARS + 1)),
  fc.double({ min: MIN_STEP_H, max: MAX_RECORD_H / (MAX_BARS + 1), noNaN: true }),
);

/** Steps as gauges log them (1, 5, 6, 10, 15, 30 min, 1 h) or any duration the schema takes. */
const stepH = fc.oneof(
  fc.constantFrom(1 / 60, 5 / 60, 6 / 60, 10 / 60, 0.25, 0.5, 1),
  fc.double({ min: 1 / 3600, max: 24, noNaN: true }),
  anyDuration,
);

export const stormArb = fc.oneof(
  {
    weight: 9,
    arbitrary: fc
      .record({
        uniform: fc.boolean(),
        step: stepH,
        bars: fc.array(fc.record({ durationH: stepH, depthMm }), { maxLength: MAX_BARS, size: 'max' }),
      })
      .map(({ uniform, step, bars }) => ({
        durationsH: bars.map((b) => (uniform ? step : b.durationH)),
        depthsMm: bars.map((b) => b.depthMm),
      })),
  },
  // One bar as long as a record may be, or a second: the ends of the range.
  {
    weight: 1,
    arbitrary: fc.record({ durationH: fc.constantFrom(MAX_RECORD_H, MIN_STEP_H), depthMm }).map((b) => ({
      durationsH: [b.durationH],
      depthsMm: [b.depthMm],
    })),
  },
);

/** The forms of ISO 8601 start clock the schema reads. */
type ClockForm = 'minutes' | 'seconds' | 'utc' | 'offset';

/** A start clock before it is written: a moment (its UTC fields are the clock's digits) and a form. */
interface Clock {
  readonly date: Date;
  readonly form: ClockForm;
}

const FIRST_CLOCK_MS = Date.UTC(FIRST_CLOCK_YEAR, 0, 1);
const LAST_CLOCK_MS = Date.UTC(LAST_CLOCK_YEAR, 11, 31, 23, 59, 59);

const clockFormArb = fc.constantFrom<ClockForm>('minutes', 'seconds', 'utc', 'offset');

const clockArb: fc.Arbitrary<Clock> = fc.record({
  // Any start clock the schema takes, its first and last moments included (core/time-limits.ts).
  date: fc.oneof(
    fc.date({
      min: new Date('1900-01-01T00:00:00Z'),
      max: new Date('2100-12-31T23:59:59Z'),
      noInvalidDate: true,
    }),
    fc.date({ min: new Date(FIRST_CLOCK_MS), max: new Date(LAST_CLOCK_MS), noInvalidDate: true }),
    fc.constantFrom(new Date(FIRST_CLOCK_MS), new Date(LAST_CLOCK_MS)),
  ),
  form: clockFormArb,
});

/** A clock as a document writes it: "2026-07-14T15:00", "…:00", "…:00.000Z" or "…:00+10:00". */
function isoOf({ date, form }: Clock): string {
  const iso = date.toISOString(); // 2026-07-14T15:00:00.000Z
  if (form === 'minutes') return iso.slice(0, 16);
  if (form === 'seconds') return iso.slice(0, 19);
  if (form === 'utc') return iso;
  return `${iso.slice(0, 19)}+10:00`;
}

/** ISO 8601 start times in the forms the schema reads. */
export const startIsoArb = clockArb.map(isoOf);

/** `ms` moved into the years a start clock may have (the record then lies nearer its storm, never farther). */
const intoClockYears = (ms: number): Date => new Date(Math.min(LAST_CLOCK_MS, Math.max(FIRST_CLOCK_MS, ms)));

/**
 * Room kept below the 500-year limit between two clocks written in different
 * forms: "+10:00" against "Z" moves one by 10 h, and the minutes form drops up
 * to a minute of seconds.
 */
const FORMS_APART_H = 11;

/**
 * A record's start clock, or none. With no storm clock, any clock. With one,
 * a clock within 500 years of it (the schema's rule, core/time-limits.ts):
 * exactly 500 years before or after, written in the storm's own form so the
 * two differ by exactly MAX_RECORD_H (moved into the allowed years, where it
 * falls nearer); anywhere between, in any form; or within two days, as a
 * real record lies.
 */
function recordStartArb(storm: Clock | undefined): fc.Arbitrary<string | undefined> {
  if (storm === undefined) return fc.option(startIsoArb, { nil: undefined });
  const from = (hours: number): Date => intoClockYears(storm.date.getTime() + hours * 3.6e6);
  const farthest = MAX_RECORD_H - FORMS_APART_H;
  return fc.option(
    fc.oneof(
      fc.constantFrom(-MAX_RECORD_H, MAX_RECORD_H).map((hours) => isoOf({ date: from(hours), form: storm.form })),
      fc
        .record({ hours: fc.double({ min: -farthest, max: farthest, noNaN: true }), form: clockFormArb })
        .map(({ hours, form }) => isoOf({ date: from(hours), form })),
      fc
        .record({ hours: fc.double({ min: -48, max: 48, noNaN: true }), form: clockFormArb })
        .map(({ hours, form }) => isoOf({ date: from(hours), form })),
    ),
    { nil: undefined },
  );
}

/** A value for one numeric parameter, anywhere inside its bounds. */
function paramValue(param: MethodSpec['params'][number]): fc.Arbitrary<number> {
  const max = Number.isFinite(param.max) ? param.max : Number.MAX_VALUE;
  const options = {
    min: param.min,
    max,
    noNaN: true,
    noDefaultInfinity: true,
    minExcluded: param.minExclusive === true,
  };
  const near = { ...options, max: Math.min(max, Math.max(param.min + 1, param.min * 2 + 100)) };
  return fc.oneof(fc.double(near), fc.double(options)).map(unsignedZero);
}

/**
 * A valid method of the given kind, read from the core's table: every numeric
 * parameter within its bounds, every choice from its list, cross-parameter
 * rules respected. Kinds added to the table are covered without a change.
 */
export function methodOfKindArb(kind: LossKind): fc.Arbitrary<LossMethod> {
  const spec = METHODS[kind] as MethodSpec;
  const fields: Record<string, fc.Arbitrary<unknown>> = {};
  for (const param of spec.params) fields[param.key] = paramValue(param);
  for (const choice of spec.choices ?? []) fields[choice.key] = fc.constantFrom(...choice.choices.map((c) => c.value));
  return fc
    .record(fields)
    .map((values) => ({ kind, ...values }) as unknown as LossMethod)
    .filter((method) => {
      try {
        validateMethod(method);
        return true;
      } catch {
        return false; // a cross-parameter rule (validateExtra) rules this draw out
      }
    });
}

export const methodArb = fc.constantFrom(...METHOD_KINDS).chain(methodOfKindArb);

const methodMemoryArb = fc.subarray([...METHOD_KINDS]).chain((kinds) =>
  fc.tuple(...kinds.map(methodOfKindArb)).map((methods) => {
    const memory: Partial<Record<LossKind, LossMethod>> = {};
    for (const method of methods) memory[method.kind] = method;
    return memory;
  }),
);

/** Text of any code points, lone surrogates included, of any length up to `maxLength`. */
const textArb = (maxLength: number) => fc.string({ unit: 'binary', maxLength, size: 'max' });

/** A value for one baseflow parameter inside its bounds (times and sample indices inside the record). */
function baseflowParamValue(
  param: BaseflowMethodSpec['params'][number],
  lastTimeH: number,
  samples: number,
): fc.Arbitrary<number> {
  if (param.unit === 'sample') return fc.integer({ min: 0, max: samples - 1 });
  // A count with no upper bound (warm-up samples) is drawn up to a little past the record's length.
  if (param.integer) return fc.integer({ min: param.min, max: Number.isFinite(param.max) ? param.max : samples + 5 });
  const min = Number.isFinite(param.min) ? param.min : 0;
  const max = param.unit === 'h' && param.key === 'endTimeH' ? lastTimeH : Number.isFinite(param.max) ? param.max : 48;
  return fc
    .double({
      min,
      max,
      noNaN: true,
      minExcluded: param.minExclusive === true,
      maxExcluded: param.maxExclusive === true,
    })
    .map(unsignedZero);
}

/**
 * A valid baseflow method of the given kind for a record, read from the
 * core's table: optional parameters sometimes left out, each one inside its
 * bounds, and only methods the schema finds fit for this record.
 */
function baseflowOfKindArb(
  kind: BaseflowKind,
  record: { timesH: readonly number[]; dischargeM3s: readonly number[] },
): fc.Arbitrary<BaseflowMethod> {
  const spec = BASEFLOW_METHODS[kind] as BaseflowMethodSpec;
  const last = record.timesH[record.timesH.length - 1] as number;
  const fields: Record<string, fc.Arbitrary<number | undefined>> = {};
  for (const param of spec.params) {
    const value = baseflowParamValue(param, last, record.timesH.length);
    fields[param.key] = param.optional ? fc.option(value, { nil: undefined }) : value;
  }
  return fc
    .record(fields)
    .map((values) => {
      const method: Record<string, unknown> = { kind };
      for (const [key, value] of Object.entries(values)) if (value !== undefined) method[key] = value;
      return method as unknown as BaseflowMethod;
    })
    .filter((method) => {
      try {
        validateBaseflowMethod(method);
        return baseflowRecordProblem(record, method) === null;
      } catch {
        return false;
      }
    });
}

/**
 * A streamflow record of 2 to MAX_SAMPLES samples (steps as gauges log them
 * or any length from 1 min to a day; discharge 0, small or large), its
 * clock (within 500 years of `stormClock`, its storm's start, when there is
 * one), offset, separation method, method memory and link to the observed
 * runoff (only where `canLink`).
 */
export const streamflowArb = (canLink: boolean, stormClock?: Clock): fc.Arbitrary<Streamflow> =>
  fc
    .record({
      uniform: fc.boolean(),
      step: fc.constantFrom(5 / 60, 0.25, 1),
      samples: fc.array(
        fc.record({
          stepH: fc.double({ min: 1 / 60, max: 24, noNaN: true }),
          q: fc.oneof(
            fc.constant(0),
            fc.integer({ min: 0, max: 5000 }).map((n) => n / 100),
            fc.double({ min: 0, max: 5000, noNaN: true }).map(unsignedZero),
          ),
        }),
        { minLength: 2, maxLength: MAX_SAMPLES, size: 'max' },
      ),
      start: recordStartArb(stormClock),
      offsetH: fc.double({ min: -48, max: 48, noNaN: true }).map(unsignedZero),
      linked: fc.boolean(),
    })
    .chain(({ uniform, step, samples, start, offsetH, linked }) => {
      const timesH: number[] = [0];
      for (const s of samples.slice(1)) timesH.push((timesH[timesH.length - 1] as number) + (uniform ? step : s.stepH));
      const record = { timesH, dischargeM3s: samples.map((s) => s.q) };
      const memory = fc.subarray([...BASEFLOW_KINDS]).chain((kinds) =>
        fc.tuple(...kinds.map((kind) => baseflowOfKindArb(kind, record))).map((methods) => {
          const out: Partial<Record<BaseflowKind, BaseflowMethod>> = {};
          for (const method of methods) out[method.kind] = method;
          return out;
        }),
      );
      const method = fc.constantFrom(...BASEFLOW_KINDS).chain((kind) => baseflowOfKindArb(kind, record));
      return fc.tuple(method, memory).map(([baseflow, baseflowMemory]): Streamflow => ({
        ...record,
        ...(start === undefined ? {} : { startIso: start }),
        offsetH,
        baseflow,
        baseflowMemory,
        useAsObserved: canLink && linked,
      }));
    });

/** A transform of the given kind with parameters drawn inside the core's bounds (version 5). */
function transformOfKindArb(kind: TransformKind): fc.Arbitrary<Transform> {
  const time = fc.double({ min: 0.01, max: 100, noNaN: true });
  switch (kind) {
    case 'nrcs-dimensionless':
      return fc
        .record({ lagH: time, prf: fc.option(fc.double({ min: 100, max: 1000, noNaN: true }), { nil: undefined }) })
        .map(({ lagH, prf }) => (prf === undefined ? { kind, lagH } : { kind, lagH, peakRateFactor: prf }));
    case 'triangular':
      return time.map((lagH) => ({ kind, lagH }));
    case 'nash':
      return fc
        .record({ n: fc.double({ min: 0.5, max: 20, noNaN: true }), kH: time })
        .map(({ n, kH }) => ({ kind, n, kH }));
    case 'unit-hydrograph':
      return fc
        .record({
          stepH: fc.double({ min: 0.1, max: 2, noNaN: true }),
          ordinates: fc.array(fc.double({ min: 0, max: 50, noNaN: true }).map(unsignedZero), {
            minLength: 3,
            maxLength: 40,
          }),
        })
        .map(({ stepH, ordinates }) => ({
          kind,
          // The ordinates must outlast the unit excess, and hold some runoff.
          durationH: stepH,
          stepH,
          ordinatesM3sPerMm: ordinates.some((q) => q > 0) ? ordinates : [0, 1, ...ordinates.slice(2)],
        }));
  }
}

/** Version 5: the runoff hydrograph settings. */
export const hydrographArb: fc.Arbitrary<HydrographSettings> = fc
  .record({
    transform: fc.option(fc.constantFrom(...TRANSFORM_KINDS).chain(transformOfKindArb), { nil: null }),
    memory: fc.subarray([...TRANSFORM_KINDS]).chain((kinds) => fc.tuple(...kinds.map(transformOfKindArb))),
    pick: fc.option(fc.nat(), { nil: null }),
    objective: fc.constantFrom(...TRANSFORM_OBJECTIVES),
  })
  .map(({ transform, memory, pick, objective }) => {
    const transformMemory: Partial<Record<TransformKind, Transform>> = {};
    for (const t of memory) transformMemory[t.kind] = t;
    const keys = transform
      ? (TRANSFORMS[transform.kind].params as readonly TransformParam[]).filter((p) => p.fit).map((p) => p.key)
      : [];
    const fitParameter = pick === null || keys.length === 0 ? null : (keys[pick % keys.length] ?? null);
    return { transform, transformMemory, fitParameter, objective };
  });

// The storm's start clock is drawn first: the workbench's record (and the
// active event's, which is the same) lies within 500 years of it.
export const scenarioArb: fc.Arbitrary<Scenario> = fc
  .option(clockArb, { nil: undefined })
  .chain((stormClock) =>
    fc.record({
      name: textArb(60),
      notes: textArb(300),
      storm: stormArb,
      start: fc.constant(stormClock === undefined ? undefined : isoOf(stormClock)),
      catchmentName: textArb(40),
      areaM2: fc.oneof(fc.constant(0), fc.double({ min: 1, max: 1e10, noNaN: true }), anyNonNegative),
      units: fc.constantFrom('si' as const, 'us' as const),
      method: methodArb,
      methodMemory: methodMemoryArb,
      observed: fc.option(
        fc.record({
          as: fc.constantFrom('depth' as const, 'volume' as const),
          value: fc.oneof(fc.double({ min: 0, max: 500, noNaN: true }).map(unsignedZero), anyNonNegative),
          locked: fc.boolean(),
          pick: fc.nat(),
        }),
        { nil: null },
      ),
      // Version 2: the workbench's streamflow record (linked to the observed runoff only where there is one).
      streamflow: fc.option(streamflowArb(true, stormClock), { nil: null, freq: 2 }),
      // Version 3: a few events of the catchment, each with its own storm, observed runoff and record.
      events: fc.array(
        fc.record({
          name: textArb(30),
          storm: stormArb,
          observed: fc.option(
            fc.record({
              as: fc.constantFrom('depth' as const, 'volume' as const),
              value: fc.double({ min: 0, max: 500, noNaN: true }).map(unsignedZero),
            }),
            { nil: null },
          ),
          streamflow: fc.option(streamflowArb(false), { nil: null, freq: 3 }),
        }),
        { maxLength: MAX_SET_EVENTS, size: 'max' },
      ),
      // The event on the workbench (an index into the events), or none.
      active: fc.option(fc.nat(), { nil: null }),
      setParameter: fc.option(fc.nat(), { nil: null }),
      designPick: fc.oneof(
        fc.constantFrom('median' as const, 'mean' as const, 'min' as const, 'max' as const),
        fc.record({ value: fc.double({ min: -1e6, max: 1e6, noNaN: true }).map(unsignedZero) }),
      ),
      hydrograph: hydrographArb,
      uncertaintyPct: fc.oneof(fc.constant(0), fc.double({ min: 0, max: 99.9, noNaN: true }).map(unsignedZero)),
    }),
  )
  .map((r) => {
    const params: string[] = (METHODS[r.method.kind] as MethodSpec).params.map((p) => String(p.key));
    const observed =
      r.observed && params.length > 0
        ? {
            as: r.observed.as,
            value: r.observed.value,
            parameter: params[r.observed.pick % params.length] ?? '',
            locked: r.observed.locked,
          }
        : null;
    // A record linked to the observed runoff needs an observed runoff.
    const streamflow = r.streamflow && {
      ...r.streamflow,
      useAsObserved: r.streamflow.useAsObserved && observed !== null,
    };
    const events = r.events.map((e, k) => ({
      id: `e${k + 1}`,
      name: e.name,
      storm: e.storm,
      observed: e.observed ? { as: e.observed.as, value: e.observed.value } : null,
      streamflow: e.streamflow,
    }));
    const storm = r.start === undefined ? r.storm : { ...r.storm, startIso: r.start };
    // The active event holds the workbench's data, as the store keeps it (see EventSet in types.ts).
    const activeIndex = r.active === null || events.length === 0 ? null : r.active % events.length;
    if (activeIndex !== null) {
      events[activeIndex] = {
        ...(events[activeIndex] as (typeof events)[number]),
        storm,
        observed: observed && { as: observed.as, value: observed.value },
        streamflow,
      };
    }
    return {
      version: CURRENT_SCENARIO_VERSION,
      name: r.name,
      notes: r.notes,
      storm,
      catchment: { name: r.catchmentName, areaM2: r.areaM2 },
      units: r.units,
      method: r.method,
      methodMemory: r.methodMemory,
      observed,
      streamflow,
      eventSet: {
        // Plain literals: fast-check's records are not plain objects, and the round trip is checked strictly.
        events,
        activeId: activeIndex === null ? null : `e${activeIndex + 1}`,
        parameter:
          r.setParameter === null || params.length === 0 ? null : (params[r.setParameter % params.length] ?? null),
        designPick: typeof r.designPick === 'string' ? r.designPick : { value: r.designPick.value },
      },
      hydrograph: r.hydrograph,
      observedUncertaintyPct: r.uncertaintyPct,
    } satisfies Scenario;
  });

/**
 * A 24-hour storm of 5-minute bars (288 bars) as a gauge with 0.1 mm
 * resolution would log it: dry spells, a slow build-up, a burst, a tail.
 * Deterministic (seeded) so the measured link length is reproducible.
 */
export function gaugeStorm24h(seed = 1): { durationsH: number[]; depthsMm: number[] } {
  let state = seed >>> 0 || 1;
  const random = (): number => {
    // xorshift32
    state ^= state << 13;
    state >>>= 0;
    state ^= state >>> 17;
    state ^= state << 5;
    state >>>= 0;
    return state / 2 ** 32;
  };
  const depthsMm: number[] = [];
  for (let k = 0; k < 288; k++) {
    const t = (k + 0.5) / 288;
    // Mean rate, mm per 5 min: a main burst at 40 % of the day, a shower at 75 %.
    const mean = 2.6 * Math.exp(-((t - 0.4) ** 2) / 0.004) + 0.5 * Math.exp(-((t - 0.75) ** 2) / 0.002) + 0.05;
    const raw = random() < 0.25 ? 0 : mean * (0.3 + 1.4 * random());
    depthsMm.push(Math.round(raw * 10) / 10);
  }
  return { durationsH: depthsMm.map(() => 5 / 60), depthsMm };
}
