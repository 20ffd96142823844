import { InputError } from '../errors';
import {
  TRANSFORMS,
  hasOrdinates,
  isTransformKind,
  readTransformValue,
  type OrdinatesTransform,
  type TransformParam,
} from './transforms';
import type { Excess, Transform } from './types';

const isFiniteNumber = (v: unknown): v is number => typeof v === 'number' && Number.isFinite(v);

function describeRange(param: TransformParam): string {
  const low = param.minExclusive ? `greater than ${param.min}` : `at least ${param.min}`;
  return param.max === Infinity ? low : `${low} and at most ${param.max}`;
}

/**
 * Throws an InputError naming the field when a transform's kind is unknown, a
 * parameter is missing, not a finite number or out of range, or a given unit
 * hydrograph's ordinates are not usable (the ordinate is named, 1-based).
 */
export function validateTransform(transform: Transform): void {
  if (!transform || typeof transform !== 'object') throw new InputError('transform', 'No transform was given.');
  if (!isTransformKind(transform.kind)) {
    throw new InputError('kind', `Unknown transform "${String(transform.kind)}".`);
  }
  for (const param of TRANSFORMS[transform.kind].params as readonly TransformParam[]) {
    const v = readTransformValue(transform, param.key);
    if (v === undefined && param.optional) continue;
    const unit = param.unit === 'h' ? ' h' : '';
    if (!isFiniteNumber(v)) {
      throw new InputError(
        param.key,
        `${param.label} must be a finite number${unit ? ` of hours` : ''} (got ${String(v)}).`,
      );
    }
    const tooLow = param.minExclusive ? v <= param.min : v < param.min;
    if (tooLow || v > param.max) {
      throw new InputError(param.key, `${param.label} must be ${describeRange(param)}${unit} (got ${v}).`);
    }
  }
  if (hasOrdinates(transform)) validateOrdinates(transform);
}

function validateOrdinates(uh: OrdinatesTransform): void {
  const u = uh.ordinatesM3sPerMm;
  const field = 'ordinatesM3sPerMm';
  if (!u || typeof u.length !== 'number') throw new InputError(field, 'The unit hydrograph has no list of ordinates.');
  if (u.length < 2) {
    throw new InputError(field, `The unit hydrograph needs at least two ordinates (got ${u.length}).`);
  }
  let any = false;
  for (let i = 0; i < u.length; i++) {
    const v = u[i];
    if (!isFiniteNumber(v) || v < 0) {
      throw new InputError(
        field,
        `Ordinate ${i + 1}: discharge must be a finite number of m³/s per mm, zero or more (got ${String(v)}).`,
        i,
      );
    }
    if (v > 0) any = true;
  }
  if (!any) throw new InputError(field, 'The unit hydrograph has no ordinate above zero.');
  const spanH = (u.length - 1) * uh.stepH;
  if (!(spanH > uh.durationH)) {
    throw new InputError(
      field,
      `The ordinates span ${spanH} h, no longer than the unit excess's duration (${uh.durationH} h); ` +
        'the runoff from an excess lasts longer than the excess.',
    );
  }
}

/** Throws an InputError unless the catchment area is a finite number of m² above zero. */
export function validateAreaM2(areaM2: number): void {
  if (!isFiniteNumber(areaM2) || !(areaM2 > 0)) {
    throw new InputError(
      'areaM2',
      `The catchment area must be a finite number of m² above zero (got ${String(areaM2)}).`,
    );
  }
}

/**
 * Throws an InputError naming the first bad bar: durations finite and above
 * zero, excess finite and zero or more, one excess per duration.
 */
export function validateExcess(excess: Excess): void {
  if (!excess || typeof excess !== 'object') throw new InputError('excess', 'No rainfall excess was given.');
  const { durationsH, excessMm } = excess;
  if (!durationsH || typeof durationsH.length !== 'number') {
    throw new InputError('durationsH', 'The excess has no list of bar durations (durationsH).');
  }
  if (!excessMm || typeof excessMm.length !== 'number') {
    throw new InputError('excessMm', 'The excess has no list of bar depths (excessMm).');
  }
  const n = durationsH.length;
  if (excessMm.length !== n) {
    throw new InputError(
      'excessMm',
      `The excess has ${n} bar durations but ${excessMm.length} excess depths; they must match one to one.`,
    );
  }
  for (let k = 0; k < n; k++) {
    const d = durationsH[k];
    if (!isFiniteNumber(d) || !(d > 0)) {
      throw new InputError(
        'durationsH',
        `Bar ${k + 1}: duration must be a finite number of hours greater than zero (got ${String(d)}).`,
        k,
      );
    }
    const e = excessMm[k];
    if (!isFiniteNumber(e) || !(e >= 0)) {
      throw new InputError(
        'excessMm',
        `Bar ${k + 1}: excess must be a finite number of millimetres, zero or more (got ${String(e)}).`,
        k,
      );
    }
  }
}
