import { attempt, validateMethod, validateStorm, type InputError, type LossMethod, type Storm } from '../core';

/**
 * The core's checks of a storm and of a loss method, each made once per
 * object. The store's documents share unchanged parts between edits, so a
 * storm or a method checked as it entered the store (an edit, a load) is not
 * checked again by the derived values that read it: a drag of the loss line
 * checks the new method once, in its edit, and the storm not at all. Weakly
 * held: a dropped document takes its entries with it.
 */
const checked = new WeakMap<object, InputError | null>();

function remembered<T extends object>(value: T, check: (v: T) => void): InputError | null {
  let problem = checked.get(value);
  if (problem === undefined) {
    const r = attempt(() => check(value));
    checked.set(value, (problem = r.ok ? null : r.error));
  }
  return problem;
}

/** The core's refusal of this storm (validateStorm), or null when it is clean. */
export function stormProblem(storm: Storm): InputError | null {
  return remembered(storm, validateStorm);
}

/** The core's refusal of this method (validateMethod), or null when it is clean. */
export function methodProblem(method: LossMethod): InputError | null {
  return remembered(method, validateMethod);
}

/** Throws the core's refusal of the method, if any (for edits, which refuse bad input by throwing). */
export function checkMethod(method: LossMethod): void {
  const problem = methodProblem(method);
  if (problem) throw problem;
}

/**
 * Records a storm as clean without reading it again: for the document's own
 * copy of a storm the core has just accepted (an edit copies the bars it was
 * given into plain lists after validateStorm passed them).
 */
export function knownClean<S extends Storm>(copy: S): S {
  checked.set(copy, null);
  return copy;
}
