import type { Scenario } from './types';

/**
 * One thing wrong with an input. `path` names the field in the scenario
 * document ("storm.depthsMm[12]", "method.rateMmH"); it is '' when the input
 * as a whole is wrong (not JSON, a damaged link). `message` is for people and
 * already starts with the path, so it can be shown on its own.
 */
export interface Problem {
  readonly path: string;
  readonly message: string;
}

/** The outcome of reading a scenario from any way in. Never thrown. */
export type ScenarioResult =
  { readonly ok: true; readonly scenario: Scenario } | { readonly ok: false; readonly problems: readonly Problem[] };

/** A key or an index on the way from the document root to a field. */
export type PathKey = string | number;

/** At most this many problems are listed; the rest are counted in one last line. */
export const MAX_LISTED_PROBLEMS = 20;

const IDENTIFIER = /^[A-Za-z_$][A-Za-z0-9_$]*$/;

/** `['storm', 'depthsMm', 12]` → `storm.depthsMm[12]`; odd keys are quoted. */
function formatPath(keys: readonly PathKey[]): string {
  let out = '';
  for (const key of keys) {
    if (typeof key === 'number') out += `[${key}]`;
    else if (IDENTIFIER.test(key)) out += out === '' ? key : `.${key}`;
    else out += `[${JSON.stringify(key)}]`;
  }
  return out;
}

/**
 * Storm bars and streamflow samples are counted from 1 for people and from 0
 * in the path, so a per-bar path also says which bar: "storm.depthsMm[12]
 * (bar 13)", "streamflow.timesH[4] (sample 5)".
 */
function label(keys: readonly PathKey[]): string {
  const path = formatPath(keys);
  const last = keys[keys.length - 1];
  if (keys.length === 3 && keys[0] === 'storm' && typeof last === 'number') return `${path} (bar ${last + 1})`;
  if (keys.length === 3 && keys[0] === 'streamflow' && typeof last === 'number') return `${path} (sample ${last + 1})`;
  // Inside the event set: say which event, counted from 1, and which bar or sample.
  const event = keys[2];
  if (keys[0] === 'eventSet' && keys[1] === 'events' && typeof event === 'number') {
    const inner = label(keys.slice(3));
    const part = / \((bar|sample) (\d+)\)$/.exec(inner);
    return `${path} (event ${event + 1}${part ? `, ${part[1]} ${part[2]}` : ''})`;
  }
  return path;
}

/** A problem at a field: the message is prefixed with where it is. */
export function problemAt(keys: readonly PathKey[], text: string): Problem {
  const path = formatPath(keys);
  return { path, message: path === '' ? text : `${label(keys)}: ${text}` };
}

/** A problem with the input as a whole (path ''). */
export function problem(text: string): Problem {
  return { path: '', message: text };
}

/** A failed result. */
export function failure(problems: readonly Problem[]): { readonly ok: false; readonly problems: readonly Problem[] } {
  if (problems.length === 0) {
    // Every rejection must say why; reaching here means a check forgot to.
    return { ok: false, problems: [problem('The input was refused, but no reason was recorded.')] };
  }
  return { ok: false, problems };
}

/** Long lists are cut to MAX_LISTED_PROBLEMS plus one line that counts the rest. */
export function capProblems(problems: readonly Problem[]): readonly Problem[] {
  if (problems.length <= MAX_LISTED_PROBLEMS) return problems;
  const rest = problems.length - MAX_LISTED_PROBLEMS;
  return [...problems.slice(0, MAX_LISTED_PROBLEMS), problem(`… and ${rest} more problem${rest === 1 ? '' : 's'}.`)];
}

/**
 * A short, safe description of a received value for a message. Never
 * serialises objects or arrays (they may be huge or deeply nested).
 */
export function describeValue(value: unknown): string {
  if (value === undefined) return 'nothing';
  if (value === null) return 'null';
  if (typeof value === 'number') return Object.is(value, -0) ? '-0' : String(value);
  if (typeof value === 'string') {
    const shown = value.length > 40 ? `${value.slice(0, 40)}…` : value;
    return JSON.stringify(shown);
  }
  if (typeof value === 'boolean') return String(value);
  if (Array.isArray(value)) return `a list of ${value.length} item${value.length === 1 ? '' : 's'}`;
  if (typeof value === 'object') return 'an object';
  return `a ${typeof value}`;
}
