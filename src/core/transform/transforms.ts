import { kindTable } from '../kind-table';
import type { Transform, TransformKind, TransformOf } from './types';

/** The peak rate factor of the published table, in cfs per (mi²·in/h) (NEH-630 ch. 16, from memory). */
export const NRCS_PEAK_RATE_FACTOR = 484;

/** What a transform parameter is fitted to: the observed peak, its time, or the Nash–Sutcliffe efficiency. */
export type TransformObjective = 'peak' | 'time-of-peak' | 'nse';
export const TRANSFORM_OBJECTIVES: readonly TransformObjective[] = ['peak', 'time-of-peak', 'nse'];

/** A numeric parameter of a transform, with its unit and physical bounds. */
export interface TransformParam<K extends TransformKind = TransformKind> {
  readonly key: Exclude<keyof TransformOf<K>, 'kind'> & string;
  readonly label: string;
  /** 'h' for times; 'US' for the peak rate factor (cfs per mi²·in/h); '-' for none. */
  readonly unit: 'h' | 'US' | '-';
  readonly min: number;
  readonly max: number;
  /** True when `min` itself is not allowed. */
  readonly minExclusive?: boolean;
  /** May be left out (the default is said in `help`). */
  readonly optional?: boolean;
  /** Can be fitted to an observed hydrograph by `fitTransform`; then its search range. */
  readonly fit?: { readonly searchMin: number; readonly searchMax: number };
  /** Its letter in the equations, for short phrases ("n held"); absent: its label. */
  readonly symbol?: string;
  /**
   * A lag that a time of concentration sets, lag = 0.6·Tc (NEH-630 ch. 15):
   * screens offer Tc beside it.
   */
  readonly fromTimeOfConcentration?: true;
  readonly step: number;
  readonly help: string;
}

/** Everything the core and a screen need to know about one transform. */
export interface TransformSpec<K extends TransformKind = TransformKind> {
  readonly kind: K;
  readonly label: string;
  readonly summary: string;
  /** The published source of the equations. */
  readonly source: string;
  readonly params: readonly TransformParam<K>[];
  readonly defaults: TransformOf<K>;
  /**
   * With more than one parameter to fit, the one the Fit sets unless the user
   * chose another; absent: the first that can be fitted.
   */
  readonly fitFirst?: TransformParam<K>['key'];
  /**
   * The transform is given by a list of unit hydrograph ordinates
   * (`ordinatesM3sPerMm`) besides its parameters: validation checks each
   * ordinate, screens offer the list and the volume it holds, exports count
   * it. Only a kind whose type holds the list may say so (checked kind by
   * kind, so the spec of any transform may hold it).
   */
  readonly ordinates?: K extends TransformKind ? (TransformOf<K> extends OrdinatesTransform ? true : never) : never;
}

/** A transform given by its unit hydrograph's ordinates. */
export type OrdinatesTransform = Extract<Transform, { readonly ordinatesM3sPerMm: ArrayLike<number> }>;

const LAG_HELP =
  'Time from the centre of the excess to the peak of the unit hydrograph; 0.6 × the time of concentration (NEH-630 ch. 15).';

const lagParam = {
  key: 'lagH',
  label: 'Lag',
  unit: 'h',
  min: 0,
  max: 1000,
  minExclusive: true,
  fit: { searchMin: 0.01, searchMax: 1000 },
  step: 0.05,
  help: LAG_HELP,
  fromTimeOfConcentration: true,
} as const;

/**
 * The one table of transforms, in the order a picker shows them. Validation,
 * fitting and a screen's fields are all read from it; built by the core's one
 * factory of kind tables (kind-table.ts), as the loss and baseflow methods
 * are. The unit responses are computed apart from it (weights.ts), so the
 * first screen reads these facts without that code.
 */
const TRANSFORM_TABLE = kindTable<Transform, { readonly [K in TransformKind]: TransformSpec<K> }>(
  {
    'nrcs-dimensionless': {
      kind: 'nrcs-dimensionless',
      label: 'NRCS dimensionless unit hydrograph',
      summary: 'The curvilinear unit hydrograph of the published ratio table; Tp = D/2 + lag.',
      source: 'USDA NRCS (2007) National Engineering Handbook Part 630, ch. 16, Table 16-1',
      params: [
        lagParam,
        {
          key: 'peakRateFactor',
          label: 'Peak rate factor',
          unit: 'US',
          min: 100,
          max: 1000,
          optional: true,
          step: 1,
          help:
            '484 (the default) gives the published table; other values a gamma-shaped hydrograph with the same volume ' +
            '(flatter below 484, steeper above).',
        },
      ],
      defaults: { kind: 'nrcs-dimensionless', lagH: 1 },
    },
    triangular: {
      kind: 'triangular',
      label: 'NRCS triangular unit hydrograph',
      summary: 'Straight rise to the peak at Tp = D/2 + lag, straight fall to 8/3·Tp.',
      source: 'USDA NRCS (2007) National Engineering Handbook Part 630, ch. 16',
      params: [lagParam],
      defaults: { kind: 'triangular', lagH: 1 },
    },
    nash: {
      kind: 'nash',
      label: 'Nash cascade',
      summary: 'n equal linear reservoirs in series; the unit hydrograph is gamma-shaped, peaking at (n − 1)·k.',
      source: 'Nash (1957) The form of the instantaneous unit hydrograph, IASH Publ. 45',
      params: [
        {
          key: 'n',
          label: 'Number of reservoirs n',
          unit: '-',
          min: 0,
          max: 100,
          minExclusive: true,
          fit: { searchMin: 0.5, searchMax: 50 },
          symbol: 'n',
          step: 0.1,
          help: 'Need not be a whole number; larger n gives a more peaked, more delayed hydrograph.',
        },
        {
          key: 'kH',
          label: 'Storage constant k',
          unit: 'h',
          min: 0,
          max: 1000,
          minExclusive: true,
          fit: { searchMin: 0.01, searchMax: 1000 },
          symbol: 'k',
          step: 0.05,
          help: 'Storage over outflow of each reservoir; the mean delay of the cascade is n·k.',
        },
      ],
      defaults: { kind: 'nash', n: 3, kH: 0.5 },
      // k with n held: the storage constant moves the timing and keeps the shape.
      fitFirst: 'kH',
    },
    'unit-hydrograph': {
      kind: 'unit-hydrograph',
      label: 'Unit hydrograph of my own',
      summary: 'Ordinates of a unit hydrograph of a stated duration, converted to the output step by the S-curve.',
      source: 'S-curve method: Chow, Maidment & Mays (1988) Applied Hydrology, §7.6',
      params: [
        {
          key: 'durationH',
          label: 'Duration of the unit excess',
          unit: 'h',
          min: 0,
          max: Infinity,
          minExclusive: true,
          step: 0.25,
          help: 'The time over which the 1 mm of excess fell.',
        },
        {
          key: 'stepH',
          label: 'Time between ordinates',
          unit: 'h',
          min: 0,
          max: Infinity,
          minExclusive: true,
          step: 0.25,
          help: 'The first ordinate is at the start of the excess.',
        },
      ],
      defaults: {
        kind: 'unit-hydrograph',
        durationH: 1,
        stepH: 1,
        // Invented: a smooth 1-hour unit hydrograph for a 1 km² catchment; it holds
        // 0.278 m³/s·h = 1000.8 m³ = 1.0008 mm over 1 km².
        ordinatesM3sPerMm: [0, 0.05, 0.09, 0.06, 0.035, 0.02, 0.0118, 0.0062, 0.0033, 0.0012, 0.0005, 0],
      },
      ordinates: true,
    },
  },
  'transform',
);

export const TRANSFORMS = TRANSFORM_TABLE.specs;

/** Transform kinds in the order a picker shows them. */
export const TRANSFORM_KINDS = TRANSFORM_TABLE.kinds as TransformKind[];

export const isTransformKind: (kind: unknown) => kind is TransformKind = TRANSFORM_TABLE.isKind;

/**
 * The number `transform` holds for the parameter `key` (a key of its
 * spec's params), or undefined when it holds none there (left out, or not a
 * number).
 */
export const transformValue: (transform: Transform, key: string) => number | undefined = TRANSFORM_TABLE.number;

/**
 * A copy of `transform` with the parameter `key` set to `value`, or left
 * out when `value` is undefined (an optional parameter's default). Not
 * validated: the caller checks it (validateTransform) before it is used.
 */
export const withTransformValue: <T extends Transform>(transform: T, key: string, value: number | undefined) => T =
  TRANSFORM_TABLE.withValue;

/** Whatever `transform` holds for `key`, unchecked: for validation, which says what it got. */
export const readTransformValue: (transform: Transform, key: string) => unknown = TRANSFORM_TABLE.read;

/** Whether `transform` is given by its ordinates (its spec's `ordinates`). */
export function hasOrdinates(transform: Transform): transform is OrdinatesTransform {
  return TRANSFORMS[transform.kind].ordinates === true;
}

/** Keys of the parameters of a transform kind that `fitTransform` can fit, in the table's order. */
export function fittableTransformKeys(kind: TransformKind): string[] {
  return (TRANSFORMS[kind].params as readonly TransformParam[]).filter((p) => p.fit).map((p) => p.key);
}
