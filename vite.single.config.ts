// `npm run build:single`: the workbench as one self-contained HTML file, dist-single/raincut.html
// (build/single-file.ts). The served app's config, less its service worker, plus the single-file plugins.
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

export default defineConfig({
  ...served,
  plugins: [...withoutServiceWorker(served.plugins ?? []), ...singleFileBuild()],
});
