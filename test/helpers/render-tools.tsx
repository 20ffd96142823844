import { render, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import type { Scenario } from '../../src/scenario/types';
import { readScenario } from '../../src/store';
import { startWorkbench } from '../../src/store/start';
import { App } from '../../src/ui/App';
import { LAZY_LOAD_MS } from './render';
import type { ScenarioServices } from '../../src/ui/services';
import { FOUR_BARS, memoryStorage } from './scenario-fixtures';

export const NOW = '2026-03-01T10:00:00.000Z';
export const PAGE = 'https://raincut.example/bench/';

function read(doc: unknown): Scenario {
  const r = readScenario(doc);
  if (!r.ok) throw new Error(`test scenario does not read: ${r.message}`);
  return r.scenario;
}

/**
 * An invented scenario that differs from FOUR_BARS in every kind of field:
 * mixed bar durations, a clock start, US units, Horton with time
 * compression, an observed volume kept matched, notes.
 */
export const SHARED: Scenario = read({
  version: 2,
  name: 'Shared: Larkspur Lane culvert, 12 Feb storm (invented)',
  notes: 'Invented for tests.\nSecond line of notes.',
  storm: {
    durationsH: [0.25, 0.25, 0.5, 1, 0.5, 0.25],
    depthsMm: [1.3, 4.7, 11.9, 9.25, 3.05, 0.6],
    startIso: '2026-02-12T21:45:00',
  },
  catchment: { name: 'Larkspur Lane (invented)', areaM2: 412_000 },
  units: 'us',
  method: { kind: 'horton', f0MmH: 60, fcMmH: 6, kPerH: 2.5, ponding: true },
  methodMemory: { constant: { kind: 'constant', rateMmH: 5 } },
  observed: { as: 'volume', value: 2100, parameter: 'fcMmH', locked: false },
  streamflow: null,
});

export type MemoryStorage = ReturnType<typeof memoryStorage>;

export interface ToolsOptions {
  /** Browser storage (default: empty; null: the browser allows none). */
  readonly storage?: MemoryStorage | null;
  /** Shown when the storage holds no scenario. */
  readonly fallback?: Scenario;
  /** The address's fragment at start-up. */
  readonly fragment?: string;
  readonly clipboard?: ScenarioServices['clipboard'];
}

/**
 * The whole workbench started as the page starts it (saved scenario, then a
 * link in the fragment), with test doubles for storage, clipboard, downloads
 * and printing.
 */
export function renderTools(options: ToolsOptions = {}) {
  const storage = options.storage === undefined ? memoryStorage() : options.storage;
  const saved: { name: string; blob: Blob }[] = [];
  const calls = { print: 0, clearFragment: 0 };
  const copied: string[] = [];
  const clipboard =
    options.clipboard === undefined
      ? {
          writeText: async (text: string) => {
            copied.push(text);
          },
        }
      : options.clipboard;
  const started = startWorkbench({
    storage,
    fragment: options.fragment ?? '',
    fallback: options.fallback ?? FOUR_BARS,
    nowIso: NOW,
    clearFragment: () => {
      calls.clearFragment++;
    },
    persistDelayMs: 0,
  });
  const services: ScenarioServices = {
    storage,
    link: started.link,
    pageAddress: () => PAGE,
    clipboard,
    saveFile: (blob, name) => saved.push({ name, blob }),
    print: () => {
      calls.print++;
    },
    now: () => new Date(NOW),
  };
  const user = userEvent.setup();
  const view = render(<App store={started.store} services={services} />);
  return {
    ...view,
    ...started,
    storage,
    services,
    saved,
    copied,
    calls,
    user,
    actions: started.store.getState().actions,
    scenario: () => started.store.getState().scenario,
  };
}

/** The text of a saved (downloaded) file. */
export async function savedText(saved: readonly { name: string; blob: Blob }[], index = -1): Promise<string> {
  // The export code loads on the first export, so the file arrives a moment after the click.
  const file = await waitFor(
    () => {
      const at = saved.at(index);
      if (!at) throw new Error('nothing was saved');
      return at;
    },
    { timeout: LAZY_LOAD_MS },
  );
  // jsdom's Blob has no text(); FileReader reads it.
  return new Promise((resolve, reject) => {
    const reader = new FileReader();
    reader.onload = () => resolve(reader.result as string);
    reader.onerror = () => reject(reader.error ?? new Error('the saved file could not be read'));
    reader.readAsText(file.blob);
  });
}
