// Renders the app icons' PNG files from their SVG sources in public/icons/
// with Debian's chromium (the browser the tests use; nothing is downloaded).
// The PNGs are committed; run this after changing an SVG:
//   node scripts/make-icons.mjs
import { readFile, writeFile } from 'node:fs/promises';
import { join, resolve } from 'node:path';
import { launchBrowser } from '../test/browser/harness.mjs';

const ICONS = resolve(import.meta.dirname, '../public/icons');

/** PNG file ← SVG source, at a square size in px. */
const RENDERS = [
  { svg: 'raincut.svg', png: 'raincut-192.png', size: 192 },
  { svg: 'raincut.svg', png: 'raincut-512.png', size: 512 },
  { svg: 'raincut-maskable.svg', png: 'raincut-maskable-512.png', size: 512 },
  // Home screens that round the corners themselves take the full-bleed drawing.
  { svg: 'raincut-maskable.svg', png: 'raincut-apple-180.png', size: 180 },
];

const { browser, close } = await launchBrowser();
try {
  for (const { svg, png, size } of RENDERS) {
    const page = await browser.newPage({ viewport: { width: size, height: size } });
    const source = await readFile(join(ICONS, svg), 'utf8');
    const sized = source.replace('<svg ', `<svg width="${size}" height="${size}" `);
    await page.setContent(
      `<!doctype html><style>html,body{margin:0;background:transparent}svg{display:block}</style>${sized}`,
    );
    await writeFile(
      join(ICONS, png),
      await page.screenshot({ omitBackground: true, clip: { x: 0, y: 0, width: size, height: size } }),
    );
    await page.close();
    console.log(`${png} (${size} × ${size}) from ${svg}`);
  }
} finally {
  await close();
}
