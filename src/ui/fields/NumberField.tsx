import { useEffect, useRef, useState, type ReactNode } from 'react';
import { attempt } from '../../core';
import type { PlausibleQuantity } from '../../io/plausible';
import { formatForField, formatValue } from '../format';
import { FieldFrame, fieldDescribedBy } from './FieldFrame';
import { implausible } from './read-typed';
import { parseNumber } from '../parse-number';

/** How a field's edits reach the undo history: one typing session (focus to blur) is one step. */
export interface FieldEdit {
  /** Names this typing session; every edit of the session merges into one undo step. */
  readonly coalesceKey: string;
  readonly session: true;
}

/** The store's side of a field's edits (the workbench actions have it). */
export interface FieldHistory {
  /** Takes back the step this session recorded, if it is still the last one; true when it did. */
  withdraw(coalesceKey: string): boolean;
}

export interface NumberFieldProps {
  readonly id: string;
  /** Visible label; also the field's accessible name. */
  readonly label: string;
  /** Unit shown after the field (part of the label, so it is read out too). */
  readonly unit?: string;
  /** The unit values are written in when the label carries none (a unit picker stands beside the field). */
  readonly shownUnit?: string | undefined;
  /** The stored value, SI (null: nothing stored yet). */
  readonly value: number | null;
  readonly toDisplay?: (si: number) => number;
  readonly fromDisplay?: (display: number) => number;
  /** Checks the typed number as shown, before conversion; returns the message to show, or null. */
  readonly checkShown?: ((display: number) => string | null) | undefined;
  /**
   * The quantity whose plausible range (src/io/plausible.ts) the value must
   * fall in; `siPerValue` when the stored value is not in the range's SI unit
   * (a step held in minutes: 1/60).
   */
  readonly plausible?:
    PlausibleQuantity | { readonly quantity: PlausibleQuantity; readonly siPerValue: number } | undefined;
  /** Checks a candidate SI value; returns the message to show, or null when it may be stored. */
  readonly check?: (si: number) => string | null;
  /** Stores a value; an InputError thrown here is shown as the field's message. */
  readonly onCommit: (si: number, edit: FieldEdit) => void;
  /**
   * Where the edits are recorded. With it, text that cannot be applied takes
   * the whole typing session back out of the undo history; without it (a
   * setting held by a dialog), the field stores its starting value again.
   */
  readonly history?: FieldHistory | undefined;
  /** Told whether the text in the field is applied (false while it is refused). */
  readonly onApplied?: ((applied: boolean) => void) | undefined;
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

export type EmptyText = { readonly store: (edit: FieldEdit) => void } | { readonly message: string };

/** What was stored: an SI value, 'empty' (stored as nothing), or null for nothing at all. */
type Held = number | 'empty' | null;

interface Draft {
  readonly text: string;
  /** The SI value this text stored ('empty': stored as nothing), or null when the text is not applied. */
  readonly stored: number | 'empty' | null;
  readonly message: string | null;
  /** What the store held when this typing session began: what stays in use while the text is refused. */
  readonly base: Held;
  /** The session's name in the undo history. */
  readonly key: string;
  /** True while the store holds a value this session put there. */
  readonly committed: boolean;
}

const same = (x: number) => x;
let sessions = 0;

/**
 * A number field that checks as you type and never throws away what was
 * typed. While the text is good it is applied at once, the whole typing
 * session being one undo step. While it is not (not a number, out of range,
 * beyond what the quantity can mean) the text stays with the reason and
 * "Not applied" beside it, and the store, the chart and the undo history go
 * back to the value from before the session, never to a half-typed one
 * ("120" for a curve number does not leave CN 12 behind). When the stored
 * value changes from elsewhere (undo, a drag, a unit switch), the field shows
 * the new value.
 */
export function NumberField({
  id,
  label,
  unit,
  shownUnit,
  value,
  toDisplay = same,
  fromDisplay = same,
  checkShown,
  plausible,
  check,
  onCommit,
  history,
  onApplied,
  readOnly = false,
  note,
  hint,
  after,
  placeholder,
  empty,
}: NumberFieldProps) {
  const [draft, setDraft] = useState<Draft | null>(null);
  // The typed text stands while it is refused, or while it is what the store holds.
  const now: Held = value === null ? 'empty' : value;
  const live = draft !== null && (draft.stored === null || draft.stored === now) ? draft : null;
  const text = live ? live.text : value === null ? '' : formatForField(toDisplay(value));
  const message = live?.message ?? null;
  const applied = live === null || live.stored !== null;

  const told = useRef<boolean | null>(null);
  const tell = useRef(onApplied);
  tell.current = onApplied;
  useEffect(() => {
    if (told.current === applied) return;
    told.current = applied;
    tell.current?.(applied);
  }, [applied]);
  // A field taken off screen with refused text in it leaves nothing refused behind.
  useEffect(
    () => () => {
      if (told.current === false) tell.current?.(true);
    },
    [],
  );

  const valueUnit = unit || shownUnit || '';
  const shown = (held: Held): string => {
    if (held === null) return '';
    if (held === 'empty') return placeholder ?? 'empty';
    const value = formatValue(toDisplay(held));
    // A unit led by "±" ("± %") puts its sign before the number: "± 10 %".
    if (valueUnit.startsWith('± ')) return `± ${value} ${valueUnit.slice(2)}`;
    return `${value}${valueUnit ? ` ${valueUnit}` : ''}`;
  };

  /** Puts the session's starting value back in the store; returns whether the store holds it again. */
  const restore = (session: Draft): boolean => {
    if (!session.committed) return true;
    if (history?.withdraw(session.key)) return true;
    const r = attempt(() => {
      if (session.base === 'empty') {
        if (empty && 'store' in empty) empty.store({ coalesceKey: session.key, session: true });
        else return false;
      } else if (session.base !== null) onCommit(session.base, { coalesceKey: session.key, session: true });
      else return false;
      return true;
    });
    return r.ok && r.value;
  };

  const refuse = (session: Draft, typed: string, reason: string): void => {
    const back = restore(session);
    const still = back && session.base !== null ? ` Not applied; still ${shown(session.base)}.` : ' Not applied.';
    setDraft({ ...session, text: typed, stored: null, message: `${reason}${still}`, committed: !back });
  };

  /** Stores what the text means; an InputError from the store is refused like any other. */
  const store = (session: Draft, typed: string, stored: number | 'empty', commit: () => void): void => {
    const r = attempt(commit);
    if (r.ok) setDraft({ ...session, text: typed, stored, message: null, committed: true });
    else refuse(session, typed, r.error.message);
  };

  const onChange = (typed: string): void => {
    const held: Held = value === null ? (empty && 'store' in empty ? 'empty' : null) : value;
    // A refused text whose session stored nothing follows changes made elsewhere (an undo) meanwhile.
    const session: Draft =
      live === null
        ? { text: typed, stored: null, message: null, base: held, key: `field:${id}#${++sessions}`, committed: false }
        : live.stored === null && !live.committed && live.base !== held
          ? { ...live, base: held }
          : live;
    const edit: FieldEdit = { coalesceKey: session.key, session: true };
    if (empty && typed.trim() === '') {
      if ('message' in empty) refuse(session, typed, empty.message);
      else store(session, typed, 'empty', () => empty.store(edit));
      return;
    }
    const parsed = parseNumber(typed);
    if (!parsed.ok) return refuse(session, typed, parsed.message);
    const refused = checkShown?.(parsed.value) ?? null;
    if (refused) return refuse(session, typed, refused);
    const si = fromDisplay(parsed.value);
    // The field's own rule first (its words are the most specific), then what the quantity can mean at all.
    const problem = check?.(si) ?? null;
    if (problem) return refuse(session, typed, problem);
    const range = typeof plausible === 'string' ? { quantity: plausible, siPerValue: 1 } : plausible;
    const beyond =
      range &&
      implausible(typed, parsed.value, {
        quantity: range.quantity,
        toSI: (v) => fromDisplay(v) * range.siPerValue,
        fromSI: (s) => toDisplay(s / range.siPerValue),
        unit: valueUnit,
      });
    if (beyond) return refuse(session, typed, beyond);
    store(session, typed, si, () => onCommit(si, edit));
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
            // A good value is shown tidied once the field is left; a refused one stays as typed.
            if (draft && draft.message === null) setDraft(null);
          }}
          onKeyDown={(e) => {
            if (e.key === 'Escape' && draft) {
              // Esc drops the text; the store already holds the session's last good value (or its start).
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
