/// <reference types="vitest/config" />
import { defineConfig } from 'vite';
import react from '@vitejs/plugin-react';

// One config for the app build, the dev server and Vitest.
export default defineConfig({
  plugins: [react()],
  base: './',
  build: { outDir: 'dist', sourcemap: true },
  test: {
    include: ['test/**/*.test.{ts,tsx}'],
    environment: 'node',
    setupFiles: ['test/setup.ts'],
    // No test is timed (speed is for the benchmarks); property tests over storms
    // of hundreds of bars need room on a busy shared machine.
    testTimeout: 30_000,
  },
});
