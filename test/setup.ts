// Shared test setup. DOM matchers are only loaded where a DOM exists
// (component tests opt in with `// @vitest-environment jsdom`).
import fc from 'fast-check';
import { afterEach } from 'vitest';

// Property tests draw a fresh random seed on every local run, so they keep
// looking for new counterexamples. .ci/run pins the seed explicitly with
// FC_SEED (and CI=true without it falls back to the same seed), so a landing
// is judged on a reproducible run; a failure prints the seed and the
// counterexample either way. FC_SEED=… npm test replays a seed locally.
const pinned = process.env.FC_SEED ?? (process.env.CI ? '20261201' : undefined);
if (pinned !== undefined) {
  const seed = Number(pinned);
  if (!Number.isSafeInteger(seed)) throw new Error(`FC_SEED must be an integer seed, got "${pinned}".`);
  fc.configureGlobal({ seed });
}

// Share links unpack with a decompressor the app fetches only when a link is opened (src/scenario/link.ts);
// tests open links throughout, so it is loaded once here.
await (await import('../src/scenario/link')).loadLinkReader();

if (typeof document !== 'undefined') {
  await import('@testing-library/jest-dom/vitest');
  const { cleanup } = await import('@testing-library/react');
  afterEach(() => cleanup());
}
