import { render, waitFor } from '@testing-library/react';
import { expect } from 'vitest';
import userEvent from '@testing-library/user-event';
import { computeLosses, type LossMethod } from '../../src/core';
import type { Scenario } from '../../src/scenario/types';
import { createWorkbenchStore, type CreateStoreOptions } from '../../src/store';
import { App } from '../../src/ui/App';
import { formatValue } from '../../src/ui/format';
import { FOUR_BARS } from './scenario-fixtures';

/** Renders the whole workbench on a fresh store. */
export function renderWorkbench(scenario: Scenario = FOUR_BARS, options: CreateStoreOptions = {}) {
  const store = createWorkbenchStore(scenario, options);
  const user = userEvent.setup();
  const view = render(<App store={store} />);
  return { store, user, ...view, actions: store.getState().actions, scenario: () => store.getState().scenario };
}

/** The text a result shows for a depth in mm computed by the core. */
export const mmText = (mm: number): string => `${formatValue(mm)} mm`;

/** The core's totals for a storm and method, for checking the screen against. */
export const coreTotals = (storm: Scenario['storm'], method: LossMethod) => computeLosses(storm, method);

/** How long a test waits for code loaded on first use: its first load compiles it, slow on a busy machine (within the 5 s a test may take). */
export const LAZY_LOAD_MS = 4_000;

/**
 * Waits until no part of the screen is still loading its code (the views,
 * dialogs and panels that load when first shown, src/ui/layout/LazyPart.tsx).
 */
export async function lazyPartsLoaded(): Promise<void> {
  await waitFor(() => expect(document.querySelector('.lazy-part')).toBeNull(), { timeout: LAZY_LOAD_MS });
}
