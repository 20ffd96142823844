/**
 * Passes at most one value per animation frame to `apply`: the latest one.
 * A drag produces pointer events faster than the screen redraws; only the
 * last position in each frame matters.
 */
export interface FrameThrottle<T> {
  push(value: T): void;
  /** Applies a pending value now (on release), so the last position is never dropped. */
  flush(): void;
  cancel(): void;
}

export function frameThrottle<T>(
  apply: (value: T) => void,
  request: (cb: () => void) => number = (cb) => requestAnimationFrame(cb),
  cancelRequest: (id: number) => void = (id) => cancelAnimationFrame(id),
): FrameThrottle<T> {
  let pending: { value: T } | null = null;
  let id: number | null = null;
  const run = (): void => {
    id = null;
    const p = pending;
    pending = null;
    if (p) apply(p.value);
  };
  return {
    push(value) {
      pending = { value };
      if (id === null) id = request(run);
    },
    flush() {
      if (id !== null) cancelRequest(id);
      run();
    },
    cancel() {
      if (id !== null) cancelRequest(id);
      id = null;
      pending = null;
    },
  };
}
