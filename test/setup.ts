// Shared test setup. DOM matchers are only loaded where a DOM exists
// (component tests opt in with `// @vitest-environment jsdom`).
import fc from 'fast-check';
import { afterEach } from 'vitest';

// Property tests draw a fresh random seed on every local run, so they keep
// looking for new counterexamples. CI (CI=true) pins the seed, or takes one
// from FC_SEED, so a landing is judged on a reproducible run; a failure prints
// the seed and the counterexample either way.
const pinned = process.env.FC_SEED ?? (process.env.CI ? '20261201' : undefined);
if (pinned !== undefined) fc.configureGlobal({ seed: Number(pinned) });

if (typeof document !== 'undefined') {
  await import('@testing-library/jest-dom/vitest');
  const { cleanup } = await import('@testing-library/react');
  afterEach(() => cleanup());
}
