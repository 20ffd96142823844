/**
 * At most one update per animation frame, without waiting for the frame when
 * there is no need to. The first value pushed between two frames is applied
 * at once (so a pointer move shows in the frame it arrives for, not one
 * later); further values until the next frame wait, and only the latest is
 * kept. A frame that closes with a value still waiting and nothing applied
 * since the last frame applies it then. Frames are counted by a
 * requestAnimationFrame ticker that runs from the first push until flush or
 * cancel (the end of a drag).
 */
export interface FrameThrottle<T> {
  push(value: T): void;
  /** Applies a waiting value now and stops the ticker (on release: the last position is never dropped). */
  flush(): void;
  /** Drops a waiting value and stops the ticker. */
  cancel(): void;
}

export function frameThrottle<T>(
  apply: (value: T) => void,
  request: (cb: () => void) => number = (cb) => requestAnimationFrame(cb),
  cancelRequest: (id: number) => void = (id) => cancelAnimationFrame(id),
): FrameThrottle<T> {
  let waiting: { value: T } | null = null;
  let frame = 0;
  let appliedInFrame = -1;
  let ticker: number | null = null;

  const tick = (): void => {
    if (waiting && appliedInFrame !== frame) {
      const w = waiting;
      waiting = null;
      apply(w.value);
    }
    frame++;
    ticker = request(tick);
  };
  const stop = (): void => {
    if (ticker !== null) cancelRequest(ticker);
    ticker = null;
  };

  return {
    push(value) {
      if (ticker === null) ticker = request(tick);
      if (appliedInFrame !== frame) {
        waiting = null;
        appliedInFrame = frame;
        apply(value);
      } else {
        waiting = { value };
      }
    },
    flush() {
      stop();
      const w = waiting;
      waiting = null;
      if (w) apply(w.value);
    },
    cancel() {
      stop();
      waiting = null;
    },
  };
}
