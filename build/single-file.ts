import { createHash } from 'node:crypto';
import { readFileSync } from 'node:fs';
import { resolve } from 'node:path';
import type { Plugin, PluginOption } from 'vite';
import { viteSingleFile } from 'vite-plugin-singlefile';
import { noServiceWorker } from './offline-app.ts';

export const SINGLE_FILE_DIR = 'dist-single';
export const SINGLE_FILE_NAME = 'raincut.html';

const sha256 = (text: string): string => `'sha256-${createHash('sha256').update(text, 'utf8').digest('base64')}'`;

/** The hashes of every inline <script> or <style> element's text, for the policy. */
function inlineHashes(html: string, tag: 'script' | 'style'): string[] {
  const hashes = new Set<string>();
  for (const m of html.matchAll(new RegExp(`<${tag}\\b[^>]*>([\\s\\S]*?)</${tag}>`, 'gi'))) {
    hashes.add(sha256(m[1] ?? ''));
  }
  return [...hashes];
}

/**
 * The single file's own Content-Security-Policy. Everything is inline, so
 * the policy of the served app (default-src 'self', no inline script) would
 * block it; this one allows exactly the inlined script and style by their
 * SHA-256 hashes and nothing from anywhere else: no network at all, images
 * only from data: and blob: URLs (the inlined icon, the PNG export). Style
 * attributes stay allowed: the chart export writes computed styles into its
 * SVG copy.
 */
export function singleFilePolicy(html: string): string {
  return [
    "default-src 'none'",
    `script-src ${inlineHashes(html, 'script').join(' ')}`,
    `style-src ${inlineHashes(html, 'style').join(' ')}`,
    "style-src-attr 'unsafe-inline'",
    'img-src data: blob:',
    "base-uri 'none'",
    "form-action 'none'",
    "object-src 'none'",
  ].join('; ');
}

const CSP_META = /\s*<meta\b[^>]*http-equiv=["']?content-security-policy["']?[^>]*>/gi;

/**
 * The page of the single-file build: written to dist-single/raincut.html,
 * with no service worker, no public files beside it, the icon inlined, and
 * a policy of its own (singleFilePolicy) in place of the served app's.
 */
function singleFilePage(): Plugin {
  return {
    name: 'raincut:single-file-page',
    apply: 'build',
    enforce: 'post',
    config: () => ({
      publicDir: false,
      build: { outDir: SINGLE_FILE_DIR, emptyOutDir: true, sourcemap: false, manifest: false },
    }),
    transformIndexHtml: {
      order: 'post',
      handler(html) {
        const icon = readFileSync(resolve(import.meta.dirname, '../public/favicon.svg'));
        return (
          html
            // The served app's policy forbids inline script; this page's own is set once everything is inlined.
            .replace(CSP_META, '')
            .replace(
              /<link rel="icon" href="[^"]*favicon\.svg"[^>]*>/,
              `<link rel="icon" href="data:image/svg+xml;base64,${icon.toString('base64')}" type="image/svg+xml" />`,
            )
            // Files beside the page do not travel with a single file.
            .replace(/\s*<link rel="apple-touch-icon"[^>]*>/, '')
        );
      },
    },
    generateBundle: {
      order: 'post',
      handler(_options, bundle) {
        const page = bundle['index.html'];
        if (!page || page.type !== 'asset') throw new Error('single-file build: no index.html to finish');
        const html = String(page.source);
        const leftover = Object.keys(bundle).filter((name) => name !== 'index.html');
        if (leftover.length > 0) {
          throw new Error(`single-file build: not everything was inlined (${leftover.join(', ')})`);
        }
        // First in <head>, so the policy covers every script and style after it.
        const charset = /<meta charset="UTF-8"\s*\/?>/i;
        if (!charset.test(html))
          throw new Error('single-file build: index.html has no <meta charset> to put the policy after');
        const policy = `<meta http-equiv="Content-Security-Policy" content="${singleFilePolicy(html)}" />`;
        delete bundle['index.html'];
        this.emitFile({
          type: 'asset',
          fileName: SINGLE_FILE_NAME,
          source: html.replace(charset, (meta) => `${meta}\n    ${policy}`),
        });
      },
    },
  };
}

/**
 * One self-contained HTML file (npm run build:single → dist-single/raincut.html)
 * that opens from disk (file://) or travels as an attachment: every chunk,
 * the lazily loaded views too, inlined by vite-plugin-singlefile (which turns
 * code splitting off), and no service worker.
 */
export function singleFileBuild(): PluginOption[] {
  return [noServiceWorker(), viteSingleFile(), singleFilePage()];
}
