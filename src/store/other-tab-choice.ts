import { MAX_NAME_LENGTH } from '../scenario/text-limits';
import type { StorageLike, StoredSlot } from '../scenario/stored-slot';
import type { Scenario } from '../scenario/types';
import { readLargeMarker } from './large-marker';
import { readScenarioJson, type ReadResult } from './read-scenario';
import type { WorkbenchStore } from './scenario-store';

/**
 * The two ways on when another tab changed the saved scenario (the notice's
 * `other-tab` kind, set by persistStore in ./persistence.ts): open that
 * version here, or keep this one. Loaded when the user chooses, not with
 * the first screen.
 */
export interface OtherTabChoiceHost {
  readonly store: WorkbenchStore;
  readonly slot: StoredSlot<Scenario>;
  readonly storage: StorageLike;
  /** The other tab's version is on screen: it is what is saved, nothing to write. */
  readonly taken: (scenario: Scenario) => void;
  /** Saves this tab's scenario as the current one again (after its copy went to the saved list). */
  readonly keep: (scenario: Scenario) => void;
}

/** The name of this tab's copy when the user keeps it beside the other tab's version. */
export function copyName(name: string): string {
  const suffix = ' (this tab’s copy)';
  return `${name.slice(0, Math.max(0, MAX_NAME_LENGTH - suffix.length))}${suffix}`;
}

/** Opens the other tab's version here, as one undoable edit; writes nothing. */
export async function takeTheirs(host: OtherTabChoiceHost): Promise<void> {
  const { store, slot } = host;
  const theirs = slot.peek();
  store.getState().actions.setNotice(null);
  if (theirs === null) return;
  const marker = readLargeMarker(theirs);
  let read: ReadResult;
  if (marker) {
    const { readLargeInSteps } = await import('./open-scenario');
    read = await readLargeInSteps(marker);
  } else read = readScenarioJson(theirs);
  if (!read.ok) {
    store.getState().actions.setNotice({
      kind: 'save-failed',
      message: `The other tab's version could not be opened (${read.message}). This tab's scenario stays on screen and is not saved over it; export it to keep it.`,
    });
    return;
  }
  // A long storm's check and arrays made ready in steps before the edit (./open-scenario.ts).
  if (marker) await (await import('./open-scenario')).prepareLongStorm(store, read.scenario.storm);
  slot.acknowledge();
  host.taken(read.scenario);
  store.getState().actions.replaceScenario(read.scenario, 'Open the other tab’s version');
  // The edit above is this tab's own view of the saved text: nothing to write.
  host.taken(store.getState().scenario);
}

/** Saves this tab's scenario under a new name in the saved list, then as the current one again. */
export async function keepMine(host: OtherTabChoiceHost): Promise<void> {
  const { store, slot } = host;
  const mine = store.getState().scenario;
  const [{ createScenarioLibrary }, { saveToList }] = await Promise.all([
    import('../scenario/library'),
    import('./large-library'),
  ]);
  // A scenario too large for the list's localStorage key goes to the large store (./large-library.ts).
  const saved = await saveToList(
    createScenarioLibrary(host.storage),
    { ...mine, name: copyName(mine.name) },
    {
      now: new Date(),
    },
  );
  if (!saved.ok) {
    store.getState().actions.setNotice({
      kind: 'save-failed',
      message: `This tab's scenario could not be saved as a copy (${saved.problems.map((p) => p.message).join(' ')}). It stays on screen; export it to keep it.`,
    });
    return;
  }
  slot.acknowledge();
  store.getState().actions.setNotice(null);
  host.keep(mine);
}
