import { readNumber, type NumberReading } from '../io/number-format';
import { currentNumberFormat } from './number-format/preference';

/**
 * Reads a number a person typed into any field, in the reader's number
 * format: the one reader matched to the screen's formatter (src/ui/format.ts),
 * so "45,000" is forty-five thousand where the screen writes 45,000. Text it
 * cannot read exactly is refused with a message quoting it, never half-read.
 */
export type Parsed = NumberReading;

export function parseNumber(text: string): Parsed {
  return readNumber(text, currentNumberFormat());
}
