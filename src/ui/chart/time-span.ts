import { useMemo } from 'react';
import type { Scenario } from '../../scenario/types';
import { totalDurationH, type Storm } from '../../core';
import { useDerived, type Derived } from '../../store';

/**
 * The stretch of time the charts show, in hours from the storm start. The
 * hyetograph alone shows its storm; with a streamflow record lined up
 * beside it, both charts share one axis that holds the storm and the whole
 * record, so a bar and the discharge at the same moment stand one above the
 * other.
 */
export interface TimeSpanH {
  readonly startH: number;
  readonly endH: number;
}

/** The shared span, or undefined when there is no record (the chart then shows the storm alone). */
export function sharedTimeSpanH(
  stormDurationH: number,
  record: { readonly firstH: number; readonly lastH: number } | null,
): TimeSpanH | undefined {
  if (record === null) return undefined;
  const hasStorm = stormDurationH > 0;
  const startH = hasStorm ? Math.min(0, record.firstH) : record.firstH;
  const endH = hasStorm ? Math.max(stormDurationH, record.lastH) : record.lastH;
  return endH > startH ? { startH, endH } : undefined;
}

// The storm's length, once per storm object: not a pass over every bar on each move of a drag.
const hours = new WeakMap<Storm, number>();
export function stormHours(storm: Storm): number {
  let h = hours.get(storm);
  if (h === undefined) hours.set(storm, (h = totalDurationH(storm)));
  return h;
}

function spanOf(d: Derived, s: Scenario): TimeSpanH | undefined {
  const flow = s.streamflow;
  const aligned = d.alignment(s);
  // A computed hydrograph (issue 13) runs on after the storm: the axis holds its recession too. Its end
  // depends on the storm and the unit hydrograph only, so a drag of the loss line leaves the axis put.
  const computedEndH = d.hydrographEndH(s);
  const stormH = stormHours(s.storm);
  if (!flow || !aligned) {
    return computedEndH === null ? undefined : sharedTimeSpanH(stormH, { firstH: 0, lastH: computedEndH });
  }
  const first = (flow.timesH[0] ?? 0) + aligned.offsetH;
  const last = (flow.timesH[flow.timesH.length - 1] ?? first) + aligned.offsetH;
  return sharedTimeSpanH(stormH, { firstH: first, lastH: Math.max(last, computedEndH ?? last) });
}

/** The shared span for the charts on screen (a stable object while its ends stay put). */
export function useTimeSpanH(): TimeSpanH | undefined {
  const startH = useDerived((d, s) => spanOf(d, s)?.startH ?? null);
  const endH = useDerived((d, s) => spanOf(d, s)?.endH ?? null);
  return useMemo(() => (startH === null || endH === null ? undefined : { startH, endH }), [startH, endH]);
}
