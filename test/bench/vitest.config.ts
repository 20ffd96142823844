import { spawnSync } from 'node:child_process';
import { defineConfig } from 'vitest/config';

// How freed memory comes back, for the bench processes (read by glibc, the C
// library of most Linux systems, when a process starts; ignored elsewhere).
// A long storm's results are fresh Float64Arrays, freed only when the garbage
// collector runs; by default glibc hands freed memory back to the system and
// the next call takes every page afresh. On a virtual machine a fresh 4 KB
// page cost about 11 µs here (about 4000 of them, 45 ms, per 10⁶-bar result),
// and whether a call pays it depended on when the collector had last run.
// Kept for reuse instead, memory behaves as numpy's does (its temporaries are
// freed at once and reused), so the figures show computation, not the timing
// of garbage collection. The page faults each repetition takes are printed
// beside the peer figures (test/bench/peer.bench.ts). Set GLIBC_TUNABLES
// yourself to choose otherwise.
process.env.GLIBC_TUNABLES ??= 'glibc.malloc.trim_threshold=1073741824:glibc.malloc.mmap_threshold=33554432';

// Which processors run the bench. Left to the scheduler (the default), about
// half the bench processes on this 2-processor machine ran all their
// JavaScript 1.3–1.6× slower than the rest: the exact φ match read 6.0 ms in
// one process and 9.2–10.3 in the next, bimodal over eight runs, and never
// slow in six runs held on either processor. Held on one processor, though,
// V8's helper threads (garbage collection, compilation) share it with the
// code timed: the passes with recovery, which collect the most, read 25–35 %
// slower (Green–Ampt 87 ms against 69, Horton by compression 64 against 47).
// A page in a browser is never held so, so the default leaves the scheduler
// to it, and RAINCUT_BENCH_CPUS holds the bench, its runner and the numpy
// peer on the processors it names ("0", "1", "0,1") where Linux's taskset
// can, for a steadier ratio to the peer. peer.bench.ts prints which.
// (Our reading is that the slow free processes moved between processors and
// lost their caches; that was not measured.)
pinProcessors(process.env.RAINCUT_BENCH_CPUS);

function pinProcessors(asked: string | undefined): void {
  if (!asked || asked === 'free' || process.platform !== 'linux') {
    process.env.RAINCUT_BENCH_PINNED = 'no, left to the scheduler (RAINCUT_BENCH_CPUS=0 holds it on processor 0)';
    return;
  }
  // -a: every thread of this process; what it starts from now on inherits the set.
  const run = spawnSync('taskset', ['-a', '-p', '-c', asked, String(process.pid)], { encoding: 'utf8' });
  process.env.RAINCUT_BENCH_PINNED =
    run.status === 0 ? `processors ${asked}` : `no (taskset: ${run.error?.message ?? run.stderr.trim()})`;
}

// `npm run bench`: runs the benchmark files one after another in one process
// (no parallel files, so timings do not fight for the two cores). Forked, so
// the setting above reaches the process that runs them.
export default defineConfig({
  test: {
    include: ['test/bench/**/*.bench.ts'],
    pool: 'forks',
    fileParallelism: false,
    testTimeout: 600_000,
    hookTimeout: 600_000,
    reporters: ['default'],
    silent: false,
  },
});
