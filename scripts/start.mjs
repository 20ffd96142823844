// `npm start`: installs dependencies when missing, then serves the workbench
// on http://localhost:5173/ with the invented demo scenario (shown whenever
// the browser has no saved scenario of its own; `#demo` reopens it).
import { ensureNodeModules, run } from './ensure.mjs';

ensureNodeModules();
console.log('raincut: starting the workbench at http://localhost:5173/ (Ctrl+C stops it)');
process.exit(run('npx', ['vite', '--port', '5173', '--strictPort', ...process.argv.slice(2)]));
