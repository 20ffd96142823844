import { DISPLAY_UNITS, UNIT_LABELS, convertDischarge, type DischargeUnit, type UnitSystem } from '../../core';
import { formatValue } from '../format';

/**
 * Discharge at the screen's edge: the store holds m³/s, the screen shows
 * m³/s (SI) or ft³/s (US). Factors come from the core's units module.
 */
function dischargeUnit(system: UnitSystem): DischargeUnit {
  return DISPLAY_UNITS[system].discharge;
}

export function dischargeUnitText(system: UnitSystem): string {
  const unit = dischargeUnit(system);
  return UNIT_LABELS[unit] ?? unit;
}

export function dischargeToDisplay(m3s: number, system: UnitSystem): number {
  return convertDischarge(m3s, 'm3/s', dischargeUnit(system));
}

export function dischargeFromDisplay(value: number, system: UnitSystem): number {
  return convertDischarge(value, dischargeUnit(system), 'm3/s');
}

/** "1.75 m³/s" in the screen's units. */
export function dischargeText(m3s: number, system: UnitSystem): string {
  return `${formatValue(dischargeToDisplay(m3s, system))} ${dischargeUnitText(system)}`;
}
