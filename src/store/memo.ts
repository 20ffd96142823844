/**
 * Remembers the last result of `fn` and returns it again while every
 * dependency is identical (===). The store shares unchanged parts of the
 * document between edits, so identity is the right test and costs nothing.
 */
export function memoLast<D extends readonly unknown[], R>(fn: (...deps: D) => R): (...deps: D) => R {
  let lastDeps: D | null = null;
  let lastResult: R;
  return (...deps: D): R => {
    if (lastDeps !== null && lastDeps.length === deps.length && lastDeps.every((d, i) => d === deps[i])) {
      return lastResult;
    }
    // spread-ok: `deps` is the memoised function's own argument list, a tuple of fixed length.
    lastResult = fn(...deps);
    lastDeps = deps;
    return lastResult;
  };
}
