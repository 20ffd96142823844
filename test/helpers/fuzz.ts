import { expect } from 'vitest';
import { parseScenario, type ScenarioResult } from '../../src/scenario';

/** A small seeded generator (mulberry32), so every fuzz run tries the same inputs. */
export function seeded(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

export const BASE64URL = 'ABCDEFGHIJKLMNOPQRSTUVWXYZabcdefghijklmnopqrstuvwxyz0123456789-_';

/**
 * Runs a reader on one input and checks the contract every reader keeps: it
 * returns (never throws); a refusal carries at least one message, each
 * non-empty and none from the last-resort safety net; an acceptance is a
 * scenario that passes the schema again.
 */
export function expectContract(
  read: (input: string) => ScenarioResult,
  input: string,
  tally: { ok: number; refused: number },
): void {
  let result: ScenarioResult;
  try {
    result = read(input);
  } catch (error) {
    expect.fail(`threw ${String(error)} for input ${JSON.stringify(input.slice(0, 200))}`);
  }
  if (result.ok) {
    tally.ok++;
    if (!parseScenario(result.scenario).ok)
      expect.fail(`accepted an invalid scenario from ${JSON.stringify(input.slice(0, 200))}`);
    return;
  }
  tally.refused++;
  if (result.problems.length === 0) expect.fail(`refused without a message: ${JSON.stringify(input.slice(0, 200))}`);
  for (const p of result.problems) {
    if (typeof p.message !== 'string' || p.message.trim().length < 10 || typeof p.path !== 'string') {
      expect.fail(`refusal without a proper message ${JSON.stringify(p)} for ${JSON.stringify(input.slice(0, 200))}`);
    }
    if (p.message.includes('unexpected error')) {
      expect.fail(`reached the safety net: ${p.message} for ${JSON.stringify(input.slice(0, 200))}`);
    }
  }
}

/**
 * Raw DEFLATE data, made by hand, that expands to `copies × 258 + 1` zero
 * bytes: one fixed-Huffman block (RFC 1951 §3.2.6) with a literal 0 and
 * then `copies` back-references of length 258 at distance 1, 13 bits each.
 * Lets a test build a bomb of any size without compressing that much data.
 */
export function zeroBomb(copies: number): Uint8Array {
  const out = new Uint8Array(Math.ceil((3 + 8 + copies * 13 + 7) / 8) + 1);
  let bit = 0;
  const put = (value: number, count: number): void => {
    // Huffman codes go most significant bit first; header fields least first.
    for (let i = 0; i < count; i++) {
      if ((value >>> i) & 1) out[bit >>> 3] = (out[bit >>> 3] as number) | (1 << (bit & 7));
      bit++;
    }
  };
  const code = (value: number, count: number): void => {
    for (let i = count - 1; i >= 0; i--) put((value >>> i) & 1, 1);
  };
  put(1, 1); // BFINAL
  put(1, 2); // BTYPE = 01, fixed Huffman codes
  code(0x30, 8); // literal 0
  for (let i = 0; i < copies; i++) {
    code(0xc5, 8); // length code 285: 258 bytes
    code(0, 5); // distance code 0: distance 1
  }
  code(0, 7); // end of block (256)
  return out.subarray(0, Math.ceil(bit / 8));
}

export type FieldPath = readonly (string | number)[];

/**
 * Paths to the fields of a JSON document, at every depth: each key of an
 * object, and of a list the list itself and its first and last entries (a
 * storm of 300 bars would otherwise crowd out every other field).
 */
export function fieldPaths(doc: unknown, at: FieldPath = []): FieldPath[] {
  if (Array.isArray(doc)) {
    const ends = doc.length > 1 ? [0, doc.length - 1] : doc.length === 1 ? [0] : [];
    return ends.flatMap((k) => [[...at, k], ...fieldPaths(doc[k], [...at, k])]);
  }
  if (doc !== null && typeof doc === 'object') {
    return Object.entries(doc).flatMap(([key, value]) => [[...at, key], ...fieldPaths(value, [...at, key])]);
  }
  return [];
}

/** A copy of `doc` with the field at `path` set to `value`. */
export function withField(doc: unknown, path: FieldPath, value: unknown): unknown {
  const copy = structuredClone(doc) as Record<string | number, unknown>;
  let node = copy;
  for (const key of path.slice(0, -1)) node = node[key] as Record<string | number, unknown>;
  node[path[path.length - 1] as string | number] = value;
  return copy;
}

/**
 * One path of the document, picked so that each field name is as likely as
 * any other (a list's entries share one name), from a number drawn by the fuzzer.
 */
export function pickFieldPath(doc: unknown, pick: number): FieldPath {
  const byName = new Map<string, FieldPath[]>();
  for (const path of [...fieldPaths(doc), ['extra']]) {
    const name = pathName(path);
    byName.set(name, [...(byName.get(name) ?? []), path]);
  }
  const groups = [...byName.values()];
  const group = groups[pick % groups.length] as FieldPath[];
  return group[Math.floor(pick / groups.length) % group.length] as FieldPath;
}

/** A path's name with list positions as "#": "eventSet.events.#.streamflow". */
export const pathName = (path: FieldPath): string => path.map((k) => (typeof k === 'number' ? '#' : k)).join('.');

/**
 * The field names a fuzzer must reach in a scenario document: every field of
 * the document, of its storm, catchment, observed runoff, streamflow record
 * and event set, and of an event with its own storm, runoff and record.
 */
export const SCENARIO_FIELDS: readonly string[] = [
  ...['version', 'name', 'notes', 'storm', 'catchment', 'units', 'method', 'methodMemory', 'observed'],
  ...['streamflow', 'eventSet'],
  ...['durationsH', 'depthsMm', 'startIso'].map((k) => `storm.${k}`),
  ...['name', 'areaM2'].map((k) => `catchment.${k}`),
  'method.kind',
  ...['as', 'value', 'parameter', 'locked'].map((k) => `observed.${k}`),
  ...['timesH', 'dischargeM3s', 'offsetH', 'baseflow', 'baseflowMemory', 'useAsObserved'].map((k) => `streamflow.${k}`),
  ...['startIso', 'baseflow.kind'].map((k) => `streamflow.${k}`),
  ...['events', 'activeId', 'parameter', 'designPick'].map((k) => `eventSet.${k}`),
  ...['id', 'name', 'storm', 'observed', 'streamflow'].map((k) => `eventSet.events.#.${k}`),
  ...['storm.depthsMm', 'streamflow.timesH', 'streamflow.baseflow'].map((k) => `eventSet.events.#.${k}`),
];
