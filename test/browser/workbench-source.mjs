// Loads the project's own TypeScript modules (the core, the screen's number
// format) into Node through Vite, so browser specs check what the page shows
// against the core computing the same thing — never against copied numbers.
import { createServer } from 'vite';
import { resolve } from 'node:path';

const ROOT = resolve(import.meta.dirname, '../..');

export async function loadSource() {
  const server = await createServer({
    root: ROOT,
    configFile: false,
    logLevel: 'error',
    appType: 'custom',
    server: { middlewareMode: true, hmr: false, ws: false },
    optimizeDeps: { noDiscovery: true, include: [] },
  });
  const core = await server.ssrLoadModule('/src/core/index.ts');
  const format = await server.ssrLoadModule('/src/ui/format.ts');
  return { core, format, close: () => server.close() };
}
