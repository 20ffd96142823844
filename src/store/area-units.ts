import { SYSTEM_AREA_UNITS, type AreaUnit, type UnitSystem } from '../core';
import type { StorageLike } from '../scenario/stored-slot';

/**
 * The unit the catchment area is typed and shown in, per unit system: a
 * preference of the user's, beside the SI / US switch, kept in the store so
 * the area field, the CSV export and the printed report read the same one,
 * and in the browser's storage so it outlives a reload. It is not part of
 * the scenario document (whose schema stays at version 5): the area itself
 * is stored in m² and a colleague's link opens in the reader's own choice.
 */
export type AreaUnits = Readonly<Record<UnitSystem, AreaUnit>>;

/** Where the browser keeps the choice. */
export const AREA_UNITS_KEY = 'raincut.areaUnits';

/** Each system's display unit (hectares, acres) until the user picks another. */
export const DEFAULT_AREA_UNITS: AreaUnits = {
  si: SYSTEM_AREA_UNITS.si[0] ?? 'ha',
  us: SYSTEM_AREA_UNITS.us[0] ?? 'acre',
};

/** True when `unit` is one of the area units of `system`. */
export function isAreaUnitOf(system: UnitSystem, unit: unknown): unit is AreaUnit {
  return SYSTEM_AREA_UNITS[system].some((u) => u === unit);
}

/**
 * The saved choice: each system's unit when the saved text names one of that
 * system's units, else its default. Text that is not ours (damaged, hand
 * edited) falls back quietly: a display preference is never worth a message.
 */
export function readAreaUnits(storage: Pick<StorageLike, 'getItem'> | null): AreaUnits {
  let saved: unknown = null;
  try {
    const text = storage?.getItem(AREA_UNITS_KEY) ?? null;
    saved = text === null ? null : JSON.parse(text);
  } catch {
    saved = null;
  }
  const pick = (system: UnitSystem): AreaUnit => {
    const unit = saved !== null && typeof saved === 'object' ? (saved as Record<string, unknown>)[system] : undefined;
    return isAreaUnitOf(system, unit) ? unit : DEFAULT_AREA_UNITS[system];
  };
  return { si: pick('si'), us: pick('us') };
}

/** Writes the choice (a failed write keeps it for this page only: storage full or switched off). */
export function writeAreaUnits(storage: Pick<StorageLike, 'setItem'> | null, units: AreaUnits): void {
  try {
    storage?.setItem(AREA_UNITS_KEY, JSON.stringify({ si: units.si, us: units.us }));
  } catch {
    // The choice holds until the page closes.
  }
}
