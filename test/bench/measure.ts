// A small benchmark kit: runs a function repeatedly after warm-up and reports
// the median and the 95th percentile wall time. Benchmarks print figures and
// compare them with targets; they are never part of `npm test` and never fail
// a build on timing (machines differ). Run with `npm run bench`.

export interface Measurement {
  readonly group: string;
  readonly name: string;
  readonly bars: number;
  readonly medianMs: number;
  readonly p95Ms: number;
  readonly samples: number;
  readonly targetMs?: number;
}

const results: Measurement[] = [];

export interface MeasureOptions {
  readonly bars: number;
  readonly targetMs?: number;
  /** Minimum samples (default 15) and a time budget for sampling (default 1500 ms). */
  readonly samples?: number;
  readonly budgetMs?: number;
}

export function measure(group: string, name: string, fn: () => unknown, options: MeasureOptions): Measurement {
  const minSamples = options.samples ?? 15;
  const budget = options.budgetMs ?? 1500;
  let sink = 0;
  for (let w = 0; w < 3; w++) sink += Number(Boolean(fn()));
  const times: number[] = [];
  const start = performance.now();
  while (times.length < minSamples || (performance.now() - start < budget && times.length < 500)) {
    const t0 = performance.now();
    sink += Number(Boolean(fn()));
    times.push(performance.now() - t0);
    if (times.length >= minSamples && performance.now() - start > budget * 4) break;
  }
  times.sort((a, b) => a - b);
  const at = (q: number): number => times[Math.min(times.length - 1, Math.floor(q * (times.length - 1)))] as number;
  const m: Measurement = {
    group,
    name,
    bars: options.bars,
    medianMs: at(0.5),
    p95Ms: at(0.95),
    samples: times.length + (sink < 0 ? 1 : 0),
    ...(options.targetMs !== undefined ? { targetMs: options.targetMs } : {}),
  };
  results.push(m);
  return m;
}

const fmt = (ms: number): string => (ms < 1 ? ms.toFixed(3) : ms < 100 ? ms.toFixed(2) : ms.toFixed(0));

/** Prints every measurement so far as a table, with the target and its ratio. */
export function printTable(title: string): void {
  const rows = results.map((r) => [
    r.group,
    r.name,
    r.bars.toLocaleString('en-US'),
    fmt(r.medianMs),
    fmt(r.p95Ms),
    String(r.samples),
    r.targetMs === undefined ? '' : `< ${r.targetMs}`,
    r.targetMs === undefined
      ? ''
      : `${(r.medianMs / r.targetMs).toFixed(2)}${r.medianMs <= r.targetMs ? ' ok' : ' OVER'}`,
  ]);
  const head = ['group', 'case', 'bars', 'median ms', 'p95 ms', 'samples', 'target ms', 'median/target'];
  const widths = head.map((h, c) => Math.max(h.length, ...rows.map((r) => (r[c] as string).length)));
  const line = (cells: string[]): string => cells.map((x, c) => x.padEnd(widths[c] as number)).join('  ');
  console.log(`\n${title}\n${line(head)}\n${widths.map((w) => '-'.repeat(w)).join('  ')}`);
  for (const r of rows) console.log(line(r));
  results.length = 0;
}

/** A deterministic uniform [0, 1) generator (a 32-bit linear congruential one: Numerical Recipes' constants). */
export function seededRandom(seed: number): () => number {
  let s = seed >>> 0 || 1;
  return (): number => {
    s = (Math.imul(s, 1664525) + 1013904223) >>> 0;
    return s / 4294967296;
  };
}

/** Deterministic pseudo-random storm: n bars, durations 5–15 min, gamma-ish depths. */
export function syntheticStorm(n: number, seed = 1): { durationsH: number[]; depthsMm: number[] } {
  const rand = seededRandom(seed);
  // Packed arrays built by push, as the store's arrays are (not holey).
  const durationsH: number[] = [];
  const depthsMm: number[] = [];
  for (let k = 0; k < n; k++) {
    durationsH.push((5 + 10 * rand()) / 60);
    const r = rand();
    depthsMm.push(r < 0.3 ? 0 : -Math.log(rand() + 1e-12) * 2);
  }
  return { durationsH, depthsMm };
}

/**
 * n depths drawn from a gamma distribution (shape ≥ 1, scale in mm), as the
 * numpy peer draws its bars: Marsaglia & Tsang (2000), "A simple method for
 * generating gamma variables", ACM Trans. Math. Softw. 26(3), the squeeze-free
 * form; normals by Box & Muller (1958). A plain array built by push.
 */
export function gammaDepths(n: number, shape: number, scale: number, seed = 1): number[] {
  const rand = seededRandom(seed);
  const d = shape - 1 / 3;
  const c = 1 / Math.sqrt(9 * d);
  const depths: number[] = [];
  while (depths.length < n) {
    // 1 − u lies in (0, 1], so the logarithms stay finite.
    const x = Math.sqrt(-2 * Math.log(1 - rand())) * Math.cos(2 * Math.PI * rand());
    const root = 1 + c * x;
    if (root <= 0) continue;
    const v = root * root * root;
    if (Math.log(1 - rand()) < 0.5 * x * x + d - d * v + d * Math.log(v)) depths.push(d * v * scale);
  }
  return depths;
}
