/**
 * Numbers as the screen writes them and as people type them back, under one
 * of a few number formats (how the thousands are grouped and which mark
 * starts the decimals). One writer and one reader per format, so whatever
 * the screen shows can be typed back and means the same number: "45,000"
 * under 1,234.5 is forty-five thousand, never 45.
 *
 * The reader refuses rather than guesses: a mark the format does not use, a
 * group of other than three digits, a unit or a word is refused with a
 * message that quotes what was typed. Pure: no DOM, no locale of the
 * browser's (the format is a choice the user makes, see src/ui/number-format).
 */

export type NumberFormatId = '1,234.5' | '1 234.5' | '1 234,5' | '1.234,5';

export interface NumberFormat {
  readonly id: NumberFormatId;
  /** How the chooser names it. */
  readonly label: string;
  /** The mark that starts the decimals. */
  readonly decimal: '.' | ',';
  /** What stands between groups of three digits: a comma, a point, or a space. */
  readonly group: ',' | '.' | ' ';
}

/**
 * The space between groups is written as a narrow no-break space (U+202F),
 * as ISO 80000-1 writes digit groups with a small space, and so a number never
 * breaks across lines; typed back, any space does.
 */
export const GROUP_SPACE = '\u202f';
/** Spaces a person or a copy from another program may put between digit groups. */
const SPACES = ' \u00a0\u202f\u2009';

export const NUMBER_FORMATS: readonly NumberFormat[] = [
  { id: '1,234.5', label: '1,234.5 (comma groups, decimal point)', decimal: '.', group: ',' },
  { id: '1 234.5', label: '1 234.5 (space groups, decimal point)', decimal: '.', group: ' ' },
  { id: '1 234,5', label: '1 234,5 (space groups, decimal comma)', decimal: ',', group: ' ' },
  { id: '1.234,5', label: '1.234,5 (point groups, decimal comma)', decimal: ',', group: '.' },
];

export const DEFAULT_NUMBER_FORMAT = NUMBER_FORMATS[0] as NumberFormat;

export function isNumberFormatId(id: unknown): id is NumberFormatId {
  return NUMBER_FORMATS.some((f) => f.id === id);
}

/** The format with this id (the default for anything else). */
export function numberFormat(id: unknown): NumberFormat {
  return NUMBER_FORMATS.find((f) => f.id === id) ?? DEFAULT_NUMBER_FORMAT;
}

// ---------------------------------------------------------------------------
// Writing

export interface WriteOptions {
  /** Significant figures kept (1 to 15). */
  readonly significant: number;
  /** From this size up, numbers are rounded to whole units instead (results: 1000, so 69,973 rather than 69,970). */
  readonly wholeFrom?: number;
}

/**
 * Beyond these sizes a number is written with an exponent ("1.2e15"), so no
 * text on screen ever runs to dozens of digits. A quadrillion is far past any
 * quantity the workbench holds (see plausible.ts).
 */
const EXPONENT_FROM = 1e15;
const EXPONENT_BELOW = 1e-6;

/** The plain decimal digits of a finite number below 1e21: "-1234.5", "0.000012". */
function plainDigits(x: number): string {
  // String() writes numbers from 1e-7 to 1e21 without an exponent; smaller ones never reach here.
  return String(x);
}

function groupDigits(int: string, group: string): string {
  if (int.length <= 3) return int;
  const lead = int.length % 3 || 3;
  let out = int.slice(0, lead);
  for (let i = lead; i < int.length; i += 3) out += group + int.slice(i, i + 3);
  return out;
}

/**
 * A number as the screen shows it under a format: grouped thousands, the
 * format's decimal mark, an exponent for the very large and very small, and
 * "—" for anything that is not a finite number (never "NaN" or "Infinity").
 */
export function writeNumber(x: number, format: NumberFormat, options: WriteOptions): string {
  if (!Number.isFinite(x)) return '—';
  const significant = Math.min(15, Math.max(1, Math.round(options.significant)));
  const abs = Math.abs(x);
  const wholeFrom = options.wholeFrom ?? Infinity;
  // Whole numbers round half away from zero, as the figures do.
  const r = abs >= wholeFrom && abs < EXPONENT_FROM ? Math.round(abs) : Number(abs.toPrecision(significant));
  if (r === 0) return '0';
  const sign = x < 0 ? '-' : '';
  if (!(r < EXPONENT_FROM) || r < EXPONENT_BELOW) return sign + exponentText(abs, significant, format);
  const digits = plainDigits(r);
  const point = digits.indexOf('.');
  const int = point === -1 ? digits : digits.slice(0, point);
  const frac = point === -1 ? '' : digits.slice(point + 1);
  const group = format.group === ' ' ? GROUP_SPACE : format.group;
  return `${sign}${groupDigits(int, group)}${frac === '' ? '' : format.decimal + frac}`;
}

/** "1.235e15": the mantissa to `significant` figures without trailing zeros, rounded down where rounding up would pass the largest double. */
function exponentText(abs: number, significant: number, format: NumberFormat): string {
  let [mantissa, exponent] = abs.toExponential(significant - 1).split('e') as [string, string];
  if (!Number.isFinite(Number(`${mantissa}e${exponent}`))) {
    const step = 10 ** -(significant - 1);
    mantissa = (Number(mantissa) - step).toFixed(significant - 1);
  }
  const trimmed = mantissa.includes('.') ? mantissa.replace(/0+$/, '').replace(/\.$/, '') : mantissa;
  return `${trimmed.replace('.', format.decimal)}e${Number(exponent)}`;
}

// ---------------------------------------------------------------------------
// Reading

export type NumberReading =
  { readonly ok: true; readonly value: number } | { readonly ok: false; readonly message: string };

/** The longest piece of typed text quoted back in a message; longer text is cut with "…". */
const QUOTE_CHARS = 24;

/** Typed text as a message quotes it: trimmed, and cut short when long (a 300-digit paste is not repeated). */
export function quoteTyped(text: string): string {
  const t = text.trim();
  return `“${t.length > QUOTE_CHARS ? `${t.slice(0, QUOTE_CHARS - 1)}…` : t}”`;
}

const escape = (ch: string): string => ch.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');

/**
 * The pattern of a number with this decimal mark and digit grouping (null:
 * none), capturing sign, whole part, fraction, bare fraction and exponent.
 * Digits may always be written ungrouped; groups are of three digits.
 * Shared by typed fields and by pasted cells (src/io/numbers.ts).
 */
export function numberPattern(decimal: '.' | ',', group: ',' | '.' | ' ' | null): RegExp {
  const d = escape(decimal);
  const g = group === null ? null : group === ' ' ? `[${SPACES}]` : escape(group);
  const whole = g === null ? '(\\d+)' : `(\\d+|\\d{1,3}(?:${g}\\d{3})+)`;
  return new RegExp(`^([+-]?)(?:${whole}(?:${d}(\\d*))?|${d}(\\d+))(?:[eE]([+-]?\\d+))?$`);
}

/** The number a match of numberPattern stands for (may be ±Infinity when it is too large; -0 comes back as 0). */
export function matchedValue(m: RegExpExecArray): number {
  const [, sign = '', whole, fraction, bare, exponent] = m;
  const digits = whole === undefined ? `0.${bare ?? ''}` : `${whole.replace(/\D/g, '')}.${fraction ?? ''}`;
  const value = Number(`${sign}${digits.replace(/\.$/, '')}${exponent === undefined ? '' : `e${exponent}`}`);
  return Object.is(value, -0) ? 0 : value;
}

const PATTERNS = new Map<NumberFormatId, RegExp>(NUMBER_FORMATS.map((f) => [f.id, numberPattern(f.decimal, f.group)]));

const WORDS = { '.': 'point', ',': 'comma' } as const;

/** Why a text is not a number under the format, pointing at the fix. */
function refusal(text: string, format: NumberFormat): string {
  const q = quoteTyped(text);
  const name = `the number format ${format.id}`;
  const other: '.' | ',' = format.decimal === '.' ? ',' : '.';
  if (/^[+-]?(?:inf(?:inity)?|nan)$/i.test(text)) return `${q} is not a number.`;
  if (/^[+-]?[\d.,\s\u00a0\u202f\u2009]*\d[\d.,\s\u00a0\u202f\u2009]*(?:[eE][+-]?\d+)?$/.test(text)) {
    // Only digits and marks: a mark in the wrong place, or one the format does not use.
    if (text.includes(other) && format.group !== other) {
      return `${q} has a ${WORDS[other]}, but ${name} writes decimals with a ${WORDS[format.decimal]}; write ${example(format)}, or choose another number format.`;
    }
    if (format.group !== ' ' && /[\s\u00a0\u202f\u2009]/.test(text)) {
      const groupWord = WORDS[format.group as '.' | ','];
      return `${q} has a space inside: ${name} groups digits with a ${groupWord} (${writeNumber(1234567, format, { significant: 7 })}) or not at all (1234567); type one number, without spaces.`;
    }
    if (format.group === ' ' ? /[\s\u00a0\u202f\u2009]/.test(text) : text.includes(format.group)) {
      const groupWord = format.group === ' ' ? 'space' : WORDS[format.group as '.' | ','];
      return `${q}: in ${name} a ${groupWord} stands only between groups of three digits (${writeNumber(1234567, format, { significant: 7 })}) and decimals start with a ${WORDS[format.decimal]} (${example(format)}).`;
    }
    return `${q} is not a number: it has more than one ${WORDS[format.decimal]}, or a mark out of place.`;
  }
  if (/^[+-]?[\d.,]+\s*\p{L}/u.test(text)) return `${q} is not a plain number; leave out any unit or word.`;
  return `${q} is not a number.`;
}

/** "2.5" or "2,5": how the format writes two and a half. */
function example(format: NumberFormat): string {
  return `2${format.decimal}5`;
}

/**
 * Reads a number a person typed, under the format: surrounding spaces
 * ignored, groups of three digits with the format's separator (or none), the
 * format's decimal mark, an optional exponent and sign (the unicode minus
 * too). Anything else is refused with a message quoting what was typed.
 */
export function readNumber(text: string, format: NumberFormat): NumberReading {
  const t = text.trim().replace(/\u2212/g, '-');
  if (t === '') return { ok: false, message: 'Enter a number.' };
  const m = (PATTERNS.get(format.id) as RegExp).exec(t);
  if (!m) return { ok: false, message: refusal(t, format) };
  const value = matchedValue(m);
  if (!Number.isFinite(value)) return { ok: false, message: `${quoteTyped(t)} is too large to be a number here.` };
  return { ok: true, value };
}
