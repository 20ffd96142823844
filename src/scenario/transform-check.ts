import {
  TRANSFORM_KINDS,
  TRANSFORMS,
  attempt,
  isTransformKind,
  validateTransform,
  type Transform,
  type TransformKind,
  type TransformParam,
} from '../core';
import type { ReportAt } from './method-check';
import { describeValue } from './problems';

const kindList = (): string => TRANSFORM_KINDS.map((k) => `"${k}"`).join(', ');

/** The most ordinates a pasted unit hydrograph may have (a year of 1-minute ordinates is about half). */
export const MAX_UH_ORDINATES = 1_000_000;

/**
 * Reads a transform (scenario version 5) from untrusted input. Kinds,
 * parameters and bounds come from the core's TRANSFORMS table through
 * `validateTransform`, so a kind added to the core is read without a change
 * here. Returns a clean copy (the kind and its parameters only, ordinates as
 * a plain list) or undefined after reporting the problems found.
 * `storedAs` is set for an entry of `transformMemory`, keyed by kind.
 */
export function readTransform(input: unknown, report: ReportAt, storedAs?: TransformKind): Transform | undefined {
  if (input === null || typeof input !== 'object' || Array.isArray(input)) {
    report(
      [],
      `must be a transform: an object with a "kind" (${kindList()}) and its parameters (got ${describeValue(input)}).`,
    );
    return undefined;
  }
  const raw = input as Readonly<Record<string, unknown>>;
  const own = (key: string): unknown => (Object.hasOwn(raw, key) ? raw[key] : undefined);
  const kind = own('kind');
  if (!isTransformKind(kind)) {
    report(
      ['kind'],
      kind === undefined
        ? `is missing; it names the transform (${kindList()}).`
        : `${describeValue(kind)} is not a transform this version of Raincut knows (${kindList()}).`,
    );
    return undefined;
  }
  if (storedAs !== undefined && kind !== storedAs) {
    report(['kind'], `must be "${storedAs}", the key it is stored under (got "${kind}").`);
    return undefined;
  }
  const params = TRANSFORMS[kind].params as readonly TransformParam[];
  const ordinates = TRANSFORMS[kind].ordinates === true;
  const known = ['kind', ...params.map((p) => p.key), ...(ordinates ? ['ordinatesM3sPerMm'] : [])];
  let ok = true;
  for (const key of Object.keys(raw)) {
    if (!known.includes(key)) {
      report([key], `is not a parameter of the ${TRANSFORMS[kind].label.toLowerCase()}.`);
      ok = false;
    }
  }
  const candidate: Record<string, unknown> = { kind };
  for (const p of params) {
    const v = own(p.key);
    if (v === undefined && p.optional) continue;
    // -0 and 0 are one amount; keep one so that documents compare equal.
    candidate[p.key] = v === 0 ? 0 : v;
  }
  if (ordinates) {
    const list = own('ordinatesM3sPerMm');
    if (!Array.isArray(list)) {
      report(['ordinatesM3sPerMm'], `must be a list of discharges in m³/s per mm (got ${describeValue(list)}).`);
      return undefined;
    }
    if (list.length > MAX_UH_ORDINATES) {
      report(
        ['ordinatesM3sPerMm'],
        `has ${list.length} ordinates; a unit hydrograph holds at most ${MAX_UH_ORDINATES}.`,
      );
      return undefined;
    }
    candidate['ordinatesM3sPerMm'] = list.map((x: unknown) => (x === 0 ? 0 : x));
  }
  if (!ok) return undefined;
  const r = attempt(() => validateTransform(candidate as unknown as Transform));
  if (!r.ok) {
    const keys = r.error.field === 'transform' ? [] : [r.error.field];
    report(r.error.index === undefined ? keys : [...keys, r.error.index], r.error.message);
    return undefined;
  }
  return candidate as unknown as Transform;
}
