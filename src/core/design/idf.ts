import { InputError } from '../errors';
import { RATE_UNITS, type RateUnit } from '../units';
import { fmt } from './format';

/**
 * Intensity–duration–frequency (IDF) relations for one return period: the
 * average rainfall intensity i over a storm duration t. Each relation states
 * its own units, so a formula fitted in minutes and in/h is evaluated as
 * published and converted here, once, to the core's hours and mm/h.
 */

/** The duration unit the relation's t is written in. */
export type IdfDurationUnit = 'min' | 'h';

interface IdfUnits {
  /** Unit of t in the formula or of the table's durations. */
  readonly durationUnit: IdfDurationUnit;
  /** Unit of the intensity the formula or table gives. */
  readonly intensityUnit: RateUnit;
}

/**
 * i = a / (t + b)^c. The shifted power form in which fitted IDF curves are
 * commonly reported (common practice). a > 0, b ≥ 0, 0 < c ≤ 1 (and b > 0
 * when c = 1): then the depth D = a·t/(t + b)^c grows with duration at a
 * falling rate (D' ∝ (1 − c)t + b > 0, D'' ∝ −c[(1 − c)t + 2b] < 0), which
 * the alternating block method relies on.
 */
export interface IdfShiftedPower extends IdfUnits {
  readonly kind: 'a/(t+b)^c';
  readonly a: number;
  readonly b: number;
  readonly c: number;
}

/**
 * i = a / (t^c + b). The form Chow, Maidment & Mays (1988) Applied Hydrology,
 * section 14.2, write as i = c / (T_d^e + f) (their c, e, f are our a, c, b;
 * section number from memory); their alternating block Example 14.4.1 uses
 * it. Same bounds as the shifted power form, for the same reason: with
 * u = t^c, D = a·t/(u + b) has D' ∝ (1 − c)u + b > 0 and
 * D'' ∝ −[(1 − c)u + (1 + c)b] < 0.
 */
export interface IdfPowerSum extends IdfUnits {
  readonly kind: 'a/(t^c+b)';
  readonly a: number;
  readonly b: number;
  readonly c: number;
}

/**
 * A table of durations (strictly increasing) and their average intensities
 * (not increasing with duration, and with depth i·t increasing). Between two
 * rows, log i is linear in log t: IDF curves are drawn and read as nearly
 * straight lines on log–log paper, so this is the interpolation a reader of
 * the table would do (common practice). Durations outside the table are
 * refused, never extrapolated.
 */
export interface IdfTable extends IdfUnits {
  readonly kind: 'table';
  readonly durations: ArrayLike<number>;
  readonly intensities: ArrayLike<number>;
}

export type Idf = IdfShiftedPower | IdfPowerSum | IdfTable;
export type IdfKind = Idf['kind'];

export const IDF_KINDS: readonly IdfKind[] = ['a/(t+b)^c', 'a/(t^c+b)', 'table'];

const HOURS_PER_UNIT: Readonly<Record<IdfDurationUnit, number>> = { min: 1 / 60, h: 1 };
const unitLabel = (unit: IdfDurationUnit): string => (unit === 'min' ? 'min' : 'h');

function isFiniteNumber(x: unknown): x is number {
  return typeof x === 'number' && Number.isFinite(x);
}

/**
 * Throws an InputError naming the field (`kind`, `durationUnit`,
 * `intensityUnit`, `a`, `b`, `c`, `durations`, `intensities`, with the row
 * index for a table) when the relation cannot be used.
 */
export function validateIdf(idf: Idf): void {
  if (!idf || typeof idf !== 'object')
    throw new InputError('idf', 'No intensity–duration–frequency relation was given.');
  if (!IDF_KINDS.includes(idf.kind)) {
    throw new InputError(
      'kind',
      `Unknown IDF relation "${String(idf.kind)}"; use ${IDF_KINDS.map((k) => `"${k}"`).join(', ')}.`,
    );
  }
  if (idf.durationUnit !== 'min' && idf.durationUnit !== 'h') {
    throw new InputError(
      'durationUnit',
      `The IDF duration unit must be "min" or "h" (got ${JSON.stringify(idf.durationUnit)}).`,
    );
  }
  if (!Object.prototype.hasOwnProperty.call(RATE_UNITS, idf.intensityUnit)) {
    throw new InputError(
      'intensityUnit',
      `The IDF intensity unit must be "mm/h" or "in/h" (got ${JSON.stringify(idf.intensityUnit)}).`,
    );
  }
  if (idf.kind === 'table') validateTable(idf);
  else validateFormula(idf);
}

function validateFormula(idf: IdfShiftedPower | IdfPowerSum): void {
  const { a, b, c } = idf;
  if (!isFiniteNumber(a) || !(a > 0)) {
    throw new InputError('a', `The IDF coefficient a must be a finite number greater than 0 (got ${String(a)}).`);
  }
  if (!isFiniteNumber(b) || !(b >= 0)) {
    throw new InputError('b', `The IDF coefficient b must be a finite number, 0 or more (got ${String(b)}).`);
  }
  if (!isFiniteNumber(c) || !(c > 0) || c > 1) {
    throw new InputError(
      'c',
      `The IDF exponent c must be greater than 0 and at most 1 (got ${String(c)}); above 1 the rainfall depth would fall as the duration grows.`,
    );
  }
  if (c === 1 && b === 0) {
    throw new InputError(
      'b',
      'With c = 1 and b = 0 every duration has the same rainfall depth; b must be greater than 0 when c is 1.',
    );
  }
}

function validateTable(idf: IdfTable): void {
  const { durations: t, intensities: i } = idf;
  if (!t || typeof t.length !== 'number') throw new InputError('durations', 'The IDF table has no list of durations.');
  if (!i || typeof i.length !== 'number')
    throw new InputError('intensities', 'The IDF table has no list of intensities.');
  if (t.length < 2) {
    throw new InputError(
      'durations',
      `The IDF table needs at least two durations to interpolate between (got ${t.length}).`,
    );
  }
  if (i.length !== t.length) {
    throw new InputError(
      'intensities',
      `The IDF table has ${t.length} durations but ${i.length} intensities; they must match one to one.`,
    );
  }
  const unit = unitLabel(idf.durationUnit);
  for (let k = 0; k < t.length; k++) {
    const tk = t[k];
    const ik = i[k];
    if (!isFiniteNumber(tk) || !(tk > 0)) {
      throw new InputError(
        'durations',
        `IDF row ${k + 1}: the duration must be a finite number of ${unit} greater than 0 (got ${String(tk)}).`,
        k,
      );
    }
    if (!isFiniteNumber(ik) || !(ik > 0)) {
      throw new InputError(
        'intensities',
        `IDF row ${k + 1}: the intensity must be a finite number of ${idf.intensityUnit} greater than 0 (got ${String(ik)}).`,
        k,
      );
    }
    if (k === 0) continue;
    const tPrev = t[k - 1] as number;
    const iPrev = i[k - 1] as number;
    if (!(tk > tPrev)) {
      throw new InputError(
        'durations',
        `IDF row ${k + 1}: durations must increase down the table (${fmt(tk)} ${unit} follows ${fmt(tPrev)} ${unit}).`,
        k,
      );
    }
    if (ik > iPrev) {
      throw new InputError(
        'intensities',
        `IDF row ${k + 1}: the intensity for ${fmt(tk)} ${unit} (${fmt(ik)} ${idf.intensityUnit}) is higher than for the shorter ${fmt(tPrev)} ${unit} (${fmt(iPrev)}); average intensity must not rise with duration.`,
        k,
      );
    }
    if (!(ik * tk > iPrev * tPrev)) {
      throw new InputError(
        'intensities',
        `IDF row ${k + 1}: the rainfall depth for ${fmt(tk)} ${unit} (intensity × duration) is not more than for ${fmt(tPrev)} ${unit}; depth must grow with duration.`,
        k,
      );
    }
  }
}

/** Durations (h) over which a relation may be evaluated: formulas everywhere above 0, tables over their rows. */
export function idfRangeH(idf: Idf): { readonly minH: number; readonly maxH: number } {
  if (idf.kind !== 'table') return { minH: 0, maxH: Infinity };
  const toH = HOURS_PER_UNIT[idf.durationUnit];
  return { minH: (idf.durations[0] as number) * toH, maxH: (idf.durations[idf.durations.length - 1] as number) * toH };
}

// Durations computed as j·step in hours and converted back to the table's
// unit carry rounding of a few ulps; a duration this close to the table's
// end is the end, not an extrapolation.
const RANGE_REL_TOL = 1e-9;

/** True when `durationH` lies within the relation's range (to rounding). */
export function idfCovers(idf: Idf, durationH: number): boolean {
  const { minH, maxH } = idfRangeH(idf);
  return durationH >= minH * (1 - RANGE_REL_TOL) && durationH <= maxH * (1 + RANGE_REL_TOL);
}

/**
 * An evaluator of average intensity (mm/h) from duration (h), for a relation
 * already validated and durations already checked against `idfCovers`.
 * Built once so that loops do not repeat unit conversion or table set-up.
 */
export function idfIntensityEvaluator(idf: Idf): (durationH: number) => number {
  const toMmH = RATE_UNITS[idf.intensityUnit];
  const perH = 1 / HOURS_PER_UNIT[idf.durationUnit]; // duration unit per hour
  switch (idf.kind) {
    case 'a/(t+b)^c': {
      const { a, b, c } = idf;
      return (durationH) => (a / Math.pow(durationH * perH + b, c)) * toMmH;
    }
    case 'a/(t^c+b)': {
      const { a, b, c } = idf;
      return (durationH) => (a / (Math.pow(durationH * perH, c) + b)) * toMmH;
    }
    case 'table':
      return tableEvaluator(idf, perH, toMmH);
  }
}

function tableEvaluator(idf: IdfTable, perH: number, toMmH: number): (durationH: number) => number {
  const n = idf.durations.length;
  const logT = new Float64Array(n);
  const logI = new Float64Array(n);
  for (let k = 0; k < n; k++) {
    logT[k] = Math.log(idf.durations[k] as number);
    logI[k] = Math.log(idf.intensities[k] as number);
  }
  const first = idf.durations[0] as number;
  const last = idf.durations[n - 1] as number;
  return (durationH) => {
    const t = durationH * perH;
    // Within rounding of either end: the end row itself.
    if (t <= first) return (idf.intensities[0] as number) * toMmH;
    if (t >= last) return (idf.intensities[n - 1] as number) * toMmH;
    const lt = Math.log(t);
    let k = 0;
    while (k < n - 2 && lt >= (logT[k + 1] as number)) k++;
    // A duration that is a row's to rounding (40/60 h → 39.999… min) gets
    // that row's intensity exactly, as a reader of the table would.
    if (Math.abs(t - (idf.durations[k] as number)) <= RANGE_REL_TOL * t) return (idf.intensities[k] as number) * toMmH;
    if (Math.abs(t - (idf.durations[k + 1] as number)) <= RANGE_REL_TOL * t) {
      return (idf.intensities[k + 1] as number) * toMmH;
    }
    const t0 = logT[k] as number;
    const i0 = logI[k] as number;
    // Straight line in log–log between rows k and k + 1: log i = log i_k + m (log t − log t_k).
    const m = ((logI[k + 1] as number) - i0) / ((logT[k + 1] as number) - t0);
    return Math.exp(i0 + m * (lt - t0)) * toMmH;
  };
}

function checkDuration(idf: Idf, durationH: number): void {
  if (!isFiniteNumber(durationH) || !(durationH > 0)) {
    throw new InputError(
      'durationH',
      `The duration must be a finite number of hours greater than 0 (got ${String(durationH)}).`,
    );
  }
  if (idf.kind === 'table' && !idfCovers(idf, durationH)) {
    throw new InputError('durationH', outsideTableMessage(idf, durationH));
  }
}

/** Why a table cannot give a duration; shared with the design storm builders. */
export function outsideTableMessage(idf: IdfTable, durationH: number): string {
  const unit = unitLabel(idf.durationUnit);
  const t = durationH / HOURS_PER_UNIT[idf.durationUnit];
  const first = idf.durations[0] as number;
  const last = idf.durations[idf.durations.length - 1] as number;
  return (
    `The IDF table covers durations from ${fmt(first)} to ${fmt(last)} ${unit}; ${fmt(t)} ${unit} is outside it. ` +
    'The table is not extrapolated: add a row for that duration or stay within the table.'
  );
}

/** Average intensity, mm/h, for a storm duration in hours. Validates; throws InputError. */
export function idfIntensityMmH(idf: Idf, durationH: number): number {
  validateIdf(idf);
  checkDuration(idf, durationH);
  return idfIntensityEvaluator(idf)(durationH);
}

/** Rainfall depth, mm, for a storm duration in hours: intensity × duration. Validates; throws InputError. */
export function idfDepthMm(idf: Idf, durationH: number): number {
  return idfIntensityMmH(idf, durationH) * durationH;
}
