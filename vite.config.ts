/// <reference types="vitest/config" />
import { defineConfig } from 'vite';
import react from '@vitejs/plugin-react';
import { offlineApp } from './build/offline-app.ts';

// One config for the app build, the dev server and Vitest. (npm run build:single: vite.single.config.ts.)
export default defineConfig({
  plugins: [
    react(),
    // --- Working with no network (issue 14): the installable app and its service worker (build/offline-app.ts).
    offlineApp(),
  ],
  base: './',
  build: {
    outDir: 'dist',
    sourcemap: true,
    // --- First screen (issue 14): scripts/check-first-screen.mjs reads the manifest to hold the first screen's
    // JavaScript under its budget. Everything the entry imports statically goes into one chunk (it all loads
    // at once anyway, and one chunk compresses better than the several Rolldown would otherwise make); views,
    // dialogs and panels loaded on first use keep chunks of their own.
    manifest: true,
    rolldownOptions: { output: { codeSplitting: { groups: [{ name: 'first-screen', tags: ['$initial'] }] } } },
  },
  test: {
    include: ['test/**/*.test.{ts,tsx}'],
    environment: 'node',
    setupFiles: ['test/setup.ts'],
  },
});
