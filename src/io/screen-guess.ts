import type { UnitSystem } from '../core';
import { guessRainSettings, rainHintsFromName, type RainImportSettings } from './rain-import';
import type { ImportHints } from './series';
import { headOf } from './layout-guess';
import { readTable } from './table-text';

/** Lines past the skipped ones read to find the header: it is the first non-empty one. */
const HEAD_LINES = 50;

/**
 * The import layer's guesses, with what the screen knows (`hints`: the
 * reader's number format, the storm's present step) and one addition: when
 * nothing in the text names the unit (no "mm" or "in" in the value column's
 * name), the values are taken to be in the unit the screen shows, inches on
 * a US customary screen. It is a guess like the others, shown and correctable.
 */
export function guessForScreen(text: string, units: UnitSystem, hints: ImportHints = {}): RainImportSettings {
  const guessed = guessRainSettings(text, hints);
  if (units !== 'us' || guessed.unit === 'in') return guessed;
  let named = false;
  if (guessed.hasHeader) {
    const head = headOf(text, guessed.skipLines + HEAD_LINES);
    const name = readTable(head, guessed).header?.cells[guessed.valueColumn - 1] ?? '';
    named = rainHintsFromName(name).unit !== undefined;
  }
  return named ? guessed : { ...guessed, unit: 'in' };
}
