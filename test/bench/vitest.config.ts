import { spawnSync } from 'node:child_process';
import { readFileSync } from 'node:fs';
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

// Which processor runs the bench. Left to the scheduler, about half the
// bench processes on this 2-processor machine ran all their JavaScript
// 1.3–1.6× slower than the rest: the exact φ match read 6.0 ms in one process
// and 9.2–10.3 in the next, bimodal over eight runs, and never slow in six
// runs held on either processor. (Our reading is that the slow ones moved
// between processors and lost their caches; that was not measured.)
// So the bench holds itself and the processes it starts (the forked runner
// and the numpy peer) on one processor, the first it may use, where Linux's
// taskset can say so. RAINCUT_BENCH_CPUS names others ("1", "0,1"), or
// "free" to leave the scheduler to it; peer.bench.ts prints which.
pinProcessors(process.env.RAINCUT_BENCH_CPUS);

function pinProcessors(asked: string | undefined): void {
  if (asked === 'free' || process.platform !== 'linux') {
    process.env.RAINCUT_BENCH_PINNED = 'no (left to the scheduler)';
    return;
  }
  const cpus = asked ?? String(firstAllowedProcessor() ?? 0);
  // -a: every thread of this process; what it starts from now on inherits the set.
  const run = spawnSync('taskset', ['-a', '-p', '-c', cpus, String(process.pid)], { encoding: 'utf8' });
  process.env.RAINCUT_BENCH_PINNED =
    run.status === 0 ? `processor ${cpus}` : `no (taskset: ${run.error?.message ?? run.stderr.trim()})`;
}

/** The lowest processor this process may run on, from /proc (Linux), or null. */
function firstAllowedProcessor(): number | null {
  let status: string;
  try {
    status = readFileSync('/proc/self/status', 'utf8');
  } catch {
    return null;
  }
  const list = /^Cpus_allowed_list:\s*(\d+)/m.exec(status);
  return list ? Number(list[1]) : null;
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
