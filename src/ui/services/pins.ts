import { createStore, type StoreApi } from 'zustand/vanilla';
import { parseScenario, type Problem, type StorageLike } from '../../scenario';
import type { Scenario } from '../../scenario/types';

/**
 * Scenarios pinned for side-by-side comparison, kept in the browser under
 * PINS_KEY. A pin is a copy: it is checked and cloned through the scenario
 * schema when pinned, so later edits of the current scenario never reach it.
 *
 * Stored as { "$format": "raincut-pins", "version": 1, "nextId": n,
 * "pins": [{ "id", "pinnedAt", "scenario" }] }. Every read goes through
 * parseScenario; a damaged list is copied as it was to a set-aside key
 * before anything is written over it, and nothing is written when that copy
 * cannot be made. Each change reads storage afresh, so two tabs add to one
 * list instead of overwriting each other.
 */
export const PINS_KEY = 'raincut.pins';
const PINS_FORMAT_TAG = 'raincut-pins';
const PINS_VERSION = 1;
export const MAX_PINS = 4;

export interface Pin {
  readonly id: string;
  /** ISO 8601, UTC. */
  readonly pinnedAt: string;
  readonly scenario: Scenario;
}

export interface PinState {
  readonly pins: readonly Pin[];
  /** What went wrong with the browser's copy, for the screen; empty when all is well. */
  readonly problems: readonly Problem[];
}

export type PinResult = { readonly ok: true; readonly pin: Pin } | { readonly ok: false; readonly message: string };

export interface PinBoard extends Pick<StoreApi<PinState>, 'getState' | 'subscribe'> {
  /** Pins a copy of the scenario (refused when MAX_PINS are pinned, or when it does not pass the schema). */
  pin(scenario: Scenario): PinResult;
  unpin(id: string): void;
  /** Reads the browser's copy again (another tab may have changed it). */
  reload(): void;
}

interface Stored {
  nextId: number;
  pins: Pin[];
}

const problem = (message: string): Problem => ({ path: '', message });
const why = (error: unknown): string => (error instanceof Error ? error.message : String(error));
const isRecord = (x: unknown): x is Record<string, unknown> => x !== null && typeof x === 'object' && !Array.isArray(x);

/** A checked deep copy of a scenario, or the schema's first problem. */
function copyOf(scenario: unknown): { ok: true; scenario: Scenario } | { ok: false; message: string } {
  let clone: unknown;
  try {
    clone = JSON.parse(JSON.stringify(scenario));
  } catch (error) {
    return { ok: false, message: `it cannot be copied (${why(error)})` };
  }
  const parsed = parseScenario(clone);
  return parsed.ok ? parsed : { ok: false, message: parsed.problems.map((p) => p.message).join(' ') };
}

function readStored(text: string): { stored: Stored; damage: Problem[] } | { unreadable: string } {
  let json: unknown;
  try {
    json = JSON.parse(text);
  } catch (error) {
    return { unreadable: `it is not valid JSON (${why(error)})` };
  }
  if (!isRecord(json) || json['$format'] !== PINS_FORMAT_TAG) return { unreadable: `it is not a Raincut list of pins` };
  if (json['version'] !== PINS_VERSION)
    return { unreadable: `its version is ${String(json['version'])}, not ${PINS_VERSION}` };
  const list = json['pins'];
  if (!Array.isArray(list)) return { unreadable: 'it has no list of pins' };
  const damage: Problem[] = [];
  const pins: Pin[] = [];
  let highest = 0;
  list.forEach((raw, i) => {
    const where = `pins[${i}]`;
    if (
      !isRecord(raw) ||
      typeof raw['id'] !== 'string' ||
      !/^p[1-9]\d{0,14}$/.test(raw['id']) ||
      typeof raw['pinnedAt'] !== 'string'
    ) {
      damage.push({ path: where, message: `${where}: is not a pinned scenario, and was left out.` });
      return;
    }
    const copy = copyOf(raw['scenario']);
    if (!copy.ok) {
      damage.push({
        path: `${where}.scenario`,
        message: `${where}: the pinned scenario was left out: ${copy.message}`,
      });
      return;
    }
    if (pins.length >= MAX_PINS || pins.some((p) => p.id === raw['id'])) {
      damage.push({ path: where, message: `${where}: an extra or repeated pin was left out.` });
      return;
    }
    highest = Math.max(highest, Number(raw['id'].slice(1)));
    pins.push({ id: raw['id'], pinnedAt: raw['pinnedAt'], scenario: copy.scenario });
  });
  const nextId =
    typeof json['nextId'] === 'number' && Number.isSafeInteger(json['nextId']) && json['nextId'] > highest
      ? json['nextId']
      : highest + 1;
  return { stored: { nextId, pins }, damage };
}

export interface PinBoardOptions {
  readonly key?: string;
  readonly now?: () => Date;
}

export function createPinBoard(storage: StorageLike | null, options: PinBoardOptions = {}): PinBoard {
  const key = options.key ?? PINS_KEY;
  const now = options.now ?? (() => new Date());
  /** Pins live in memory too, so the screen works where storage does not. */
  let memory: Stored = { nextId: 1, pins: [] };
  let canWrite = storage !== null;
  const state = createStore<PinState>()(() => ({ pins: [], problems: [] }));

  /**
   * Reads storage into `memory`; pins made while the browser's copy could
   * not be written join the list once it can be. Returns the problems found.
   */
  function load(): Problem[] {
    const unsaved = canWrite ? [] : memory.pins;
    const problems = readStorage();
    if (unsaved.length === 0 || !canWrite) return problems;
    let nextId = memory.nextId;
    const pins = [...memory.pins];
    for (const p of unsaved) if (pins.length < MAX_PINS) pins.push({ ...p, id: `p${nextId++}` });
    memory = { nextId, pins };
    const failed = write();
    return failed ? [...problems, failed] : problems;
  }

  /** Reads storage; damaged data is set aside first. */
  function readStorage(): Problem[] {
    if (!storage) return [];
    let text: string | null;
    try {
      text = storage.getItem(key);
    } catch (error) {
      canWrite = false;
      return [
        problem(
          `The pinned scenarios could not be read from this browser (${why(error)}); pins are kept only until the page closes.`,
        ),
      ];
    }
    if (text === null) {
      memory = { nextId: Math.max(memory.nextId, 1), pins: canWrite ? [] : memory.pins };
      return [];
    }
    const read = readStored(text);
    if ('stored' in read && read.damage.length === 0) {
      memory = read.stored;
      canWrite = true;
      return [];
    }
    const asideKey = `${key}.damaged.${now().toISOString()}`;
    try {
      storage.setItem(asideKey, text);
    } catch (error) {
      canWrite = false;
      return [
        problem(
          `The pinned scenarios in this browser are damaged and could not be set aside (${why(error)}); they are left as they are, and new pins last only until the page closes.`,
        ),
      ];
    }
    canWrite = true;
    if ('unreadable' in read) {
      memory = { nextId: 1, pins: [] };
      write();
      return [
        problem(
          `The pinned scenarios could not be read (${read.unreadable}). They were kept as they were under browser storage key "${asideKey}".`,
        ),
      ];
    }
    memory = read.stored;
    write();
    return [
      problem(
        `Part of the pinned scenarios was damaged and left out; the list as it was is kept under browser storage key "${asideKey}".`,
      ),
      ...read.damage,
    ];
  }

  function write(): Problem | null {
    if (!storage || !canWrite) return null;
    try {
      storage.setItem(key, JSON.stringify({ $format: PINS_FORMAT_TAG, version: PINS_VERSION, ...memory }));
      return null;
    } catch (error) {
      return problem(`The pins could not be kept in this browser (${why(error)}); they stay until the page closes.`);
    }
  }

  const publish = (problems: readonly Problem[]): void => state.setState({ pins: [...memory.pins], problems }, true);

  publish(load());

  return {
    getState: state.getState,
    subscribe: state.subscribe,
    pin(scenario) {
      const found = load();
      if (memory.pins.length >= MAX_PINS) {
        publish(found);
        return { ok: false, message: `${MAX_PINS} scenarios are pinned already; unpin one to pin another.` };
      }
      const copy = copyOf(scenario);
      if (!copy.ok) {
        publish(found);
        return { ok: false, message: `This scenario cannot be pinned: ${copy.message}` };
      }
      const pin: Pin = { id: `p${memory.nextId}`, pinnedAt: now().toISOString(), scenario: copy.scenario };
      memory = { nextId: memory.nextId + 1, pins: [...memory.pins, pin] };
      const failed = write();
      publish(failed ? [...found, failed] : found);
      return { ok: true, pin };
    },
    unpin(id) {
      const found = load();
      memory = { ...memory, pins: memory.pins.filter((p) => p.id !== id) };
      const failed = write();
      publish(failed ? [...found, failed] : found);
    },
    reload() {
      publish(load());
    },
  };
}
