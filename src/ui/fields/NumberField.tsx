import { useState, type ReactNode } from 'react';
import { isInputError } from '../../core';
import { formatForField } from '../format';
import { parseNumber } from '../parse-number';
import { FieldFrame, fieldDescribedBy } from './FieldFrame';

export interface NumberFieldProps {
  readonly id: string;
  /** Visible label; also the field's accessible name. */
  readonly label: string;
  /** Unit shown after the field (part of the label, so it is read out too). */
  readonly unit?: string;
  /** The stored value, SI (null: nothing stored yet). */
  readonly value: number | null;
  readonly toDisplay?: (si: number) => number;
  readonly fromDisplay?: (display: number) => number;
  /** Checks the typed number as shown, before conversion; returns the message to show, or null. */
  readonly checkShown?: ((display: number) => string | null) | undefined;
  /** Checks a candidate SI value; returns the message to show, or null when it may be stored. */
  readonly check?: (si: number) => string | null;
  /** Stores a value; an InputError thrown here is shown as the field's message. */
  readonly onCommit: (si: number) => void;
  readonly readOnly?: boolean;
  /** A message from elsewhere about this field (e.g. no calibration answer), shown in the same place. */
  readonly note?: ReactNode;
  readonly hint?: ReactNode;
  /** Shown right after the input (e.g. a unit picker). */
  readonly after?: ReactNode;
  readonly placeholder?: string | undefined;
  /**
   * What an empty field means, when it is more than a missing number: stored
   * as nothing (`store`, e.g. automatic), or refused with this `message`.
   */
  readonly empty?: EmptyText | undefined;
}

export type EmptyText = { readonly store: () => void } | { readonly message: string };

interface Draft {
  readonly text: string;
  /** The SI value this text stored ('empty': stored as nothing), or null when the text is not valid and nothing was stored. */
  readonly stored: number | 'empty' | null;
  readonly message: string | null;
}

const same = (x: number) => x;

/**
 * A number field that checks as you type and never throws away what was
 * typed: invalid text stays in the field with the reason beside it, and the
 * store keeps its last good value. When the stored value changes from
 * elsewhere (undo, a drag, a unit switch), the field shows the new value.
 */
export function NumberField({
  id,
  label,
  unit,
  value,
  toDisplay = same,
  fromDisplay = same,
  checkShown,
  check,
  onCommit,
  readOnly = false,
  note,
  hint,
  after,
  placeholder,
  empty,
}: NumberFieldProps) {
  const [draft, setDraft] = useState<Draft | null>(null);
  // The typed text stands while it is invalid, or while it is what the store holds.
  const now = value === null ? 'empty' : value;
  const live = draft !== null && (draft.stored === null || draft.stored === now) ? draft : null;
  const text = live ? live.text : value === null ? '' : formatForField(toDisplay(value));
  const message = live?.message ?? null;

  /** Stores what the text means; an InputError from the store is shown as the message. */
  const store = (typed: string, stored: number | 'empty', commit: () => void): void => {
    try {
      commit();
      setDraft({ text: typed, stored, message: null });
    } catch (error) {
      if (!isInputError(error)) throw error;
      setDraft({ text: typed, stored: null, message: error.message });
    }
  };

  const onChange = (typed: string): void => {
    if (empty && typed.trim() === '') {
      if ('message' in empty) setDraft({ text: typed, stored: null, message: empty.message });
      else store(typed, 'empty', empty.store);
      return;
    }
    const parsed = parseNumber(typed);
    if (!parsed.ok) {
      setDraft({ text: typed, stored: null, message: parsed.message });
      return;
    }
    const refused = checkShown?.(parsed.value) ?? null;
    if (refused) {
      setDraft({ text: typed, stored: null, message: refused });
      return;
    }
    const si = fromDisplay(parsed.value);
    const problem = check?.(si) ?? null;
    if (problem) {
      setDraft({ text: typed, stored: null, message: problem });
      return;
    }
    store(typed, si, () => onCommit(si));
  };

  return (
    <FieldFrame id={id} label={label} unit={unit} bad={Boolean(message)} hint={hint} message={message ?? note ?? null}>
      <div className="field__row">
        <input
          id={id}
          type="text"
          inputMode="decimal"
          autoComplete="off"
          spellCheck={false}
          value={text}
          readOnly={readOnly}
          placeholder={placeholder}
          aria-invalid={message ? true : undefined}
          aria-describedby={fieldDescribedBy(id, Boolean(hint))}
          onChange={(e) => onChange(e.currentTarget.value)}
          onBlur={() => {
            // A good value is shown tidied once the field is left; a bad one stays as typed.
            if (draft && draft.message === null) setDraft(null);
          }}
          onKeyDown={(e) => {
            if (e.key === 'Escape' && draft) {
              e.preventDefault();
              setDraft(null);
            }
          }}
        />
        {after}
      </div>
    </FieldFrame>
  );
}
