/**
 * NRCS dimensionless unit hydrograph (USDA NRCS National Engineering Handbook
 * Part 630, ch. 16): time to peak Tp = D/2 + lag, peak from the peak rate
 * factor (484 in US units by default, giving the published ratio table).
 */
export interface NrcsDimensionlessTransform {
  readonly kind: 'nrcs-dimensionless';
  readonly lagH: number;
  readonly peakRateFactor?: number;
}

/** Nash (1957) cascade of n equal linear reservoirs, each with storage constant k (h). */
export interface NashTransform {
  readonly kind: 'nash';
  readonly n: number;
  readonly kH: number;
}

/** NRCS triangular unit hydrograph (NEH-630 ch. 16): Tp = D/2 + lag, base 8/3·Tp. */
export interface TriangularTransform {
  readonly kind: 'triangular';
  readonly lagH: number;
}

/**
 * A unit hydrograph given by its ordinates: the direct runoff (m³/s) from 1 mm
 * of excess on this catchment spread evenly over `durationH`, sampled every
 * `stepH` from the start of the excess (ordinate 0 at time 0), taken to vary
 * linearly between ordinates.
 */
export interface UnitHydrographTransform {
  readonly kind: 'unit-hydrograph';
  readonly durationH: number;
  readonly stepH: number;
  readonly ordinatesM3sPerMm: ArrayLike<number>;
}

/**
 * Every transform from rainfall excess to direct runoff, as a discriminated
 * union on `kind`. Adding one: its interface here, a file in this folder, one
 * entry in `transforms.ts`.
 */
export type Transform = NrcsDimensionlessTransform | NashTransform | TriangularTransform | UnitHydrographTransform;
export type TransformKind = Transform['kind'];
export type TransformOf<K extends TransformKind> = Extract<Transform, { kind: K }>;

/** Rainfall excess per bar: bar durations (h, > 0) and excess depths (mm, ≥ 0). */
export interface Excess {
  readonly durationsH: ArrayLike<number>;
  readonly excessMm: ArrayLike<number>;
}

/**
 * A computed direct runoff hydrograph. `timesH[i] = i·step` is an instant
 * (h from the storm start) and `dischargeM3s[i]` the discharge at that instant.
 * The first sample is at the storm start and the last one, at zero, after the
 * recession has returned all the excess.
 */
export interface RunoffHydrograph {
  readonly timesH: Float64Array;
  readonly dischargeM3s: Float64Array;
  /** The highest sample, m³/s. */
  readonly peakM3s: number;
  /** The time of that sample (the first one when repeated), h. */
  readonly timeOfPeakH: number;
  /** Σ q·Δt over the samples, m³; equals Σ excess × area. */
  readonly volumeM3: number;
}
