import type { NumericParam, UnitSystem } from '../../core';
import type { Totals } from '../../store/totals';
import { formatValue } from '../format';
import { paramToDisplay, paramUnitText } from '../units';

/**
 * How a fitted parameter is written wherever it appears (the matching
 * panel, the printed report, the compare table), so that a value is called
 * fitted only where it is in use, and a proposal always reads as one.
 */

export { labelInSentence } from '../../scenario/label-text';
import { labelInSentence } from '../../scenario/label-text';

/** "11.5 mm/h", "72": a parameter value as the screen shows it, with its unit. */
export function paramAmount(param: NumericParam, si: number, units: UnitSystem): string {
  const unit = paramUnitText(param.unit, units);
  return `${formatValue(paramToDisplay(param.unit, si, units))}${unit ? ` ${unit}` : ''}`;
}

/** The "Fitted parameter" cell of the report and the compare table. */
export function fittedCellText(t: Totals, units: UnitSystem): string {
  if (t.fitted) return `${t.fitted.param.label} ${paramAmount(t.fitted.param, t.fitted.value, units)}`;
  if (t.proposed) {
    return `— (not in use; Fit would set ${labelInSentence(t.proposed.param.label)} to ${paramAmount(t.proposed.param, t.proposed.value, units)})`;
  }
  return `— (${t.fitNote ?? 'none'})`;
}
