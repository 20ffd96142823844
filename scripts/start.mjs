// `npm start`: installs dependencies when missing, then serves the workbench
// on http://localhost:5173/ (or the next free port; `npm start -- --port N`
// chooses one) with the invented demo scenario (shown whenever the browser
// has no saved scenario of its own; `#demo` reopens it).
import { ensureNodeModules, run } from './ensure.mjs';
import { startLine, viteArgs } from './start-args.mjs';

ensureNodeModules();
const userArgs = process.argv.slice(2);
console.log(startLine(userArgs));
process.exit(run('npx', ['vite', ...viteArgs(userArgs)]));
