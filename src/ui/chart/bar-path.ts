import { linearMap, type LinearScale } from './linear-px';

/**
 * One SVG path for a whole layer of bars, so a record of 10⁶ bars is one
 * element, not 10⁶. A bar a pixel or wider is its own rectangle (wide ones
 * keep a hairline gap between them). Bars narrower than a pixel are drawn a
 * pixel column at a time: each column as tall as the tallest of the narrow
 * bars that reach into it. That is what the screen shows of them drawn one
 * by one, column for column (test/ui/chart/bar-path.test.ts rasterises both),
 * at one rectangle per column.
 *
 * Which bars fall in which column depends only on the bar edges, so it is
 * worked out once per set of edges (a chart frame) and kept: a drag redraws
 * the loss from the column plan, every bar's top taken once per move.
 */

/**
 * The rectangles a layer is drawn with, in order: rectangle s spans x0[s]
 * to x1[s] and stands as tall as the tallest of bars first[s] to end[s] − 1.
 * A wide bar is a rectangle of its own; a pixel column of narrow bars is one
 * rectangle over the column (a narrow bar across a column's edge is in both).
 */
export interface BarColumns {
  readonly first: readonly number[];
  readonly end: readonly number[];
  readonly x0: readonly number[];
  readonly x1: readonly number[];
}

function planColumns(edgesPx: ArrayLike<number>): BarColumns {
  const plan = { first: [] as number[], end: [] as number[], x0: [] as number[], x1: [] as number[] };
  const add = (first: number, end: number, x0: number, x1: number): void => {
    plan.first.push(first);
    plan.end.push(end);
    plan.x0.push(x0);
    plan.x1.push(x1);
  };
  // The pixel column of narrow bars still open, and its bars; NaN for none.
  let column = NaN;
  let columnFirst = 0;
  let columnEnd = 0;
  const close = (): void => {
    if (!Number.isNaN(column)) add(columnFirst, columnEnd, column, column + 1);
    column = NaN;
  };
  for (let k = 0; k < edgesPx.length - 1; k++) {
    const x0 = edgesPx[k] as number;
    const x1 = edgesPx[k + 1] as number;
    if (x1 - x0 >= 1) {
      close();
      // Bars 6 px wide or more keep a hairline gap on their right.
      add(k, k + 1, x0, x1 - x0 >= 6 ? x1 - 1 : x1);
      continue;
    }
    // The columns c the bar covers some of: c < x1 and c + 1 > x0.
    for (let c = Math.floor(x0); c < x1; c++) {
      if (c !== column) {
        close();
        column = c;
        columnFirst = k;
      }
      columnEnd = k + 1;
    }
  }
  close();
  return plan;
}

const plans = new WeakMap<ArrayLike<number>, BarColumns>();

/**
 * The column plan for `edgesPx` (length n + 1, increasing), kept for as long
 * as the edges array lives: a chart frame's edges are planned once, however
 * many layers and drag moves draw on them.
 */
export function barColumns(edgesPx: ArrayLike<number>): BarColumns {
  let plan = plans.get(edgesPx);
  if (plan === undefined) plans.set(edgesPx, (plan = planColumns(edgesPx)));
  return plan;
}

const r = (v: number): number => Math.round(v * 100) / 100;

/** The path of the plan's rectangles at the given tops (NaN or at/below the baseline: nothing drawn). */
function writePath(plan: BarColumns, topsPx: Float64Array, basePx: number): string {
  const parts: string[] = [];
  const base = r(basePx);
  for (let s = 0; s < plan.first.length; s++) {
    const top = topsPx[s] as number;
    if (top < basePx) parts.push(`M${r(plan.x0[s] as number)},${base}V${r(top)}H${r(plan.x1[s] as number)}V${base}Z`);
  }
  return parts.join('');
}

/**
 * Bars whose tops are given in pixels, one per bar (`topPx`, length n), over
 * edges `edgesPx` (length n + 1, increasing), down to the baseline `basePx`.
 * A bar whose top is at or below the baseline draws nothing.
 */
export function barsPath(edgesPx: ArrayLike<number>, topPx: ArrayLike<number>, basePx: number): string {
  const plan = barColumns(edgesPx);
  const tops = new Float64Array(plan.first.length);
  for (let s = 0; s < plan.first.length; s++) {
    let top = basePx;
    const e = plan.end[s] as number;
    for (let k = plan.first[s] as number; k < e; k++) {
      const t = topPx[k] as number;
      if (t < top) top = t;
    }
    tops[s] = top;
  }
  return writePath(plan, tops, basePx);
}

/**
 * Bars whose height is a depth per bar spread over its duration, the bar's
 * intensity (a hyetograph's defining picture), through the rate scale `y`.
 * Each bar's pixel is the one the scale gives (linear-px.ts writes its
 * arithmetic out), taken in the same pass that finds each column's tallest:
 * no array of 10⁶ pixels is written and read back on every move of a drag.
 */
export function intensityBarsPath(
  edgesPx: ArrayLike<number>,
  depthsMm: ArrayLike<number>,
  durationsH: ArrayLike<number>,
  y: LinearScale,
  basePx: number,
): string {
  const m = linearMap(y);
  if (m === null) {
    const tops = Float64Array.from(depthsMm, (d, k) => y(d / (durationsH[k] as number)) ?? NaN);
    return barsPath(edgesPx, tops, basePx);
  }
  const plan = barColumns(edgesPx);
  const { first, end } = plan;
  const count = first.length;
  const tops = new Float64Array(count);
  const { d0, span, r0, r1 } = m;
  for (let s = 0; s < count; s++) {
    let top = basePx;
    const e = end[s] as number;
    for (let k = first[s] as number; k < e; k++) {
      const t = ((depthsMm[k] as number) / (durationsH[k] as number) - d0) / span;
      const px = r0 * (1 - t) + r1 * t;
      if (px < top) top = px;
    }
    tops[s] = top;
  }
  return writePath(plan, tops, basePx);
}
