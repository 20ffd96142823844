/**
 * Reads a number typed by a person: surrounding spaces ignored, a decimal
 * point or a decimal comma (not both), an optional exponent. Anything else is
 * refused with a message that quotes what was typed.
 */
export type Parsed = { readonly ok: true; readonly value: number } | { readonly ok: false; readonly message: string };

const NUMBER = /^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/;

export function parseNumber(text: string): Parsed {
  const t = text.trim();
  if (t === '') return { ok: false, message: 'Enter a number.' };
  const hasComma = t.includes(',');
  if (hasComma && t.includes('.')) {
    return {
      ok: false,
      message: `“${t}” mixes a decimal point and a comma; write it with one decimal mark and no thousands separators.`,
    };
  }
  if ((t.match(/,/g) ?? []).length > 1) {
    return {
      ok: false,
      message: `“${t}” has more than one comma; write it with one decimal mark and no thousands separators.`,
    };
  }
  const normal = hasComma ? t.replace(',', '.') : t;
  if (!NUMBER.test(normal)) return { ok: false, message: `“${t}” is not a number.` };
  const value = Number(normal);
  if (!Number.isFinite(value)) return { ok: false, message: `“${t}” is too large.` };
  return { ok: true, value };
}
