/// <reference types="vitest/config" />
import { defineConfig, type Plugin } from 'vite';
import react from '@vitejs/plugin-react';

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

// One config for the app build, the dev server and Vitest.
export default defineConfig({
  plugins: [react(), contentSecurityPolicy()],
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
