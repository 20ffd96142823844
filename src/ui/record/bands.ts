import type { RecordEvent, Storm } from '../../core';

/** Start of each bar and the record's end, h from the record start (n + 1 values, one pass). */
export function barStartsH(storm: Storm): Float64Array {
  const n = storm.depthsMm.length;
  const starts = new Float64Array(n + 1);
  let t = 0;
  for (let k = 0; k < n; k++) {
    starts[k] = t;
    t += storm.durationsH[k] as number;
  }
  starts[n] = t;
  return starts;
}

/**
 * One SVG path of bands over the events, `xOf` placing hours in px. Bands
 * that would touch or overlap on screen are merged, so a record with
 * thousands of events draws at most one band per pixel column; each band is
 * at least `minPx` wide so a short event stays visible.
 */
export function eventBandsPath(
  events: readonly RecordEvent[],
  startsH: Float64Array,
  xOf: (h: number) => number,
  top: number,
  bottom: number,
  minPx = 2,
): string {
  const parts: string[] = [];
  let x0 = Number.NaN;
  let x1 = Number.NaN;
  const flush = (): void => {
    if (Number.isNaN(x0)) return;
    parts.push(`M${x0.toFixed(1)},${top}H${x1.toFixed(1)}V${bottom}H${x0.toFixed(1)}Z`);
  };
  for (const e of events) {
    const a = xOf(startsH[e.firstBar] as number);
    const b = Math.max(a + minPx, xOf(startsH[e.lastBar + 1] as number));
    if (!Number.isNaN(x0) && a <= x1 + 1) {
      if (b > x1) x1 = b;
      continue;
    }
    flush();
    x0 = a;
    x1 = b;
  }
  flush();
  return parts.join('');
}
