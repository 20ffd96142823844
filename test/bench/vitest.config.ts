import { defineConfig } from 'vitest/config';

// `npm run bench`: runs the benchmark files one after another in one process
// (no parallel files, so timings do not fight for the two cores).
export default defineConfig({
  test: {
    include: ['test/bench/**/*.bench.ts'],
    fileParallelism: false,
    testTimeout: 600_000,
    hookTimeout: 600_000,
    reporters: ['default'],
    silent: false,
  },
});
