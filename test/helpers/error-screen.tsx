import { render } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, beforeEach, vi } from 'vitest';
import type { CrashRecovery } from '../../src/store/crash';
import { ErrorBoundary } from '../../src/ui/layout/ErrorBoundary';

/** The drawing that fails in the error-screen tests, always with the same message. */
function Broken(): never {
  throw new Error('bar 3 has no depth');
}

/** The error screen over a drawing that failed, with the page's reload and download as spies. */
/** `recovery` as main.tsx gives it (a loader of the recovery code), or already loaded, or none. */
export function showErrorScreen(recovery: CrashRecovery | (() => Promise<CrashRecovery>) | undefined) {
  const reload = vi.fn();
  const download = vi.fn();
  render(
    <ErrorBoundary {...(recovery ? { recovery } : {})} reload={reload} download={download}>
      <Broken />
    </ErrorBoundary>,
  );
  return { reload, download, user: userEvent.setup() };
}

/** React reports the failed drawing on console.error; the tests of the error screen silence it. */
export function quietConsoleErrors(): void {
  let quiet: ReturnType<typeof vi.spyOn>;
  beforeEach(() => {
    quiet = vi.spyOn(console, 'error').mockImplementation(() => {});
  });
  afterEach(() => quiet.mockRestore());
}
