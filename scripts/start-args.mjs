// The dev server's arguments for `npm start`: port 5173 unless the user chose one (`npm start -- --port N`),
// and never --strictPort, so a port already taken (another workbench, another project) moves the server to
// the next free one instead of stopping it. Vite prints the address it took.

export const DEFAULT_PORT = 5173;

/** vite's arguments for what followed `npm start --`. */
export function viteArgs(userArgs) {
  const chosen = userArgs.some((a) => a === '--port' || a.startsWith('--port='));
  return chosen ? [...userArgs] : ['--port', String(DEFAULT_PORT), ...userArgs];
}

/** The line `npm start` prints before the server starts. */
export function startLine(userArgs) {
  const chosen = userArgs.some((a) => a === '--port' || a.startsWith('--port='));
  return chosen
    ? 'raincut: starting the workbench on the port you chose; the address follows (Ctrl+C stops it)'
    : `raincut: starting the workbench at http://localhost:${DEFAULT_PORT}/, or the next free port if that one is taken ` +
        '(the address follows; choose one with `npm start -- --port N`; Ctrl+C stops it)';
}
