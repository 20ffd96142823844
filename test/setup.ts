// Shared test setup. DOM matchers are only loaded where a DOM exists
// (component tests opt in with `// @vitest-environment jsdom`).
import { afterEach } from 'vitest';

if (typeof document !== 'undefined') {
  await import('@testing-library/jest-dom/vitest');
  const { cleanup } = await import('@testing-library/react');
  afterEach(() => cleanup());
}
