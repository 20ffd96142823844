import { createStore, type StoreApi } from 'zustand/vanilla';
import {
  InputError,
  methodSpec,
  type CalibrationResult,
  type LossKind,
  type LossMethod,
  type AreaUnit,
  type Storm,
  type UnitSystem,
} from '../core';
import { DEFAULT_AREA_UNITS, isAreaUnitOf, type AreaUnits } from './area-units';
import { blankScenario } from '../scenario/blank';
import { carriesDemoIdentity, withoutDemoIdentity } from '../scenario/demo';
import { labelInSentence } from '../scenario/label-text';
import type { Scenario } from '../scenario/types';
import { createDerived, type Derived } from './derive';
import {
  withAreaM2,
  withBarDeleted,
  withBarDepth,
  withBarDuration,
  withBarInserted,
  withMethod,
  withMethodDefaults,
  withMethodKind,
  withCatchmentName,
  withName,
  withNotes,
  withObserved,
  withParam,
  withStartIso,
  sameStorm,
  withStorm,
  withUnits,
  type Bar,
  type Observed,
} from './edits';
import { withActiveEventSynced } from './event-edits';
import {
  createHistory,
  record,
  redo,
  redoLabel,
  replacePresent,
  undo,
  undoLabel,
  withdraw,
  type History,
} from './history';

/** Problems with the browser's saved copy, shown on screen until dismissed. */
export type StorageNotice =
  | { readonly kind: 'set-aside'; readonly message: string; readonly key: string }
  | { readonly kind: 'save-failed'; readonly message: string }
  | { readonly kind: 'unavailable'; readonly message: string }
  /** Saved, but in the browser's large store (IndexedDB): said once, so the user knows where the work is. */
  | { readonly kind: 'large-store'; readonly message: string }
  /** Another tab changed the saved scenario: nothing is written over it until the user chooses. */
  | {
      readonly kind: 'other-tab';
      readonly message: string;
      /** Opens the other tab's version here (one undoable edit). */
      readonly takeTheirs: () => void;
      /** Saves this tab's scenario under a new name in the saved list, then saves it as the current one again. */
      readonly keepMine: () => Promise<void>;
    };

export interface EditOptions {
  /** Successive edits with the same key in quick succession are one undo step. */
  readonly coalesceKey?: string;
  /** The key names a typing session: its edits are one undo step however long apart (see history.ts). */
  readonly session?: boolean;
}

export interface WorkbenchActions {
  /** Applies any pure edit of the scenario as one undoable step (throws InputError, changing nothing, on bad input). */
  edit(label: string, recipe: (s: Scenario) => Scenario, options?: EditOptions): void;

  setName(name: string): void;
  setCatchmentName(name: string): void;
  setNotes(notes: string): void;
  /** Starts a new, empty scenario in the same units (one undoable step). */
  newScenario(): void;
  setUnits(units: UnitSystem): void;
  setAreaM2(areaM2: number, options?: EditOptions): void;
  /** Shows and exports the catchment area in `unit`, for the unit system it belongs to (a preference: not undone). */
  setAreaUnit(unit: AreaUnit): void;

  /** Replaces the whole storm (paste, draw, storm tools) as one undoable edit named `label`. */
  setStorm(storm: Storm, label: string): void;
  /**
   * Replaces the storm with one brought in from elsewhere (pasted, opened from a file). Over the invented demo it
   * also clears the demo's name, catchment, notes and observed runoff, which are not the new storm's.
   */
  setImportedStorm(storm: Storm, label: string): void;
  setBarDepth(k: number, depthMm: number, options?: EditOptions): void;
  setBarDuration(k: number, durationH: number, options?: EditOptions): void;
  /** Inserts a bar before index k (k = bar count appends); default a dry bar as long as its neighbour. */
  insertBar(k: number, bar?: Bar): void;
  deleteBar(k: number): void;
  setStartIso(startIso: string | undefined): void;

  /** Switches method, keeping the storm and remembering each method's last parameters. */
  setMethodKind(kind: LossKind): void;
  setParam(key: string, value: number | boolean | string, options?: EditOptions): void;
  resetMethodDefaults(): void;
  /** Sets all of the active method's parameters at once (a preset), as one undoable edit named `label`. */
  setMethod(method: LossMethod, label: string): void;

  setObserved(patch: Partial<Observed> | null, options?: EditOptions): void;
  /** Turns "keep matched" on or off; turning it off keeps the fitted value. */
  setKeepMatched(on: boolean): void;
  /** Sets the chosen parameter to the core's exact fit of the observed runoff; returns the core's answer. */
  fitObserved(): CalibrationResult | null;

  /** Replaces the whole scenario (open a file, a link, the demo) as one undoable edit. */
  replaceScenario(scenario: Scenario, label: string): void;

  /**
   * A gesture (a drag) is one undo step: edits between begin and end replace
   * the document without recording; end records one step from the state at
   * begin; cancel puts that state back.
   */
  beginGesture(label: string): void;
  endGesture(): void;
  cancelGesture(): void;

  undo(): void;
  redo(): void;
  /**
   * Takes back the last step if it was recorded under this coalescing key
   * (a typing session whose text no longer applies); true when it did.
   */
  withdraw(coalesceKey: string): boolean;

  setNotice(notice: StorageNotice | null): void;
}

export interface WorkbenchState {
  readonly history: History<Scenario>;
  /** The document on screen (history.present, kept here for narrow selectors). */
  readonly scenario: Scenario;
  readonly gesture: { readonly base: Scenario; readonly label: string } | null;
  readonly undoLabel: string | null;
  readonly redoLabel: string | null;
  readonly notice: StorageNotice | null;
  /** The unit the catchment area is shown, typed and exported in, per unit system (see area-units.ts). */
  readonly areaUnits: AreaUnits;
  readonly actions: WorkbenchActions;
}

export type WorkbenchStore = StoreApi<WorkbenchState> & { readonly derived: Derived };

export interface CreateStoreOptions {
  readonly notice?: StorageNotice | null;
  /** Clock for coalescing edits (tests pass their own). */
  readonly now?: () => number;
  /** The area units chosen before (read from the browser's storage by startWorkbench). */
  readonly areaUnits?: AreaUnits;
}

/** The vanilla store: no React here (see ./react.ts for the binding). */
export function createWorkbenchStore(initial: Scenario, options: CreateStoreOptions = {}): WorkbenchStore {
  const now = options.now ?? (() => Date.now());
  const derived = createDerived();

  const api = createStore<WorkbenchState>()((set, get) => {
    const commit = (history: History<Scenario>, gesture: WorkbenchState['gesture'] = get().gesture): void => {
      set({
        history,
        scenario: history.present,
        gesture,
        undoLabel: undoLabel(history),
        redoLabel: redoLabel(history),
      });
    };

    const edit = (label: string, recipe: (s: Scenario) => Scenario, opts: EditOptions = {}): void => {
      const { history, gesture } = get();
      // The event on the workbench follows every workbench edit (scenario version 3).
      const next = withActiveEventSynced(recipe(history.present));
      if (next === history.present) return;
      if (gesture) commit(replacePresent(history, next));
      else {
        const recordOptions =
          opts.coalesceKey === undefined
            ? { nowMs: now() }
            : { nowMs: now(), coalesceKey: opts.coalesceKey, session: opts.session === true };
        commit(record(history, next, label, recordOptions));
      }
    };

    const paramLabel = (s: Scenario, key: string): string => {
      const spec = methodSpec(s.method.kind);
      return spec.params.find((p) => p.key === key)?.label ?? spec.choices?.find((c) => c.key === key)?.label ?? key;
    };

    // Each kind of change to the observed runoff is an undo step of its own name.
    const observedLabel = (s: Scenario, patch: Partial<Observed> | null): string => {
      if (patch === null) return 'Clear observed runoff';
      if (s.observed !== null && patch.as !== undefined && patch.as !== s.observed.as)
        return patch.as === 'volume' ? 'Give observed runoff as a volume' : 'Give observed runoff as a depth';
      if (patch.value === undefined && patch.parameter !== undefined)
        return `Choose ${labelInSentence(paramLabel(s, patch.parameter))} to fit`;
      if (patch.value === undefined && patch.locked !== undefined)
        return patch.locked ? 'Keep matched to observed runoff' : 'Stop keeping matched';
      return 'Set observed runoff';
    };

    /**
     * Undo and redo. A step that brings in a long storm whose results' arrays
     * are not made (loss-ring.ts) waits for them, made in small tasks, and is
     * taken then: 10⁶ bars' arrays are 16 MB, made in the task of the step
     * otherwise (issue 11). Steps asked for meanwhile follow it in order, each
     * on the history as it is when its turn comes; any other step is taken
     * at once, as before.
     */
    let steps: Promise<void> | null = null;
    const historyStep = (move: (h: History<Scenario>) => History<Scenario>): void => {
      if (get().gesture) actions.endGesture();
      if (steps === null && derived.stormReady(move(get().history).present.storm)) {
        commit(move(get().history));
        return;
      }
      const mine = (steps ?? Promise.resolve()).then(async () => {
        const storm = move(get().history).present.storm;
        if (!derived.stormReady(storm)) await derived.prepareStorm(storm);
        if (get().gesture) actions.endGesture();
        commit(move(get().history));
      });
      steps = mine;
      void mine.finally(() => {
        if (steps === mine) steps = null;
      });
    };

    const actions: WorkbenchActions = {
      edit,
      setName: (name) => edit('Rename scenario', (s) => withName(s, name), { coalesceKey: 'name' }),
      setCatchmentName: (name) =>
        edit('Rename catchment', (s) => withCatchmentName(s, name), { coalesceKey: 'catchment-name' }),
      setNotes: (notes) => edit('Edit notes', (s) => withNotes(s, notes), { coalesceKey: 'notes' }),
      newScenario: () => edit('New scenario', (s) => blankScenario(s.units, s.method)),
      setUnits: (units) =>
        edit(units === 'us' ? 'Show US customary units' : 'Show SI units', (s) => withUnits(s, units)),
      setAreaM2: (areaM2, opts) => edit('Set catchment area', (s) => withAreaM2(s, areaM2), opts),
      setAreaUnit: (unit) => {
        const system: UnitSystem = isAreaUnitOf('us', unit) ? 'us' : 'si';
        if (get().areaUnits[system] !== unit) set({ areaUnits: { ...get().areaUnits, [system]: unit } });
      },

      // A tool that leaves every bar as it was (scale by 1, resample to the storm's own step) is no undo step.
      setStorm: (storm, label) => edit(label, (s) => (sameStorm(s.storm, storm) ? s : withStorm(s, storm))),
      setImportedStorm: (storm, label) =>
        edit(label, (s) => {
          const next = withStorm(s, storm);
          return carriesDemoIdentity(s) ? withoutDemoIdentity(next) : next;
        }),
      setBarDepth: (k, depthMm, opts) => edit(`Set bar ${k + 1} depth`, (s) => withBarDepth(s, k, depthMm), opts),
      setBarDuration: (k, durationH, opts) =>
        edit(`Set bar ${k + 1} duration`, (s) => withBarDuration(s, k, durationH), opts),
      insertBar: (k, bar) => edit(`Insert bar ${k + 1}`, (s) => withBarInserted(s, k, bar)),
      deleteBar: (k) => edit(`Delete bar ${k + 1}`, (s) => withBarDeleted(s, k)),
      setStartIso: (startIso) =>
        edit(startIso === undefined ? 'Clear storm start time' : 'Set storm start time', (s) =>
          withStartIso(s, startIso),
        ),

      setMethodKind: (kind) =>
        edit(`Use ${methodSpec(kind).label}`, (s) => withMethodKind(s, kind, derived.effectiveMethod(s))),
      setParam: (key, value, opts) =>
        edit(
          `Set ${labelInSentence(paramLabel(get().scenario, key))}`,
          (s) => {
            if (s.observed?.locked && s.observed.parameter === key && derived.isMatched(s)) {
              throw new InputError(
                key,
                `${paramLabel(s, key)} is kept matched to the observed runoff; turn off "Keep matched" to set it by hand.`,
              );
            }
            return withParam(s, key, value);
          },
          opts,
        ),
      resetMethodDefaults: () => edit('Use default parameters', withMethodDefaults),
      setMethod: (method, label) =>
        edit(label, (s) => {
          if (method.kind !== s.method.kind) {
            throw new InputError(
              'kind',
              `A ${methodSpec(method.kind).label} preset cannot be set while ${methodSpec(s.method.kind).label} is in use.`,
            );
          }
          return withMethod(s, method);
        }),

      setObserved: (patch, opts) => edit(observedLabel(get().scenario, patch), (s) => withObserved(s, patch), opts),
      setKeepMatched: (on) =>
        edit(on ? 'Keep matched to observed runoff' : 'Stop keeping matched', (s) => {
          if (!s.observed)
            throw new InputError('observed', 'Enter an observed runoff before keeping the method matched to it.');
          if (on) return withObserved(s, { locked: true });
          // Keep what the screen showed: the fitted value becomes the stored one.
          const shown = derived.effectiveMethod(s);
          return withObserved(shown === s.method ? s : withMethod(s, shown), { locked: false });
        }),
      fitObserved: () => {
        const s = get().scenario;
        const result = derived.fit(s);
        if (result?.ok) {
          const fitted: LossMethod = result.method;
          edit(`Fit ${labelInSentence(paramLabel(s, s.observed?.parameter ?? ''))} to observed runoff`, (doc) =>
            withMethod(doc, fitted),
          );
        }
        return result;
      },

      replaceScenario: (scenario, label) => edit(label, () => scenario),

      beginGesture: (label) => {
        if (get().gesture) return;
        set({ gesture: { base: get().history.present, label } });
      },
      endGesture: () => {
        const { gesture, history } = get();
        if (!gesture) return;
        const moved = history.present !== gesture.base;
        // Record from the state at the start: one step for the whole gesture.
        const base = { ...history, present: gesture.base };
        commit(moved ? record(base, history.present, gesture.label, { nowMs: now() }) : history, null);
      },
      cancelGesture: () => {
        const { gesture, history } = get();
        if (!gesture) return;
        commit(replacePresent(history, gesture.base), null);
      },

      undo: () => historyStep(undo),
      redo: () => historyStep(redo),

      withdraw: (key) => {
        const { history, gesture } = get();
        if (gesture) return false;
        const back = withdraw(history, key);
        if (back === history) return false;
        commit(back);
        return true;
      },

      setNotice: (notice) => set({ notice }),
    };

    const history = createHistory(initial);
    return {
      history,
      scenario: initial,
      gesture: null,
      undoLabel: null,
      redoLabel: null,
      notice: options.notice ?? null,
      areaUnits: options.areaUnits ?? DEFAULT_AREA_UNITS,
      actions,
    };
  });

  // Once the hydrograph side's code arrives, every view reading it draws again (the scenario is unchanged).
  derived.whenHydrographReady(() => api.setState({}));
  return Object.assign(api, { derived });
}
