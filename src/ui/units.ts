import {
  DISPLAY_UNITS,
  SYSTEM_AREA_UNITS,
  UNIT_LABELS,
  convertArea,
  convertDepth,
  convertRate,
  convertVolume,
  type AreaUnit,
  type ParamUnit,
  type UnitSystem,
  type VolumeUnit,
} from '../core';
import type { PlausibleQuantity } from '../io/plausible';

/**
 * Conversion at the screen's edge: the store holds SI, the screen shows the
 * chosen system. Every factor comes from the core's units module (exact
 * definitions); nothing here knows a factor of its own.
 */
export type Quantity = 'depth' | 'rate' | 'area' | 'volume';

export function displayUnit(q: Quantity, system: UnitSystem): string {
  return DISPLAY_UNITS[system][q];
}

export function unitText(unit: string): string {
  return UNIT_LABELS[unit] ?? unit;
}

export function toDisplay(q: Quantity, valueSI: number, system: UnitSystem): number {
  const u = DISPLAY_UNITS[system];
  switch (q) {
    case 'depth':
      return convertDepth(valueSI, 'mm', u.depth);
    case 'rate':
      return convertRate(valueSI, 'mm/h', u.rate);
    case 'area':
      return convertArea(valueSI, 'm2', u.area);
    case 'volume':
      return convertVolume(valueSI, 'm3', u.volume);
  }
}

export function fromDisplay(q: Quantity, value: number, system: UnitSystem): number {
  const u = DISPLAY_UNITS[system];
  switch (q) {
    case 'depth':
      return convertDepth(value, u.depth, 'mm');
    case 'rate':
      return convertRate(value, u.rate, 'mm/h');
    case 'area':
      return convertArea(value, u.area, 'm2');
    case 'volume':
      return convertVolume(value, u.volume, 'm3');
  }
}

/** The quantity a method parameter's unit converts as, or null for units that do not change ('1/h', '-'). */
function paramQuantity(unit: ParamUnit | string): Quantity | null {
  if (unit === 'mm/h') return 'rate';
  if (unit === 'mm') return 'depth';
  return null;
}

/** How a parameter's unit reads on screen in a system ('' for dimensionless). */
export function paramUnitText(unit: ParamUnit | string, system: UnitSystem): string {
  const q = paramQuantity(unit);
  if (q) return unitText(displayUnit(q, system));
  return unit === '-' ? '' : unit;
}

export function paramToDisplay(unit: ParamUnit | string, valueSI: number, system: UnitSystem): number {
  const q = paramQuantity(unit);
  return q ? toDisplay(q, valueSI, system) : valueSI;
}

export function paramFromDisplay(unit: ParamUnit | string, value: number, system: UnitSystem): number {
  const q = paramQuantity(unit);
  return q ? fromDisplay(q, value, system) : value;
}

/** The plausible range (src/io/plausible.ts) a parameter's unit falls under, or undefined when the core's bounds say it all. */
export function paramPlausible(unit: ParamUnit | string): PlausibleQuantity | undefined {
  if (unit === 'mm/h') return 'rate';
  if (unit === 'mm') return 'depth';
  if (unit === '1/h') return 'decay';
  return undefined;
}

/** Area units offered in the catchment-area field, per system (the display unit first). */
export const AREA_CHOICES: Readonly<Record<UnitSystem, readonly AreaUnit[]>> = SYSTEM_AREA_UNITS;

/** Volume units offered for an observed runoff volume. */
export const VOLUME_CHOICES: readonly VolumeUnit[] = ['m3', 'ML', 'ft3', 'acre-ft'];
