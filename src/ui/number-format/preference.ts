import { useSyncExternalStore } from 'react';
import {
  DEFAULT_NUMBER_FORMAT,
  NUMBER_FORMATS,
  isNumberFormatId,
  numberFormat,
  type NumberFormat,
  type NumberFormatId,
} from '../../io/number-format';

/**
 * The number format this browser shows and reads numbers in: a preference
 * of the reader's, kept in the browser's storage and never in the scenario,
 * so a colleague's link opens in the reader's own format. Until one is
 * chosen, it follows the browser's language.
 *
 * Held here, outside the scenario store, because every formatted number on
 * screen reads it (src/ui/format.ts, src/ui/parse-number.ts); the workbench
 * redraws its views when it changes (src/ui/App.tsx).
 */
export const NUMBER_FORMAT_KEY = 'raincut.numberFormat';

/** The part of Web Storage the preference uses. */
export interface PreferenceStorage {
  getItem(key: string): string | null;
  setItem(key: string, value: string): void;
}

let current: NumberFormat = DEFAULT_NUMBER_FORMAT;
let storage: PreferenceStorage | null = null;
const listeners = new Set<() => void>();

/**
 * The offered format closest to how a language writes 1234567.5 (its
 * decimal mark, and whether it groups with a comma, a point or a space);
 * the first format when the language is unknown or groups otherwise.
 */
export function formatForLanguage(language: string | undefined): NumberFormat {
  let parts: Intl.NumberFormatPart[];
  try {
    parts = new Intl.NumberFormat(language).formatToParts(1234567.5);
  } catch {
    return DEFAULT_NUMBER_FORMAT;
  }
  const decimal = parts.find((p) => p.type === 'decimal')?.value ?? '.';
  const group = parts.find((p) => p.type === 'group')?.value ?? ',';
  const spaceLike = /^[\s\u00a0\u202f\u2009'’]$/.test(group);
  const found = NUMBER_FORMATS.find(
    (f) => f.decimal === decimal && (f.group === group || (f.group === ' ' && spaceLike)),
  );
  return found ?? (decimal === ',' ? numberFormat('1 234,5') : DEFAULT_NUMBER_FORMAT);
}

/** Sets the format from the saved choice, or from the language when none is saved. Call once at start. */
export function startNumberFormat(options: { storage: PreferenceStorage | null; language?: string | undefined }): void {
  storage = options.storage;
  let saved: string | null;
  try {
    saved = storage?.getItem(NUMBER_FORMAT_KEY) ?? null;
  } catch {
    saved = null;
  }
  setCurrent(isNumberFormatId(saved) ? numberFormat(saved) : formatForLanguage(options.language));
}

function setCurrent(next: NumberFormat): void {
  if (next === current) return;
  current = next;
  for (const listener of listeners) listener();
}

/** The format numbers are shown and read in now. */
export function currentNumberFormat(): NumberFormat {
  return current;
}

/** Chooses a format and keeps the choice in this browser (a failed save keeps it for this session only). */
export function chooseNumberFormat(id: NumberFormatId): void {
  setCurrent(numberFormat(id));
  try {
    storage?.setItem(NUMBER_FORMAT_KEY, current.id);
  } catch {
    // Storage full or switched off: the choice holds until the page closes.
  }
}

function subscribe(listener: () => void): () => void {
  listeners.add(listener);
  return () => listeners.delete(listener);
}

/** The format now, re-rendering the caller when it changes. */
export function useNumberFormat(): NumberFormat {
  return useSyncExternalStore(subscribe, currentNumberFormat, currentNumberFormat);
}
