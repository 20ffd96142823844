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
