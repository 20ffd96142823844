import { useEffect, useMemo, useState } from 'react';
import type { Storm, UnitSystem } from '../../core';
import { chartFrame, type ChartFrame } from './frame';
import type { TimeSpanH } from './time-span';

/** Storms from this many bars get their frame in steps (frame-steps.ts): about 20 ms of one task below it. */
export const STAGED_FROM_BARS = 200_000;

type Inputs = readonly [Storm, number | null, number, UnitSystem, TimeSpanH | undefined];
const same = (a: Inputs, b: Inputs): boolean => a.every((v, i) => v === b[i]);

/**
 * The chart's frame for these inputs. A long storm's frame is worked out in
 * steps after the render that first shows the storm (its code loaded then),
 * and null until it is ready: the chart says it is drawing, and the page
 * answers input meanwhile. The frame is the one chartFrame gives. A width
 * of null (the chart's box not laid out yet) gives no frame and starts none.
 */
export function useChartFrame(
  storm: Storm,
  width: number | null,
  height: number,
  system: UnitSystem,
  span: TimeSpanH | undefined,
): ChartFrame | null {
  const staged = storm.depthsMm.length >= STAGED_FROM_BARS;
  const now = useMemo(
    () => (staged || width === null ? null : chartFrame(storm, width, height, system, span)),
    [staged, storm, width, height, system, span],
  );
  const [ready, setReady] = useState<{ readonly inputs: Inputs; readonly frame: ChartFrame } | null>(null);
  useEffect(() => {
    if (!staged || width === null) return;
    const inputs: Inputs = [storm, width, height, system, span];
    let live = true;
    void import('./frame-steps')
      .then((m) => m.chartFrameInSteps(storm, width, height, system, span, () => live))
      // The steps' code could not be fetched: the frame in one go, as for a short storm.
      .catch(() => chartFrame(storm, width, height, system, span))
      .then((frame) => {
        if (live && frame) setReady({ inputs, frame });
      });
    return () => {
      live = false;
    };
  }, [staged, storm, width, height, system, span]);
  if (!staged) return now;
  return ready && same(ready.inputs, [storm, width, height, system, span]) ? ready.frame : null;
}
