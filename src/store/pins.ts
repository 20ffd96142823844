import { createStore, type StoreApi } from 'zustand/vanilla';
import { parseScenario, type Problem } from '../scenario';
import {
  createStoredSlot,
  describeError as why,
  envelopeCodec,
  type OtherTabWatch,
  type StorageLike,
} from '../scenario/stored-slot';
import type { Scenario } from '../scenario/types';
import { MAX_PINS, PINS_KEY } from './pin-limits';

export { MAX_PINS, PINS_KEY } from './pin-limits';

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
 * list instead of overwriting each other, and a change announced by another
 * tab is read at once (`watchOtherTabs`). The stored-slot rules
 * (src/scenario/stored-slot.ts) are the saved list's and the current
 * scenario's too.
 */
const PINS_FORMAT_TAG = 'raincut-pins';
const PINS_VERSION = 1;

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
  /** Reads the browser's copy again whenever another tab changes it; returns how to stop. */
  watchOtherTabs(): () => void;
}

interface Stored {
  nextId: number;
  pins: Pin[];
}

const problem = (message: string): Problem => ({ path: '', message });

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

/** Reads the stored pins (the envelope already checked): the good ones, and what was left out. */
function readBody(json: Record<string, unknown>): { value: Stored; damage: Problem[] } | { unreadable: string } {
  const list = json['pins'];
  if (!Array.isArray(list)) return { unreadable: 'it has no list of pins' };
  const damage: Problem[] = [];
  const pins: Pin[] = [];
  let highest = 0;
  list.forEach((raw: unknown, i) => {
    const where = `pins[${i}]`;
    const item =
      raw !== null && typeof raw === 'object' && !Array.isArray(raw) ? (raw as Record<string, unknown>) : null;
    const id = item?.['id'];
    if (!item || typeof id !== 'string' || !/^p[1-9]\d{0,14}$/.test(id) || typeof item['pinnedAt'] !== 'string') {
      damage.push({ path: where, message: `${where}: is not a pinned scenario, and was left out.` });
      return;
    }
    const copy = copyOf(item['scenario']);
    if (!copy.ok) {
      damage.push({
        path: `${where}.scenario`,
        message: `${where}: the pinned scenario was left out: ${copy.message}`,
      });
      return;
    }
    if (pins.length >= MAX_PINS || pins.some((p) => p.id === id)) {
      damage.push({ path: where, message: `${where}: an extra or repeated pin was left out.` });
      return;
    }
    highest = Math.max(highest, Number(id.slice(1)));
    pins.push({ id, pinnedAt: item['pinnedAt'], scenario: copy.scenario });
  });
  const nextId =
    typeof json['nextId'] === 'number' && Number.isSafeInteger(json['nextId']) && json['nextId'] > highest
      ? json['nextId']
      : highest + 1;
  return { value: { nextId, pins }, damage };
}

/** { "$format": "raincut-pins", "version": 1, "nextId": n, "pins": [{ "id", "pinnedAt", "scenario" }] } */
const PINS_CODEC = envelopeCodec<Stored>({
  format: PINS_FORMAT_TAG,
  version: PINS_VERSION,
  noun: 'list of pins',
  readBody,
  writeBody: (stored) => stored,
});

export interface PinBoardOptions {
  readonly key?: string;
  readonly now?: () => Date;
  /** Where other tabs' writes are heard (the browser's "storage" events; tests pass their own). */
  readonly watch?: OtherTabWatch;
}

export function createPinBoard(storage: StorageLike | null, options: PinBoardOptions = {}): PinBoard {
  const key = options.key ?? PINS_KEY;
  const now = options.now ?? (() => new Date());
  /** Pins live in memory too, so the screen works where storage does not. */
  let memory: Stored = { nextId: 1, pins: [] };
  let canWrite = storage !== null;
  const state = createStore<PinState>()(() => ({ pins: [], problems: [] }));
  const slot = storage
    ? createStoredSlot(storage, { key, codec: PINS_CODEC, now, ...(options.watch ? { watch: options.watch } : {}) })
    : null;

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
    if (!slot) return [];
    const read = slot.read();
    if (read.kind === 'blocked') {
      canWrite = false;
      return [
        problem(
          `The pinned scenarios could not be read from this browser (${read.reason}); pins are kept only until the page closes.`,
        ),
      ];
    }
    if (read.kind === 'empty') {
      memory = { nextId: Math.max(memory.nextId, 1), pins: canWrite ? [] : memory.pins };
      return [];
    }
    if (read.kind === 'ok' && read.damage.length === 0) {
      memory = read.value;
      canWrite = true;
      return [];
    }
    if (read.kind === 'newer') {
      canWrite = false;
      return [
        problem(
          `The pinned scenarios were written by a newer version of Raincut (pin list version ${read.version}); they are left as they are, and new pins last only until the page closes.`,
        ),
      ];
    }
    const aside = slot.setAside(read.text);
    if (!aside.ok) {
      canWrite = false;
      return [
        problem(
          `The pinned scenarios in this browser are damaged and could not be set aside (${aside.reason}); they are left as they are, and new pins last only until the page closes.`,
        ),
      ];
    }
    canWrite = true;
    if (read.kind === 'unreadable') {
      memory = { nextId: 1, pins: [] };
      write();
      return [
        problem(
          `The pinned scenarios could not be read (${read.reason}). They were kept as they were under browser storage key "${aside.key}".`,
        ),
      ];
    }
    memory = read.value;
    write();
    return [
      problem(
        `Part of the pinned scenarios was damaged and left out; the list as it was is kept under browser storage key "${aside.key}".`,
      ),
      ...read.damage,
    ];
  }

  function write(): Problem | null {
    if (!slot || !canWrite) return null;
    const failed = slot.write(memory);
    return failed === null
      ? null
      : problem(`The pins could not be kept in this browser (${failed}); they stay until the page closes.`);
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
    watchOtherTabs() {
      return slot ? slot.watch(() => publish(load())) : () => undefined;
    },
  };
}
