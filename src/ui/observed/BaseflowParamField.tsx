import { useState } from 'react';
import { describeBaseflowRange, isInputError, type BaseflowParam } from '../../core';
import { formatForField } from '../format';
import { parseNumber } from '../parse-number';

export interface BaseflowParamFieldProps {
  readonly id: string;
  readonly param: BaseflowParam;
  /** The stored value in the core's unit; undefined when the parameter is automatic. */
  readonly value: number | undefined;
  /** Stores a value, or undefined for automatic; an InputError thrown here is shown as the field's message. */
  readonly onSet: (value: number | undefined) => void;
  readonly hint: string;
  /** Extra words about the present value (where a sample lies, say). */
  readonly note?: string | null;
}

interface Draft {
  readonly text: string;
  /** What this text stored: a value, 'auto' for automatic, or null when nothing was stored. */
  readonly stored: number | 'auto' | null;
  readonly message: string | null;
}

/**
 * A start of rise is a 0-based sample index in the core; people count
 * samples from 1, as the paste's problems and the preview do.
 */
const shown = (param: BaseflowParam, v: number): number => (param.unit === 'sample' ? v + 1 : v);
const stored = (param: BaseflowParam, v: number): number => (param.unit === 'sample' ? v - 1 : v);

export function paramUnitWords(param: BaseflowParam): string {
  return param.unit === 'h' ? 'h' : param.unit === 'sample' ? 'sample no.' : '';
}

/**
 * One parameter of a baseflow method, from the core's table: label, unit,
 * bounds and whether it may be left empty (automatic). As in the other
 * number fields, text that cannot be stored stays with its reason beside it,
 * and the store keeps its last good value.
 */
export function BaseflowParamField({ id, param, value, onSet, hint, note }: BaseflowParamFieldProps) {
  const [draft, setDraft] = useState<Draft | null>(null);
  const now = value === undefined ? 'auto' : value;
  const live = draft !== null && (draft.stored === null || draft.stored === now) ? draft : null;
  const text = live ? live.text : value === undefined ? '' : formatForField(shown(param, value));
  const message = live?.message ?? null;
  const unit = paramUnitWords(param);

  const onChange = (typed: string): void => {
    if (typed.trim() === '') {
      if (!param.optional) {
        setDraft({ text: typed, stored: null, message: `Enter ${param.label.toLowerCase()}: ${describeBaseflowRange(param)}.` });
        return;
      }
      try {
        onSet(undefined);
        setDraft({ text: typed, stored: 'auto', message: null });
      } catch (error) {
        if (!isInputError(error)) throw error;
        setDraft({ text: typed, stored: null, message: error.message });
      }
      return;
    }
    const parsed = parseNumber(typed);
    if (!parsed.ok) {
      setDraft({ text: typed, stored: null, message: parsed.message });
      return;
    }
    // The core's bounds count samples from 0; the field counts them from 1, so it says so itself.
    if (param.unit === 'sample' && !(Number.isInteger(parsed.value) && parsed.value >= 1)) {
      setDraft({ text: typed, stored: null, message: `${param.label} must be a whole sample number, 1 or more (got ${parsed.value}).` });
      return;
    }
    const v = stored(param, parsed.value);
    try {
      onSet(v);
      setDraft({ text: typed, stored: v, message: null });
    } catch (error) {
      if (!isInputError(error)) throw error;
      setDraft({ text: typed, stored: null, message: error.message });
    }
  };

  return (
    <div className={`field${message ? ' field--bad' : ''}`}>
      <label htmlFor={id}>
        {param.label}
        {unit ? (
          <>
            {' '}
            <span className="field__unit">({unit})</span>
          </>
        ) : null}
      </label>
      <div className="field__row">
        <input
          id={id}
          type="text"
          inputMode="decimal"
          autoComplete="off"
          spellCheck={false}
          value={text}
          placeholder={param.optional ? 'automatic' : undefined}
          aria-invalid={message ? true : undefined}
          aria-describedby={`${id}-hint ${id}-msg`}
          onChange={(e) => onChange(e.currentTarget.value)}
          onBlur={() => {
            if (draft && draft.message === null) setDraft(null);
          }}
          onKeyDown={(e) => {
            if (e.key === 'Escape' && draft) {
              e.preventDefault();
              setDraft(null);
            }
          }}
        />
      </div>
      <p className="field__hint" id={`${id}-hint`}>
        {hint}
        {note ? ` ${note}` : ''}
      </p>
      <p className="field__msg" id={`${id}-msg`} aria-live="polite">
        {message}
      </p>
    </div>
  );
}
