import type { Storm, UnitSystem } from '../../core';
import { quoteTyped } from '../../io/number-format';
import { breachMessage, checkPlausible, checkStormDepths, type PlausibleQuantity } from '../../io/plausible';
import { formatValue } from '../format';
import { parseNumber, type Parsed } from '../parse-number';
import { displayUnit, toDisplay, unitText } from '../units';

/** What a typed number stands for, so it can be checked against its plausible range. */
export interface TypedQuantity {
  readonly quantity: PlausibleQuantity;
  /** The typed number (as shown) in SI; the identity when the field shows SI. */
  readonly toSI?: (shown: number) => number;
  /** An SI value as shown; the inverse of toSI. */
  readonly fromSI?: (si: number) => number;
  /** The unit the field shows, e.g. "mm" or "min" ('' for none). */
  readonly unit?: string;
}

const same = (x: number): number => x;

/**
 * The one way a typed number is read anywhere on screen: the reader's number
 * format (parse-number), then the quantity's plausible range
 * (src/io/plausible.ts), refused with a message that quotes what was typed
 * and states the bound in the field's own unit. The value comes back as typed
 * (display units).
 */
export function readTyped(text: string, what?: TypedQuantity): Parsed {
  const parsed = parseNumber(text);
  if (!parsed.ok || what === undefined) return parsed;
  const refused = implausible(text, parsed.value, what);
  return refused === null ? parsed : { ok: false, message: refused };
}

/** Why a typed number (as shown) is beyond what its quantity can mean, quoting the text; null when it is not. */
export function implausible(text: string, shown: number, what: TypedQuantity): string | null {
  const toSI = what.toSI ?? same;
  const fromSI = what.fromSI ?? same;
  const breach = checkPlausible(what.quantity, toSI(shown));
  if (breach === null) return null;
  const unit = what.unit ? ` ${what.unit}` : '';
  return breachMessage(breach, `${quoteTyped(text)}${unit}`, `${formatValue(fromSI(breach.limit))}${unit}`);
}

/**
 * Why a storm made by a tool (scaled, designed) cannot be used: a bar, or
 * the whole storm, holding more than a rainfall depth can be. Null when it can.
 */
export function stormDepthRefusal(storm: Storm, system: UnitSystem): string | null {
  const found = checkStormDepths(storm);
  if (found === null) return null;
  const depth = (mm: number): string =>
    `${formatValue(toDisplay('depth', mm, system))} ${unitText(displayUnit('depth', system))}`;
  const mm = storm.depthsMm[found.bar] as number;
  return breachMessage(found.breach, `Bar ${found.bar + 1} would hold ${depth(mm)}, which`, depth(found.breach.limit));
}
