/**
 * A streamflow record for one event: sample times (h, strictly increasing,
 * steps may differ) and discharge at each time (m³/s, ≥ 0). Between samples the
 * discharge is taken to vary linearly, which is what the trapezoidal rule assumes.
 */
export interface Hydrograph {
  readonly timesH: ArrayLike<number>;
  readonly dischargeM3s: ArrayLike<number>;
}

/**
 * Constant discharge from the start of rise until the recession falls back to
 * it. `riseIndex` is a 0-based sample index; absent means found automatically.
 */
export interface ConstantBaseflow {
  readonly kind: 'constant';
  readonly riseIndex?: number | undefined;
}

/**
 * Straight line from the start of rise to an end point on the recession.
 * `endTimeH` absent means N = A^0.2 days after the peak (needs the area).
 */
export interface StraightLineBaseflow {
  readonly kind: 'straight-line';
  readonly riseIndex?: number | undefined;
  readonly endTimeH?: number | undefined;
}

/**
 * Lyne & Hollick (1979) one-parameter recursive filter, run in alternating
 * directions. `stepH` absent means α applies per sample, as published.
 */
export interface LyneHollickBaseflow {
  readonly kind: 'lyne-hollick';
  readonly alpha: number;
  readonly passes: number;
  readonly stepH?: number | undefined;
  /** Samples mirrored about each end before filtering (warm-up); absent: none. */
  readonly warmUpSamples?: number | undefined;
}

/**
 * Eckhardt (2005) two-parameter recursive filter. `stepH` absent means the
 * recession constant applies per sample, as published.
 */
export interface EckhardtBaseflow {
  readonly kind: 'eckhardt';
  readonly a: number;
  readonly bfiMax: number;
  readonly stepH?: number | undefined;
  /** Samples mirrored before the first before filtering (warm-up); absent: none. */
  readonly warmUpSamples?: number | undefined;
}

/**
 * Every baseflow separation method the core knows, as a discriminated union on
 * `kind`. Adding one: its interface here, a file in this folder (its
 * separation), its entry in `methods.ts` (the facts) and in `separators.ts`.
 */
export type BaseflowMethod = ConstantBaseflow | StraightLineBaseflow | LyneHollickBaseflow | EckhardtBaseflow;
export type BaseflowKind = BaseflowMethod['kind'];
export type BaseflowMethodOf<K extends BaseflowKind> = Extract<BaseflowMethod, { kind: K }>;

export interface BaseflowOptions {
  /** Catchment area, m². Absent or 0: unknown (no depth; no N = A^0.2 end point). */
  readonly areaM2?: number | undefined;
}

/** Result of separating baseflow from a hydrograph. Volumes are m³. */
export interface BaseflowResult {
  /** Baseflow at each sample, m³/s; 0 ≤ baseflow ≤ discharge. */
  readonly baseflowM3s: Float64Array;
  /** Direct runoff at each sample, m³/s: discharge − baseflow. */
  readonly directM3s: Float64Array;
  /**
   * ∫ (Q − Q_b)⁺ dt over the direct-runoff window, by the trapezoidal rule with
   * exact crossings where the discharge dips below the separation line.
   */
  readonly directVolumeM3: number;
  /** Total volume − direct volume. */
  readonly baseflowVolumeM3: number;
  /** ∫ Q dt over the whole record, trapezoidal rule. */
  readonly totalVolumeM3: number;
  /** Direct volume over the catchment area, mm; undefined without an area. */
  readonly directDepthMm: number | undefined;
  /** Baseflow volume / total volume (0 for a record with no flow). */
  readonly baseflowIndex: number;
  readonly peakM3s: number;
  readonly peakTimeH: number;
  /** Sample of the peak (first one when the peak is repeated). */
  readonly peakIndex: number;
  /**
   * Start of the direct-runoff window (a sample index) and its end (h). For the
   * line methods the start of rise and the end point; for the filters the
   * whole record.
   */
  readonly riseIndex: number;
  readonly endTimeH: number;
  /**
   * A plain sentence when the method did something other than its rule says
   * (an automatic end point that fell after the record, moved to the last
   * sample); absent otherwise. Screens show it beside the results.
   */
  readonly notice?: string;
}

/**
 * What a method hands back: a separation line and the window where it applies.
 * Inside the window the line is linear between samples and ends at
 * (`endTimeH`, `endLineM3s`), which may fall inside a segment; it may exceed
 * the discharge (the volume then counts only the part above it). Outside the
 * window all flow is baseflow.
 */
export interface Separation {
  /** Line value at each sample, m³/s; only samples inside the window are read. */
  readonly lineM3s: Float64Array;
  readonly startIndex: number;
  readonly endTimeH: number;
  readonly endLineM3s: number;
  /** See BaseflowResult.notice. */
  readonly notice?: string;
}

/** Facts about the record a method may need, worked out once. */
export interface SeparationContext {
  readonly peakIndex: number;
  /** m², or undefined when not known. */
  readonly areaM2: number | undefined;
}

/**
 * Runs one method on a validated record (clean SI data, at least two samples)
 * with validated parameters. Throws InputError only for parameters that
 * conflict with this record (an end point past its last sample, …).
 */
export type SeparateFn<K extends BaseflowKind> = (
  timesH: ArrayLike<number>,
  dischargeM3s: ArrayLike<number>,
  method: BaseflowMethodOf<K>,
  context: SeparationContext,
) => Separation;

/** Units of baseflow parameters: hours, a 0-based sample index, a number of samples, dimensionless. */
export type BaseflowParamUnit = 'h' | 'sample' | 'samples' | '-';

/** A numeric parameter of a baseflow method, with its unit, bounds and use. */
export interface BaseflowParam<K extends BaseflowKind = BaseflowKind> {
  readonly key: Exclude<keyof BaseflowMethodOf<K>, 'kind'> & string;
  readonly label: string;
  readonly unit: BaseflowParamUnit;
  readonly min: number;
  readonly max: number;
  /** True when `min` itself is not allowed. */
  readonly minExclusive?: boolean;
  /** True when `max` itself is not allowed. */
  readonly maxExclusive?: boolean;
  readonly integer?: boolean;
  /**
   * May be left out; `auto` says in words what is used instead. Record-dependent
   * bounds (an index past the last sample, a time outside the record) are
   * checked when the method meets the record.
   */
  readonly optional?: { readonly auto: string };
  readonly step: number;
  readonly help: string;
}

/**
 * The end of a line method's window that a screen lets the user drag along
 * the recession: the parameter that holds it (h after the first sample), and
 * the rule used when it is left out, as a time after the peak from the
 * catchment area.
 */
export interface BaseflowEndPoint<K extends BaseflowKind = BaseflowKind> {
  readonly key: BaseflowParam<K>['key'];
  readonly rule: {
    /** What a button that puts the end back to the rule says, e.g. "End at N = A^0.2 days after the peak". */
    readonly action: string;
    /** The rule's symbol for the days it gives, e.g. "N". */
    readonly symbol: string;
    /** The unit of area the rule is stated in (its days are then shown beside the area in that unit). */
    readonly areaUnit: 'mi2' | 'km2';
    /** Days from the peak to the end for a catchment of `areaM2` (m²). */
    readonly daysAfterPeak: (areaM2: number) => number;
  };
}

/**
 * Everything the core and the UI need to know about one baseflow method,
 * declared apart from the code that separates (separators.ts), so the first
 * screen reads these facts without it.
 */
export interface BaseflowMethodSpec<K extends BaseflowKind = BaseflowKind> {
  readonly kind: K;
  readonly label: string;
  readonly summary: string;
  /** The published source of the equations. */
  readonly source: string;
  readonly params: readonly BaseflowParam<K>[];
  readonly defaults: BaseflowMethodOf<K>;
  /**
   * The conventions the results depend on beyond the equations (the start
   * value, clamping, pass directions, padding at the ends), in plain words.
   */
  readonly conventions?: string;
  /** True when these parameters need the catchment area to run. */
  readonly needsArea: (method: BaseflowMethodOf<K>) => boolean;
  /** Optional: the end point screens draw on the hydrograph for the user to drag. See BaseflowEndPoint. */
  readonly endPoint?: BaseflowEndPoint<K>;
}
