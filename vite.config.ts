/// <reference types="vitest/config" />
import { defineConfig, type Plugin } from 'vite';
import react from '@vitejs/plugin-react';
import { offlineApp } from './build/offline-app.ts';

/**
 * The Content-Security-Policy of the built app, as a meta tag (the app is
 * static files, often served where headers cannot be set). Only scripts and
 * styles from the app's own origin run: no inline script, no eval, no
 * plugins, no <base>, no form posts. Images: our own, plus `blob:` for the
 * PNG export, which draws the chart's SVG from a blob: URL onto a canvas.
 * Downloads are <a download> clicks on blob: URLs, which no fetch directive
 * governs. Workers: our own files only (Vite emits a worker as its own
 * file). `frame-ancestors` cannot be set from a meta tag, so it is not here.
 */
export const CONTENT_SECURITY_POLICY = [
  "default-src 'self'",
  "script-src 'self'",
  "style-src 'self'",
  "img-src 'self' blob:",
  "font-src 'self'",
  "connect-src 'self'",
  "worker-src 'self'",
  "object-src 'none'",
  "base-uri 'none'",
  "form-action 'none'",
].join('; ');

/**
 * Puts the policy first in <head> of the build only: the dev server injects
 * inline scripts for React's fast refresh, which the policy would block.
 */
function contentSecurityPolicy(): Plugin {
  return {
    name: 'raincut-content-security-policy',
    apply: 'build',
    transformIndexHtml: () => [
      {
        tag: 'meta',
        attrs: { 'http-equiv': 'Content-Security-Policy', content: CONTENT_SECURITY_POLICY },
        injectTo: 'head-prepend',
      },
    ],
  };
}

// One config for the app build, the dev server and Vitest. (npm run build:single: vite.single.config.ts.)
export default defineConfig({
  plugins: [
    react(),
    contentSecurityPolicy(),
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
    // No test is timed (speed is for the benchmarks); property tests over storms
    // of hundreds of bars need room on a busy shared machine.
    testTimeout: 30_000,
  },
});
