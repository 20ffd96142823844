import { describeValue, type Problem } from './problems';

/**
 * The part of the Web Storage interface Raincut uses: `localStorage` in the
 * browser, a plain object in tests. Any method may throw (storage turned
 * off, quota full); the slot catches and reports it. `length` and `key` let
 * the saved list find set-aside copies; without them there is simply nothing
 * to list.
 */
export interface StorageLike {
  getItem(key: string): string | null;
  setItem(key: string, value: string): void;
  removeItem(key: string): void;
  readonly length?: number;
  key?(index: number): string | null;
}

/**
 * Calls back with the storage key another tab changed (null: all cleared);
 * returns how to stop listening. In the browser these are the "storage"
 * events (src/store/other-tabs.ts); tests pass their own.
 */
export type OtherTabWatch = (changed: (key: string | null) => void) => () => void;

/** How one kind of stored data is read from its text and written back. */
export interface SlotCodec<T> {
  decode(text: string): Decoded<T>;
  encode(value: T): string;
}

/**
 * What a stored text held: a value (with the parts left out as damage, if
 * any), nothing this version can read, or data from a newer version (never
 * written over: reloading the newer page reads it).
 */
export type Decoded<T> =
  | { readonly kind: 'ok'; readonly value: T; readonly damage: readonly Problem[] }
  | { readonly kind: 'unreadable'; readonly reason: string }
  | { readonly kind: 'newer'; readonly version: number };

/** What reading the slot found; `text` is the stored text as it was. */
export type SlotReading<T> =
  | { readonly kind: 'empty' }
  | { readonly kind: 'blocked'; readonly reason: string }
  | (Decoded<T> & { readonly text: string });

export type SetAsideOutcome =
  { readonly ok: true; readonly key: string } | { readonly ok: false; readonly reason: string };

/**
 * One piece of stored data under one key (the saved list, the pins, the
 * current scenario), with the rules every one of them keeps:
 *
 * - an envelope and a version (the codec; see `envelopeCodec`);
 * - damaged data is copied, as it was, to "<key>.damaged.<time>" ("-2",
 *   "-3" … when taken) before anything is written over it (`setAside`);
 * - two tabs: the text this slot last read or wrote is its version stamp, so
 *   `changedElsewhere` tells when another tab wrote since, and `watch` calls
 *   back when another tab's write is announced.
 *
 * Every method catches what storage throws: nothing here throws.
 */
export interface StoredSlot<T> {
  readonly key: string;
  /** Reads the stored text afresh and remembers it as this tab's stamp. */
  read(): SlotReading<T>;
  /** Writes the value in one `setItem` (whole or not at all); the reason on failure, else null. */
  write(value: T): string | null;
  /** Writes text already encoded (the same rules as `write`). */
  writeText(text: string): string | null;
  /** Copies `text` to a free set-aside key. */
  setAside(text: string): SetAsideOutcome;
  /** Removes the stored text (after setting it aside); never throws. */
  remove(): void;
  /** The stored text now, without remembering it; null when there is none or it cannot be read. */
  peek(): string | null;
  /** True when the stored text is there and differs from what this slot last read or wrote. */
  changedElsewhere(): boolean;
  /** Takes the stored text now as this slot's stamp (after the user chose to take or leave it). */
  acknowledge(): void;
  /** Calls back when another tab changes this key (or clears storage). */
  watch(changed: () => void): () => void;
}

export interface SlotOptions<T> {
  readonly key: string;
  readonly codec: SlotCodec<T>;
  /** The clock, for set-aside keys (default: the system clock). */
  readonly now?: () => Date;
  /** Where other tabs' writes are heard (default: nowhere). */
  readonly watch?: OtherTabWatch;
}

/** The suffix between a key and the time stamp of a copy set aside from it. */
export const SET_ASIDE_MARK = '.damaged.';

/** An error in words: its message, after its name when that says more than "Error" (QuotaExceededError). */
export function describeError(error: unknown): string {
  if (error !== null && typeof error === 'object' && typeof (error as Error).message === 'string') {
    const { name, message } = error as Error;
    return typeof name === 'string' && name !== '' && name !== 'Error' ? `${name}: ${message}` : message;
  }
  return String(error);
}

const noWatch: OtherTabWatch = () => () => undefined;

export function createStoredSlot<T>(storage: StorageLike, options: SlotOptions<T>): StoredSlot<T> {
  const { key, codec } = options;
  const now = options.now ?? (() => new Date());
  const watch = options.watch ?? noWatch;
  let known: string | null = null;

  const peek = (): string | null => {
    try {
      return storage.getItem(key);
    } catch {
      return null;
    }
  };

  const writeText = (text: string): string | null => {
    try {
      storage.setItem(key, text);
      known = text;
      return null;
    } catch (error) {
      return describeError(error);
    }
  };

  return {
    key,
    read() {
      let text: string | null;
      try {
        text = storage.getItem(key);
      } catch (error) {
        return { kind: 'blocked', reason: describeError(error) };
      }
      known = text;
      if (text === null) return { kind: 'empty' };
      return { ...codec.decode(text), text };
    },
    write: (value) => writeText(codec.encode(value)),
    writeText,
    setAside(text) {
      try {
        const base = `${key}${SET_ASIDE_MARK}${now().toISOString()}`;
        let candidate = base;
        for (let n = 2; storage.getItem(candidate) !== null; n++) candidate = `${base}-${n}`;
        storage.setItem(candidate, text);
        return { ok: true, key: candidate };
      } catch (error) {
        return { ok: false, reason: describeError(error) };
      }
    },
    remove() {
      try {
        storage.removeItem(key);
        known = null;
      } catch {
        // What stays is set aside again next time, never lost.
      }
    },
    peek,
    changedElsewhere() {
      const text = peek();
      return text !== null && text !== known;
    },
    acknowledge() {
      known = peek();
    },
    watch: (changed) =>
      watch((changedKey) => {
        if (changedKey === key || changedKey === null) changed();
      }),
  };
}

const isRecord = (x: unknown): x is Record<string, unknown> => x !== null && typeof x === 'object' && !Array.isArray(x);

export interface EnvelopeOptions<T> {
  /** The `$format` tag that says what the text is. */
  readonly format: string;
  readonly version: number;
  /** What the data is, for messages ("list of scenarios"). */
  readonly noun: string;
  /** Reads the body (the envelope already checked): the value and what was left out, or why nothing could be read. */
  readonly readBody: (
    json: Record<string, unknown>,
  ) => { readonly value: T; readonly damage: readonly Problem[] } | { readonly unreadable: string };
  /** The body's fields, written after `$format` and `version`. */
  readonly writeBody: (value: T) => object;
}

/**
 * The envelope of Raincut's stored lists: { "$format": tag, "version": n,
 * …body }. Text that is not JSON, or not tagged so, cannot be read; a
 * higher version is "newer" (left as it is); a lower or odd one cannot be
 * read by this version.
 */
export function envelopeCodec<T>(options: EnvelopeOptions<T>): SlotCodec<T> {
  const { format, version } = options;
  return {
    decode(text) {
      let json: unknown;
      try {
        json = JSON.parse(text);
      } catch (error) {
        return { kind: 'unreadable', reason: `it is not valid JSON (${describeError(error)})` };
      }
      if (!isRecord(json) || json['$format'] !== format) {
        return { kind: 'unreadable', reason: `it is not a Raincut ${options.noun} (no "$format": "${format}")` };
      }
      const stored = json['version'];
      if (typeof stored === 'number' && Number.isSafeInteger(stored) && stored > version) {
        return { kind: 'newer', version: stored };
      }
      if (stored !== version) return { kind: 'unreadable', reason: `its version is ${describeValue(stored)}` };
      const body = options.readBody(json);
      return 'unreadable' in body
        ? { kind: 'unreadable', reason: body.unreadable }
        : { kind: 'ok', value: body.value, damage: body.damage };
    },
    encode: (value) => JSON.stringify({ $format: format, version, ...options.writeBody(value) }),
  };
}
