import { InputError } from '../errors';
import { kindTable } from '../kind-table';
import { recessionDays } from './recession-days';
import { START_OF_RISE_PARAM } from './rise-param';
import type {
  BaseflowEndPoint,
  BaseflowKind,
  BaseflowMethod,
  BaseflowMethodOf,
  BaseflowMethodSpec,
  BaseflowParam,
} from './types';

/** The Lyne & Hollick filter's conventions in words, for the screen and the README. */
const LYNE_HOLLICK_CONVENTIONS =
  'Each pass starts with no quickflow (all baseflow) at its first sample. Quickflow is held between 0 and the flow at every step, and the held value is carried on, so 0 ≤ baseflow ≤ flow. ' +
  'Passes alternate: forward, backward, forward… (an even count ends on a backward pass). ' +
  'Without warm-up the first sample of each pass is taken as all baseflow, and a record that starts on a recession stays all baseflow down it; ' +
  'with warm-up, samples are mirrored about each end first, and dropped after the passes.';

/** The Eckhardt filter's conventions in words, for the screen and the README. */
const ECKHARDT_CONVENTIONS =
  'One forward pass. It starts with all flow as baseflow at its first sample (b₀ = Q₀); baseflow is capped at the flow at every step and the capped value carried on, so 0 ≤ baseflow ≤ flow. ' +
  'Without warm-up a record that starts on a recession is taken as all baseflow there; with warm-up, samples are mirrored before the first and dropped after filtering.';

/**
 * The one table of baseflow separation methods, in the order a picker shows
 * them. The UI builds its method picker, parameter fields and the end point
 * it draws from it; validation reads bounds from it. Declarative: each
 * method's separation is in its own file, reached through separators.ts, so
 * the first screen reads these facts without that code. Built by the core's
 * one factory of kind tables (kind-table.ts), as the loss methods and the
 * transforms are.
 */
const BASEFLOW_TABLE = kindTable<BaseflowMethod, { readonly [K in BaseflowKind]: BaseflowMethodSpec<K> }>(
  {
    constant: {
      kind: 'constant',
      label: 'Constant discharge',
      summary:
        'Baseflow holds at the discharge of the start of rise until the recession falls back to it; the flow above that level is direct runoff.',
      source: 'Graphical separation, e.g. Chow, Maidment & Mays (1988) Applied Hydrology, §5.1.',
      params: [{ key: 'riseIndex', ...START_OF_RISE_PARAM }],
      defaults: { kind: 'constant' },
      needsArea: () => false,
    },
    'straight-line': {
      kind: 'straight-line',
      label: 'Straight line',
      summary:
        'Baseflow runs in a straight line from the start of rise to an end point on the recession; the flow above the line is direct runoff.',
      source: 'Linsley, Kohler & Paulhus, Hydrology for Engineers (McGraw-Hill): N = A^0.2 days, A in mi².',
      params: [
        { key: 'riseIndex', ...START_OF_RISE_PARAM },
        {
          key: 'endTimeH',
          label: 'End of direct runoff',
          unit: 'h',
          min: -Infinity,
          max: Infinity,
          optional: {
            auto: 'N = A^0.2 days after the peak (A in mi², needs the catchment area), or the last sample when that is after the record',
          },
          step: 0.25,
          help: 'Time where the line meets the recession; leave empty to use N = A^0.2 days after the peak (the last sample when that falls after the record).',
        },
      ],
      defaults: { kind: 'straight-line' },
      needsArea: (method) => method.endTimeH === undefined,
      endPoint: {
        key: 'endTimeH',
        rule: {
          action: 'End at N = A^0.2 days after the peak',
          symbol: 'N',
          areaUnit: 'mi2',
          daysAfterPeak: recessionDays,
        },
      },
    },
    'lyne-hollick': {
      kind: 'lyne-hollick',
      label: 'Lyne & Hollick filter',
      summary:
        'A recursive digital filter takes the quick, high-frequency part of the record as direct runoff; more passes give a smoother baseflow.',
      source:
        'Lyne & Hollick (1979), Hydrology and Water Resources Symposium, IEAust, Perth; as applied by Nathan & McMahon (1990), Water Resources Research 26(7); warm-up by reflection as in Ladson et al. (2013), Australian Journal of Water Resources 17(1).',
      params: [
        {
          key: 'alpha',
          label: 'Filter parameter α',
          unit: '-',
          min: 0,
          max: 1,
          maxExclusive: true,
          step: 0.005,
          help: 'Higher α gives a smoother, lower baseflow. 0.925 is common practice for daily data (Nathan & McMahon 1990); it applies per time step below.',
        },
        {
          key: 'passes',
          label: 'Passes',
          unit: '-',
          min: 1,
          max: 9,
          integer: true,
          step: 1,
          help: 'Passes over the record, alternating forward and backward; 3 is usual.',
        },
        {
          key: 'stepH',
          label: 'Time step of α',
          unit: 'h',
          min: 0,
          minExclusive: true,
          max: Infinity,
          optional: { auto: 'α applies to each sample step, as published' },
          step: 1,
          help:
            'Step α was chosen for: 24 h for the published daily values, so a 15-minute record uses α^(0.25/24) per step and forgets at the same rate in hours. ' +
            'Leave empty to apply α to each sample as it stands.',
        },
        {
          key: 'warmUpSamples',
          label: 'Warm-up (samples mirrored at each end)',
          unit: 'samples',
          min: 0,
          max: Infinity,
          integer: true,
          optional: { auto: 'no warm-up: the filter starts at the first sample' },
          step: 1,
          help:
            'Mirror this many samples about each end of the record before filtering, so the start-up guess fades before the record begins; 30 is the published practice for daily data (Ladson et al. 2013, from memory). ' +
            'Matters most for a record that starts on a recession. Empty: none.',
        },
      ],
      // α for daily data, scaled to the record's step (stepH 24 h); no warm-up.
      defaults: { kind: 'lyne-hollick', alpha: 0.925, passes: 3, stepH: 24 },
      conventions: LYNE_HOLLICK_CONVENTIONS,
      needsArea: () => false,
    },
    eckhardt: {
      kind: 'eckhardt',
      label: 'Eckhardt filter',
      summary:
        'A two-parameter recursive filter: the recession constant shapes the baseflow, and BFImax caps the share of flow it can take over the long run.',
      source: 'Eckhardt (2005) Hydrological Processes 19(2), 507–515.',
      params: [
        {
          key: 'a',
          label: 'Recession constant a',
          unit: '-',
          min: 0,
          max: 1,
          maxExclusive: true,
          step: 0.005,
          help: 'Ratio of discharge from one step to the next in a pure recession; best taken from recession analysis. 0.98 is common practice for daily data.',
        },
        {
          key: 'bfiMax',
          label: 'BFImax',
          unit: '-',
          min: 0,
          max: 1,
          step: 0.05,
          help: 'Largest baseflow index the filter allows. Eckhardt (2005) suggests about 0.80 for perennial streams on porous aquifers, 0.50 for ephemeral streams on porous aquifers, 0.25 for perennial streams on hard rock.',
        },
        {
          key: 'stepH',
          label: 'Time step of a',
          unit: 'h',
          min: 0,
          minExclusive: true,
          max: Infinity,
          optional: { auto: 'a applies to each sample step, as published' },
          step: 1,
          help:
            'Step a was found for: 24 h for daily values, so a 15-minute record uses a^(0.25/24) per step, the same recession per hour (Tallaksen 1995, from memory). ' +
            'Leave empty to apply a to each sample as it stands.',
        },
        {
          key: 'warmUpSamples',
          label: 'Warm-up (samples mirrored before the start)',
          unit: 'samples',
          min: 0,
          max: Infinity,
          integer: true,
          optional: { auto: 'no warm-up: the filter starts at the first sample' },
          step: 1,
          help: 'Mirror this many samples before the first, so the start-up guess (all baseflow) fades before the record begins; as for the Lyne & Hollick filter (Ladson et al. 2013, from memory). Empty: none.',
        },
      ],
      // a for daily data, scaled to the record's step (stepH 24 h); no warm-up.
      defaults: { kind: 'eckhardt', a: 0.98, bfiMax: 0.8, stepH: 24 },
      conventions: ECKHARDT_CONVENTIONS,
      needsArea: () => false,
    },
  },
  'baseflow method',
);

export const BASEFLOW_METHODS = BASEFLOW_TABLE.specs;

/** Method kinds in the order a picker shows them. */
export const BASEFLOW_KINDS = BASEFLOW_TABLE.kinds as BaseflowKind[];

/**
 * The method a new streamflow record starts with: a straight line, its end
 * N = A^0.2 days after the peak (the graphical separation most handbooks show
 * first; common practice, no source).
 */
export const FIRST_BASEFLOW_KIND: BaseflowKind = 'straight-line';

export const isBaseflowKind: (kind: unknown) => kind is BaseflowKind = BASEFLOW_TABLE.isKind;

export const baseflowMethodSpec: <K extends BaseflowKind>(kind: K) => BaseflowMethodSpec<K> = BASEFLOW_TABLE.spec;

/**
 * Calls `fn` with the method and the spec of its kind, typed to the same
 * kind, so a caller can hand one to the other (`spec.needsArea(method)`).
 */
export const withBaseflowSpec: <R>(
  method: BaseflowMethod,
  fn: <K extends BaseflowKind>(spec: BaseflowMethodSpec<K>, method: BaseflowMethodOf<K>) => R,
) => R = BASEFLOW_TABLE.dispatch;

/** A method's end point as a screen reads it: the key of its parameter, and the rule used without one. */
export interface EndPointFacts {
  readonly key: string;
  readonly rule: BaseflowEndPoint['rule'];
}

/** The end point the method's line has for a screen to drag (its parameter and rule), or undefined. */
export function baseflowEndPoint(method: BaseflowMethod): EndPointFacts | undefined {
  return withBaseflowSpec(method, (spec): EndPointFacts | undefined => spec.endPoint);
}

/** Default parameters for a method kind (a fresh object). */
export const defaultBaseflowMethod: <K extends BaseflowKind>(kind: K) => BaseflowMethodOf<K> = BASEFLOW_TABLE.defaults;

/** The allowed range of a parameter in words, e.g. "at least 0 and less than 1". */
export function describeBaseflowRange(param: BaseflowParam): string {
  const lowBound = param.min !== -Infinity;
  const highBound = param.max !== Infinity;
  const low = param.minExclusive ? `greater than ${param.min}` : `at least ${param.min}`;
  const high = param.maxExclusive ? `less than ${param.max}` : `at most ${param.max}`;
  const kind = param.integer ? 'a whole number' : 'a number';
  if (lowBound && highBound) return `${kind} ${low} and ${high}`;
  if (lowBound) return `${kind} ${low}`;
  if (highBound) return `${kind} ${high}`;
  return kind;
}

/** The number `method` holds for the parameter `key`, or undefined when it holds none (an optional one left out). */
export const baseflowNumber: (method: BaseflowMethod, key: string) => number | undefined = BASEFLOW_TABLE.number;

/**
 * A copy of `method` with the parameter `key` set to `value`, or left out
 * when `value` is undefined (back to automatic). Not validated: the caller
 * checks it (validateBaseflowMethod) before it is used.
 */
export const withBaseflowValue: <M extends BaseflowMethod>(method: M, key: string, value: number | undefined) => M =
  BASEFLOW_TABLE.withValue;

/** A copy of `method` without the optional parameter `key` (which then goes back to automatic). */
export function withoutBaseflowParam<M extends BaseflowMethod>(method: M, key: string): M {
  return BASEFLOW_TABLE.withValue(method, key, undefined);
}

/**
 * Throws an InputError naming the field when a parameter is missing (and not
 * optional), not a finite number, not whole where it must be, or outside its
 * bounds. Bounds that depend on the record are checked by the method itself.
 */
export function validateBaseflowMethod(method: BaseflowMethod): void {
  if (!method || typeof method !== 'object') throw new InputError('method', 'No baseflow method was given.');
  if (!isBaseflowKind(method.kind)) {
    throw new InputError('kind', `Unknown baseflow method "${String(method.kind)}".`);
  }
  const spec: BaseflowMethodSpec = baseflowMethodSpec(method.kind);
  for (const param of spec.params) {
    const v = BASEFLOW_TABLE.read(method, param.key);
    if (v === undefined && param.optional) continue;
    const unit = param.unit === 'h' ? ' h' : '';
    // A sample index names a sample, so a bad one is reported with it.
    const index = param.unit === 'sample' && Number.isInteger(v) && (v as number) >= 0 ? (v as number) : undefined;
    if (typeof v !== 'number' || !Number.isFinite(v)) {
      throw new InputError(
        param.key,
        `${param.label} must be a finite number${unit && ` of hours`} (got ${String(v)}).`,
      );
    }
    const tooLow = param.minExclusive ? v <= param.min : v < param.min;
    const tooHigh = param.maxExclusive ? v >= param.max : v > param.max;
    if (tooLow || tooHigh || (param.integer && !Number.isInteger(v))) {
      throw new InputError(
        param.key,
        `${param.label} must be ${describeBaseflowRange(param)}${unit} (got ${v}).`,
        index,
      );
    }
  }
}
