import { isInputError, isLossKind, validateMethod, validateStorm, type LossMethod } from '../core';
import type { Scenario } from '../scenario/types';

/**
 * Reads a scenario document from untrusted data (the browser's saved copy).
 * Checks every field the store relies on, with the core's own checks for the
 * storm and the methods, and says which field is wrong. Never throws.
 */
export type ReadResult = { readonly ok: true; readonly scenario: Scenario } | { readonly ok: false; readonly message: string };

class Damage extends Error {}

const isObject = (v: unknown): v is Record<string, unknown> => typeof v === 'object' && v !== null && !Array.isArray(v);

function numberList(v: unknown, field: string): number[] {
  if (!Array.isArray(v)) throw new Damage(`${field} is not a list of numbers.`);
  for (let k = 0; k < v.length; k++) {
    if (typeof v[k] !== 'number') throw new Damage(`${field}, bar ${k + 1}: ${JSON.stringify(v[k])} is not a number.`);
  }
  return v as number[];
}

function text(v: unknown, field: string): string {
  if (typeof v !== 'string') throw new Damage(`${field} is not text.`);
  return v;
}

function method(v: unknown, field: string): LossMethod {
  if (!isObject(v)) throw new Damage(`${field} is not a loss method.`);
  try {
    validateMethod(v as unknown as LossMethod);
  } catch (error) {
    if (isInputError(error)) throw new Damage(`${field}: ${error.message}`);
    throw error;
  }
  return v as unknown as LossMethod;
}

function read(value: unknown): Scenario {
  if (!isObject(value)) throw new Damage('The saved data is not a scenario object.');
  if (value.version !== 1) throw new Damage(`Scenario version ${JSON.stringify(value.version)} is not one this version reads (1).`);
  const name = text(value.name, 'name');
  const notes = text(value.notes, 'notes');

  if (!isObject(value.storm)) throw new Damage('storm is missing.');
  const durationsH = numberList(value.storm.durationsH, 'storm.durationsH');
  const depthsMm = numberList(value.storm.depthsMm, 'storm.depthsMm');
  const startIso = value.storm.startIso === undefined ? undefined : text(value.storm.startIso, 'storm.startIso');
  const storm = startIso === undefined ? { durationsH, depthsMm } : { durationsH, depthsMm, startIso };
  try {
    validateStorm(storm);
  } catch (error) {
    if (isInputError(error)) throw new Damage(`storm: ${error.message}`);
    throw error;
  }

  if (!isObject(value.catchment)) throw new Damage('catchment is missing.');
  const catchmentName = text(value.catchment.name, 'catchment.name');
  const areaM2 = value.catchment.areaM2;
  if (typeof areaM2 !== 'number' || !Number.isFinite(areaM2) || areaM2 < 0) {
    throw new Damage(`catchment.areaM2 must be a number of m², zero or more (got ${JSON.stringify(areaM2)}).`);
  }

  if (value.units !== 'si' && value.units !== 'us') throw new Damage(`units must be "si" or "us" (got ${JSON.stringify(value.units)}).`);

  const active = method(value.method, 'method');
  if (!isObject(value.methodMemory)) throw new Damage('methodMemory is not an object.');
  const methodMemory: Scenario['methodMemory'] = {};
  for (const [kind, remembered] of Object.entries(value.methodMemory)) {
    if (!isLossKind(kind)) throw new Damage(`methodMemory names an unknown loss method "${kind}".`);
    const m = method(remembered, `methodMemory.${kind}`);
    if (m.kind !== kind) throw new Damage(`methodMemory.${kind} holds a "${m.kind}" method.`);
    Object.assign(methodMemory, { [kind]: m });
  }

  let observed: Scenario['observed'] = null;
  if (value.observed !== null) {
    const o = value.observed;
    if (!isObject(o)) throw new Damage('observed is neither empty nor an observed runoff.');
    if (o.as !== 'depth' && o.as !== 'volume') throw new Damage(`observed.as must be "depth" or "volume" (got ${JSON.stringify(o.as)}).`);
    if (typeof o.value !== 'number' || !Number.isFinite(o.value) || o.value < 0) {
      throw new Damage(`observed.value must be a number, zero or more (got ${JSON.stringify(o.value)}).`);
    }
    const parameter = text(o.parameter, 'observed.parameter');
    if (typeof o.locked !== 'boolean') throw new Damage('observed.locked must be true or false.');
    observed = { as: o.as, value: o.value, parameter, locked: o.locked };
  }

  return {
    version: 1,
    name,
    notes,
    storm,
    catchment: { name: catchmentName, areaM2 },
    units: value.units,
    method: active,
    methodMemory,
    observed,
  };
}

export function readScenario(value: unknown): ReadResult {
  try {
    return { ok: true, scenario: read(value) };
  } catch (error) {
    if (error instanceof Damage) return { ok: false, message: error.message };
    throw error;
  }
}

/** Parses saved JSON text and reads it as a scenario. */
export function readScenarioJson(json: string): ReadResult {
  let value: unknown;
  try {
    value = JSON.parse(json);
  } catch (error) {
    return { ok: false, message: `The saved text is not valid JSON (${error instanceof Error ? error.message : String(error)}).` };
  }
  return readScenario(value);
}
