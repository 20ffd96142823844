import type { Storm } from '../storm';

/** Constant loss rate, the φ-index: L_k = min(P_k, φ·Δt_k). */
export interface ConstantLoss {
  readonly kind: 'constant';
  readonly rateMmH: number;
}
/** Initial loss (mm) satisfied first, then a continuing rate (mm/h). */
export interface InitialContinuingLoss {
  readonly kind: 'initial-continuing';
  readonly initialMm: number;
  readonly rateMmH: number;
}
/** Proportional loss: excess is a fixed fraction (runoff coefficient) of rain. */
export interface ProportionalLoss {
  readonly kind: 'proportional';
  readonly coefficient: number;
}
/**
 * Capacity recovery in dry spells at a rate (Horton). Both fields may be
 * left out by callers written before they existed: no recovery then.
 */
export interface DrySpellRecovery {
  /** Capacity recovers during bars with no rain (off when absent). */
  readonly recovers?: boolean;
  /** Recovery rate k_r, 1/h (DEFAULT_RECOVERY_PER_H when absent); read only while `recovers`. */
  readonly recoveryPerH?: number;
}
/**
 * Horton infiltration capacity f(t) = f_c + (f_0 − f_c)·e^(−k t). `ponding`
 * false: t is time since the rain began; true: capacity follows cumulative
 * infiltration (time compression).
 */
export interface HortonLoss extends DrySpellRecovery {
  readonly kind: 'horton';
  readonly f0MmH: number;
  readonly fcMmH: number;
  readonly kPerH: number;
  readonly ponding: boolean;
}
/**
 * Green–Ampt: saturated conductivity, wetting-front suction head, moisture
 * deficit Δθ. With `recovers`, the wetted zone redistributes in dry spells
 * (Ogden & Saghafian 1997), which needs the soil's initial effective
 * saturation Sᵢ and Brooks–Corey λ; callers written before they existed may
 * leave all three out (no recovery; loam's 0.3 and 0.22).
 */
export interface GreenAmptLoss {
  readonly kind: 'green-ampt';
  readonly ksMmH: number;
  readonly suctionMm: number;
  readonly moistureDeficit: number;
  /** Capacity recovers during bars with no rain (off when absent). */
  readonly recovers?: boolean;
  /** Initial effective saturation Sᵢ, 0–1; read only while `recovers`. */
  readonly initialSaturation?: number;
  /** Brooks–Corey pore-size distribution index λ; read only while `recovers`. */
  readonly poreSizeIndex?: number;
}
/**
 * How S on the λ = 0.2 basis converts to the λ = 0.05 basis: 'power',
 * S₀.₀₅ = 1.33·S₀.₂^1.15 with S in inches, or 'ratio', S₀.₀₅ = 1.42·S₀.₂.
 */
export type RetentionConversion = 'power' | 'ratio';
/**
 * NRCS curve number on the λ = 0.2 basis; `iaRatio` 0.05 converts S to that
 * basis by `conversion` ('power' when absent).
 */
export interface CurveNumberLoss {
  readonly kind: 'curve-number';
  readonly cn: number;
  readonly iaRatio: 0.2 | 0.05;
  readonly conversion?: RetentionConversion;
}

/**
 * Every loss method the core knows, as a discriminated union on `kind`.
 * Adding a method: add its interface here, a file under `loss/`, and one
 * entry in `loss/methods.ts`.
 */
export type LossMethod =
  ConstantLoss | InitialContinuingLoss | ProportionalLoss | HortonLoss | GreenAmptLoss | CurveNumberLoss;
export type LossKind = LossMethod['kind'];
export type MethodOf<K extends LossKind> = Extract<LossMethod, { kind: K }>;

/** Per-bar and total results of applying a loss method to a storm. */
export interface LossResult {
  /** Loss of each bar, mm. */
  readonly lossMm: Float64Array;
  /** Rainfall excess of each bar, mm. */
  readonly excessMm: Float64Array;
  readonly rainMm: number;
  readonly totalLossMm: number;
  readonly totalExcessMm: number;
  /** Excess / rain (0 for a dry storm). */
  readonly runoffFraction: number;
  /** Highest bar excess intensity, mm/h. */
  readonly peakExcessMmH: number;
}

/** A numeric parameter of a method, with its unit and physical bounds. */
export interface NumericParam<K extends LossKind = LossKind> {
  readonly key: Exclude<keyof MethodOf<K>, 'kind'> & string;
  readonly label: string;
  /** Internal (SI) unit, for display and conversion at the edges. */
  readonly unit: ParamUnit;
  readonly min: number;
  readonly max: number;
  /** True when `min` itself is not allowed (e.g. k > 0). */
  readonly minExclusive?: boolean;
  readonly step: number;
  /**
   * Finite upper end of the search interval for calibration when `max` is
   * unbounded (e.g. the peak intensity for a rate: no excess above it).
   */
  readonly searchMax?: (storm: Storm, method: MethodOf<K>) => number;
  /**
   * Lower end of the search interval when it depends on the other parameters
   * (e.g. Horton's f_0 cannot go below f_c); `min` otherwise.
   */
  readonly searchMin?: (storm: Storm, method: MethodOf<K>) => number;
  readonly help: string;
  /**
   * False when runoff need not be monotone in this parameter (a soil value
   * whose effects pull both ways): calibration then scans the search interval
   * for a stretch that holds the answer before solving. Absent: monotone.
   */
  readonly monotone?: false;
  /**
   * The value the core uses when a method object leaves this parameter out
   * (it was added after callers were written). Absent: the parameter is required.
   */
  readonly omitted?: number;
  /**
   * Whether the parameter takes part under the method's other settings (the
   * recovery rate only while capacity recovers). Absent: always. Screens
   * hide, and exports leave out, a parameter that takes no part.
   */
  readonly activeWhen?: (method: MethodOf<K>) => boolean;
}

/** A non-numeric setting of a method (a switch or a choice). */
export interface ChoiceParam<K extends LossKind = LossKind> {
  readonly key: Exclude<keyof MethodOf<K>, 'kind'> & string;
  readonly label: string;
  readonly choices: readonly { readonly value: boolean | number | string; readonly label: string }[];
  readonly help: string;
  /** As for NumericParam: the value used when a method object leaves this out. */
  readonly omitted?: boolean | number | string;
  /** As for NumericParam: whether this setting takes part under the others. */
  readonly activeWhen?: (method: MethodOf<K>) => boolean;
  /**
   * 'switch': a yes/no setting shown as one checkbox labelled `label`
   * (choices must be true and false). Absent: one option per choice.
   */
  readonly display?: 'switch';
}

/**
 * Units of method parameters. 'mm/h' rates, 'mm' depths, '1/h' decay constants,
 * '-' dimensionless ratios and indices.
 */
export type ParamUnit = 'mm/h' | 'mm' | '1/h' | '-';

/**
 * Writes loss and excess of every bar into the output arrays. Inputs are
 * already validated (clean SI data); must keep 0 ≤ loss ≤ rain, loss + excess = rain.
 */
export type ComputeFn<K extends LossKind> = (
  durationsH: ArrayLike<number>,
  depthsMm: ArrayLike<number>,
  method: MethodOf<K>,
  lossOut: Float64Array,
  excessOut: Float64Array,
) => void | BarTotals;

/**
 * Totals a compute may return when it has summed them in its own loop (one
 * pass instead of two on long storms); otherwise they are summed afterwards.
 */
export interface BarTotals {
  readonly rainMm: number;
  readonly totalLossMm: number;
  readonly totalExcessMm: number;
  readonly peakExcessMmH: number;
}

/**
 * A compute that checks each bar as it reads it, by storm.ts's isCleanBar (the
 * rule validateStorm enforces; a pass that sums durations and depths may test
 * isCleanBarBelowSums per bar and summedBarsClean on the sums, which together
 * say the same), so the public computeLosses reads the storm once instead of
 * twice. The method is already valid; the storm's lists are there and of
 * equal length. Returns the totals, or null when a bar fails (the output
 * arrays then hold a partial pass: the caller discards them, validates and
 * throws the error that names the first bad bar).
 */
export type CheckedComputeFn<K extends LossKind> = (
  durationsH: ArrayLike<number>,
  depthsMm: ArrayLike<number>,
  method: MethodOf<K>,
  lossOut: Float64Array,
  excessOut: Float64Array,
) => BarTotals | null;

/** Total excess of a clean storm, mm, with no per-bar output. */
export type TotalExcessFn<K extends LossKind> = (
  durationsH: ArrayLike<number>,
  depthsMm: ArrayLike<number>,
  method: MethodOf<K>,
) => number;

/** Everything the core and the UI need to know about one loss method. */
export interface MethodSpec<K extends LossKind = LossKind> {
  readonly kind: K;
  readonly label: string;
  readonly summary: string;
  /** The published source of the equations. */
  readonly source: string;
  readonly params: readonly NumericParam<K>[];
  readonly choices?: readonly ChoiceParam<K>[];
  readonly defaults: MethodOf<K>;
  /** What happens in a bar with no rain under these settings, in a plain sentence or two. */
  readonly dryBars: (method: MethodOf<K>) => string;
  readonly compute: ComputeFn<K>;
  /**
   * Optional: `compute` with the bar checks in the same loop (see
   * CheckedComputeFn), for methods whose pass is cheap enough that a separate
   * validation pass would cost as much as the computation.
   */
  readonly checkedCompute?: CheckedComputeFn<K>;
  /** Cross-parameter checks beyond each parameter's own range (throws InputError). */
  readonly validateExtra?: (method: MethodOf<K>) => void;
  /**
   * Optional: total excess without writing per-bar arrays, for calibration's
   * many evaluations. Must equal the sum of `compute`'s excess (a property
   * test in test/core/loss/total-excess.test.ts holds every method to it).
   */
  readonly totalExcess?: TotalExcessFn<K>;
  /**
   * Optional: the infiltration capacity through the storm, for methods whose
   * loss follows a capacity curve. See CapacityFn. Screens draw it as a curve
   * over the bars.
   */
  readonly capacity?: CapacityFn<K>;
  /**
   * Optional: the parameter that is a constant loss rate, mm/h, for methods
   * whose loss is capped at one. Screens draw it as a line across the bars
   * that the user drags.
   */
  readonly rateParam?: NumericParam<K>['key'];
  /** Optional: a part of the loss the same method computes alone. See LossPart. */
  readonly lossPart?: LossPart<K>;
  /**
   * Optional: the soil values can be set from a texture of the published soil
   * table (soils.ts, `greenAmptForTexture`), keeping the recovery switch as it
   * is; screens offer the textures beside the parameters. Only a method whose
   * type is Green–Ampt's may say so: the table gives its K, ψ and Δθ
   * (checked kind by kind, so the spec of any method may hold it).
   */
  readonly soilPresets?: K extends LossKind ? (MethodOf<K> extends GreenAmptLoss ? true : never) : never;
}

/**
 * A part of the loss that a variant of the same method computes on its own,
 * bar by bar, and screens shade apart: for initial–continuing loss, the same
 * method with no continuing rate loses exactly the initial loss.
 */
export interface LossPart<K extends LossKind> {
  readonly label: string;
  readonly variant: (method: MethodOf<K>) => MethodOf<K>;
}

/** A value a method holds: a number for a parameter, a switch or choice for a setting. */
export type MethodValue = number | boolean | string;

/**
 * Infiltration capacity, mm/h, at each of `timesH` (hours from the storm
 * start, non-decreasing, within the storm), written to `out`: the state the
 * method has reached at that moment, read as a rate. Inputs are clean.
 * Infinity where the capacity is unbounded (Green–Ampt on dry soil).
 */
export type CapacityFn<K extends LossKind> = (
  durationsH: ArrayLike<number>,
  depthsMm: ArrayLike<number>,
  method: MethodOf<K>,
  timesH: ArrayLike<number>,
  out: Float64Array,
) => void;
