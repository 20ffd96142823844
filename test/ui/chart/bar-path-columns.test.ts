import { scaleLinear } from 'd3-scale';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { barColumns, barsPath, intensityBarsPath } from '../../../src/ui/chart/bar-path';
import { seeded } from '../../helpers/fuzz';

// The chart draws bars narrower than a pixel a pixel column at a time (bar-path.ts). Here that drawing is held
// to the full one: every bar its own rectangle (a bar a pixel or wider as the chart writes it, to 0.01 px and
// with its hairline gap from 6 px; a narrower one at its exact position), both rasterised per pixel column as
// the tallest shape that covers some of the column. Every column must come out the same, to the 0.01 px the
// path is written in. The storms are invented (fast-check draws them, plus hand-made edge cases).

const r = (v: number): number => Math.round(v * 100) / 100;

interface Rect {
  x0: number;
  x1: number;
  top: number;
}

/** Column tops (px; the baseline where nothing is drawn) of rectangles over columns 0 … width − 1. */
function rasterise(rects: readonly Rect[], width: number, basePx: number): number[] {
  const tops = new Array<number>(width).fill(basePx);
  for (const { x0, x1, top } of rects) {
    if (!(top < basePx) || !(x1 > x0)) continue;
    for (let c = Math.max(0, Math.floor(x0)); c < Math.min(width, Math.ceil(x1)); c++) {
      if (x0 < c + 1 && x1 > c && top < (tops[c] as number)) tops[c] = top;
    }
  }
  return tops;
}

/** The full drawing: one rectangle per bar, tops through the d3 scale itself. */
function fullDrawing(edges: ArrayLike<number>, valuesPx: ArrayLike<number>): Rect[] {
  const rects: Rect[] = [];
  for (let k = 0; k < valuesPx.length; k++) {
    const x0 = edges[k] as number;
    const x1 = edges[k + 1] as number;
    const w = x1 - x0;
    const top = valuesPx[k] as number;
    rects.push(w >= 1 ? { x0: r(x0), x1: r(w >= 6 ? x1 - 1 : x1), top } : { x0, x1, top });
  }
  return rects;
}

/** The rectangles a path of the chart's (M x,base V top H x1 V base Z …) draws. */
function parsePath(d: string, basePx: number): Rect[] {
  const rects: Rect[] = [];
  const re = /M(-?[\d.]+),(-?[\d.]+)V(-?[\d.]+)H(-?[\d.]+)V(-?[\d.]+)Z/gy;
  let m: RegExpExecArray | null;
  let read = 0;
  while ((m = re.exec(d)) !== null) {
    expect(Number(m[2])).toBe(r(basePx));
    rects.push({ x0: Number(m[1]), top: Number(m[3]), x1: Number(m[4]) });
    read = re.lastIndex;
  }
  expect(read).toBe(d.length); // nothing in the path but rectangles
  return rects;
}

/** Asserts the chart's path shows, column for column, what the full drawing shows. */
function expectSameColumns(d: string, edges: ArrayLike<number>, topsPx: ArrayLike<number>, basePx: number): void {
  const width = Math.ceil((edges[edges.length - 1] as number) + 2);
  const full = rasterise(fullDrawing(edges, topsPx), width, basePx).map((t) => (t < basePx ? r(t) : basePx));
  const drawn = rasterise(parsePath(d, basePx), width, basePx).map((t) => (t < basePx ? t : basePx));
  expect(drawn).toEqual(full);
}

/**
 * An invented storm of 0 to 4,000 bars: of one length (5 min, 15 min, 1 h) or of mixed lengths (some long
 * enough to stand a pixel or more wide among narrow ones), a share of them dry, the wet ones up to 40 mm.
 */
const stormArb = fc
  .record({
    n: fc.integer({ min: 0, max: 4000 }),
    seed: fc.integer(),
    step: fc.constantFrom(1 / 12, 0.25, 1, 0),
    dry: fc.double({ min: 0, max: 1, noNaN: true }),
  })
  .map(({ n, seed, step, dry }) => {
    const rnd = seeded(seed);
    const durationsH: number[] = [];
    const depthsMm: number[] = [];
    for (let k = 0; k < n; k++) {
      durationsH.push(step || (rnd() < 0.02 ? 20 + rnd() * 200 : 0.01 + rnd() * 2));
      depthsMm.push(rnd() < dry ? 0 : rnd() * 40);
    }
    return { durationsH, depthsMm };
  });

/** The chart's frame for a storm: x from hours to px over [left, right], y from mm/h to px. */
function layout(storm: { durationsH: number[]; depthsMm: number[] }, left: number, right: number, topMmH: number) {
  const endsH = [0];
  for (const d of storm.durationsH) endsH.push((endsH[endsH.length - 1] as number) + d);
  const x = scaleLinear()
    .domain([0, (endsH[endsH.length - 1] as number) || 1])
    .range([left, right]);
  const y = scaleLinear().domain([0, topMmH]).range([300, 18]);
  return { edges: Float64Array.from(endsH, (h) => x(h)), y, basePx: 300 };
}

const intensitiesPx = (y: (v: number) => number, depths: number[], durations: number[]): number[] =>
  depths.map((d, k) => y(d / (durations[k] as number)));

describe('bars narrower than a pixel, drawn a column at a time', () => {
  it('show in every pixel column what every bar drawn by itself shows (invented storms, widths 40 to 1,400 px)', () => {
    fc.assert(
      fc.property(
        stormArb,
        fc.integer({ min: 40, max: 1400 }),
        fc.double({ min: 0, max: 0.999, noNaN: true }),
        (storm, w, off) => {
          const { edges, y, basePx } = layout(storm, 62 + off, 62 + off + w, 500);
          const d = intensityBarsPath(edges, storm.depthsMm, storm.durationsH, y, basePx);
          expectSameColumns(d, edges, intensitiesPx(y, storm.depthsMm, storm.durationsH), basePx);
        },
      ),
      { numRuns: 60 },
    );
  });

  it('the loss under a constant rate φ, including φ above every bar and φ of zero, shows as its full drawing does', () => {
    fc.assert(
      fc.property(
        stormArb,
        fc.integer({ min: 40, max: 1400 }),
        fc.double({ min: 0, max: 60, noNaN: true }),
        (storm, w, phi) => {
          const { edges, y, basePx } = layout(storm, 62, 62 + w, 500);
          // φ-index loss per bar, min(depth, φ·Δt) (Chow, Maidment & Mays 1988, §5.3, from memory).
          const lossMm = storm.depthsMm.map((d, k) => Math.min(d, phi * (storm.durationsH[k] as number)));
          const d = intensityBarsPath(edges, lossMm, storm.durationsH, y, basePx);
          expectSameColumns(d, edges, intensitiesPx(y, lossMm, storm.durationsH), basePx);
        },
      ),
      { numRuns: 40 },
    );
  });

  it('a φ above every bar loses all the rain: the loss path is the rain path', () => {
    const storm = { durationsH: Array.from({ length: 5000 }, () => 1 / 12), depthsMm: [] as number[] };
    for (let k = 0; k < 5000; k++) storm.depthsMm.push(((k * 7919) % 23) / 10); // 0 … 2.2 mm: at most 26.4 mm/h
    const { edges, y, basePx } = layout(storm, 62, 1380, 30);
    const phi = 27; // above the peak, 2.2 mm / (1/12 h) = 26.4 mm/h
    const lossMm = storm.depthsMm.map((d, k) => Math.min(d, phi * (storm.durationsH[k] as number)));
    const rain = intensityBarsPath(edges, storm.depthsMm, storm.durationsH, y, basePx);
    expect(intensityBarsPath(edges, lossMm, storm.durationsH, y, basePx)).toBe(rain);
    expect(rain).not.toBe('');
  });

  it('no bars, or only dry ones, draw nothing', () => {
    const y = scaleLinear().domain([0, 10]).range([300, 18]);
    expect(intensityBarsPath([62], [], [], y, 300)).toBe('');
    const dry = {
      durationsH: Array.from({ length: 4000 }, () => 0.25),
      depthsMm: Array.from({ length: 4000 }, () => 0),
    };
    const { edges } = layout(dry, 62, 1000, 10);
    expect(intensityBarsPath(edges, dry.depthsMm, dry.durationsH, y, 300)).toBe('');
  });

  it('a narrow bar across a column edge lifts both columns it reaches, and no more than its own height', () => {
    const edges = [10, 10.6, 11.4, 12.5, 13.2, 14, 14.3, 14.5, 15.2];
    const tops = [250, 100, 290, 200, 280, 20, 260, 270];
    // Bars by hand: [10, 10.6] narrow, top 250 → column 10; [10.6, 11.4] narrow, 100 → columns 10 and 11;
    // [11.4, 12.5] 1.1 px, drawn by itself at 290; [12.5, 13.2] narrow, 200 → columns 12 and 13; [13.2, 14]
    // narrow, 280 → column 13 only (it ends on 14); [14, 14.3] 20 and [14.3, 14.5] 260 → column 14;
    // [14.5, 15.2] 270 → columns 14 and 15, where column 15 shows it alone at 270, not column 14's 20.
    expect(barsPath(edges, tops, 300)).toBe(
      'M10,300V100H11V300Z' +
        'M11,300V100H12V300Z' +
        'M11.4,300V290H12.5V300Z' +
        'M12,300V200H13V300Z' +
        'M13,300V200H14V300Z' +
        'M14,300V20H15V300Z' +
        'M15,300V270H16V300Z',
    );
    expectSameColumns(barsPath(edges, tops, 300), edges, tops, 300);
  });

  it('works out which bars fall in which column once per set of edges', () => {
    const edges = Float64Array.from({ length: 1001 }, (_, k) => 62 + k * 0.37);
    expect(barColumns(edges)).toBe(barColumns(edges));
    expect(barColumns(Float64Array.from(edges))).not.toBe(barColumns(edges));
  });

  it('10⁶ bars over 1,318 px draw one rectangle per column, each the tallest bar in it', () => {
    const n = 1_000_000;
    const left = 62;
    const width = 1318;
    const edges = Float64Array.from({ length: n + 1 }, (_, k) => left + (k / n) * width);
    const durationsH = new Float64Array(n).fill(1 / 12);
    const depthsMm = new Float64Array(n);
    for (let k = 0; k < n; k++) depthsMm[k] = ((k * 2654435761) % 97) / 10; // invented: 0 … 9.6 mm
    const y = scaleLinear().domain([0, 120]).range([300, 18]);
    const d = intensityBarsPath(edges, depthsMm, durationsH, y, 300);
    expect(parsePath(d, 300).length).toBe(width);
    expectSameColumns(
      d,
      edges,
      Float64Array.from(depthsMm, (v, k) => y(v / (durationsH[k] as number))),
      300,
    );
  });
});
