// `npm run build:single`: the workbench as one self-contained HTML file, dist-single/raincut.html
// (build/single-file.ts). The served app's config, less its service worker, plus the single-file plugins.
import { fileURLToPath } from 'node:url';
import { defineConfig, type Plugin, type PluginOption } from 'vite';
import served from './vite.config.ts';
import { singleFileBuild } from './build/single-file.ts';

/** The served config's plugins, flattened, without vite-plugin-pwa's (singleFileBuild adds it switched off). */
function withoutServiceWorker(options: readonly PluginOption[]): Plugin[] {
  const plugins: Plugin[] = [];
  for (const option of options) {
    if (Array.isArray(option)) plugins.push(...withoutServiceWorker(option));
    else if (option && typeof option === 'object' && 'name' in option && !option.name.startsWith('vite-plugin-pwa')) {
      plugins.push(option);
    }
  }
  return plugins;
}

// The one page has no file beside it to start a worker from: long imports are read on the page instead.
const pageReader = fileURLToPath(new URL('./src/ui/import-kit/start-worker.page.ts', import.meta.url));
// Nor the large store's writer: its records are put from the page.
const pageWriter = fileURLToPath(new URL('./src/store/start-large-writer.page.ts', import.meta.url));
// Nor the scenario reader: scenario files and the large store's records are read on the page.
const pageScenarioReader = fileURLToPath(new URL('./src/store/start-scenario-reader.page.ts', import.meta.url));

export default defineConfig({
  ...served,
  resolve: {
    ...served.resolve,
    alias: [
      { find: /^\.\/start-worker$/, replacement: pageReader },
      { find: /^\.\/start-large-writer$/, replacement: pageWriter },
      { find: /^\.\/start-scenario-reader$/, replacement: pageScenarioReader },
    ],
  },
  plugins: [...withoutServiceWorker(served.plugins ?? []), ...singleFileBuild()],
});
