import { useState } from 'react';
import type { UnitHydrographTransform } from '../../core';
import { FieldFrame, fieldDescribedBy } from '../fields/FieldFrame';
import { readTyped } from '../fields/read-typed';
import { formatForField, formatValue } from '../format';

/** Separators between ordinates: line breaks (a spreadsheet column), tabs (a row) and semicolons. */
const SEPARATOR = /[\r\n\t;]+/;

/** The ordinates as the field writes them: one per line, in the reader's number format. */
export function ordinatesText(values: ArrayLike<number>): string {
  return Array.from(values, (v) => formatForField(v)).join('\n');
}

/**
 * Reads pasted or typed ordinates through the one number reader, each within
 * what a unit hydrograph ordinate can mean. Returns the values, or the first
 * problem naming the ordinate (counted from 1) and what was typed there.
 */
export function readOrdinates(
  text: string,
): { readonly ok: true; readonly values: number[] } | { readonly ok: false; readonly message: string } {
  const parts = text
    .split(SEPARATOR)
    .map((p) => p.trim())
    .filter((p) => p !== '');
  if (parts.length === 0) return { ok: false, message: 'Paste or type the ordinates, one per line.' };
  const values: number[] = [];
  for (let i = 0; i < parts.length; i++) {
    const read = readTyped(parts[i] as string, { quantity: 'unitDischarge', unit: 'm³/s per mm' });
    if (!read.ok) return { ok: false, message: `Ordinate ${i + 1}: ${read.message}` };
    values.push(read.value);
  }
  return { ok: true, values };
}

/**
 * The ordinates of a unit hydrograph of the user's own, pasted or typed, one
 * per line (or tab- or semicolon-separated). Text that cannot be applied
 * stays with its reason and "Not applied"; the ordinates in use stay as they
 * were.
 */
export function OrdinatesField({
  transform,
  onCommit,
}: {
  transform: UnitHydrographTransform;
  /** Stores the ordinates; an InputError thrown here (the core's check) is shown as the reason. */
  onCommit: (values: number[]) => string | null;
}) {
  const id = 'uh-ordinates';
  const [draft, setDraft] = useState<{ text: string; message: string | null } | null>(null);
  const text = draft?.text ?? ordinatesText(transform.ordinatesM3sPerMm);
  const message = draft?.message ?? null;
  const count = transform.ordinatesM3sPerMm.length;
  return (
    <FieldFrame
      id={id}
      label="Unit hydrograph ordinates (m³/s per mm)"
      bad={Boolean(message)}
      hint={`One per line (or separated by tabs or semicolons), the first at the start of the excess; ${count} in use.`}
      message={message}
    >
      <textarea
        id={id}
        rows={5}
        spellCheck={false}
        value={text}
        aria-invalid={message ? true : undefined}
        aria-describedby={fieldDescribedBy(id, true)}
        onChange={(e) => {
          const typed = e.currentTarget.value;
          const read = readOrdinates(typed);
          const refused = read.ok ? onCommit(read.values) : read.message;
          setDraft({
            text: typed,
            message:
              refused === null ? null : `${refused} Not applied; still the ${formatValue(count)} ordinates in use.`,
          });
        }}
        onBlur={() => {
          if (draft && draft.message === null) setDraft(null);
        }}
      />
    </FieldFrame>
  );
}
