import { useState, type InputHTMLAttributes, type TextareaHTMLAttributes } from 'react';
import { attempt } from '../../core';

type Owned = 'id' | 'value' | 'onChange' | 'aria-invalid' | 'aria-describedby';

interface TextFieldProps {
  readonly id: string;
  /** The stored text. */
  readonly value: string;
  /** Stores typed text; an InputError thrown here (e.g. a name over its cap) is shown below the field. */
  readonly onCommit: (text: string) => void;
  /** Class of the message line (default `field__msg`). */
  readonly messageClassName?: string;
}

export interface TextInputProps extends Omit<InputHTMLAttributes<HTMLInputElement>, Owned>, TextFieldProps {}
export interface TextAreaProps extends Omit<TextareaHTMLAttributes<HTMLTextAreaElement>, Owned>, TextFieldProps {}

interface Refused {
  readonly text: string;
  readonly message: string;
  /** The stored text when this was refused: a change from elsewhere (undo) drops the refused text. */
  readonly over: string;
}

/** What the field shows and says: typed text the store refused stays, with the reason, until the stored text changes. */
function useRefusable(value: string, onCommit: (text: string) => void) {
  const [refused, setRefused] = useState<Refused | null>(null);
  const live = refused !== null && refused.over === value ? refused : null;
  const onChange = (text: string): void => {
    const r = attempt(() => onCommit(text));
    setRefused(r.ok ? null : { text, message: r.error.message, over: value });
  };
  return { shown: live ? live.text : value, message: live?.message, invalid: live ? true : undefined, onChange };
}

/**
 * A text input that stores as you type and never throws away what was
 * typed: text the store refuses stays in the field, with the reason in a
 * message line read out as it changes, and the store keeps its last good
 * text. Its message line's id is `${id}-msg`.
 */
export function TextInput({ id, value, onCommit, messageClassName = 'field__msg', ...rest }: TextInputProps) {
  const field = useRefusable(value, onCommit);
  return (
    <>
      <input
        {...rest}
        id={id}
        type="text"
        value={field.shown}
        aria-invalid={field.invalid}
        aria-describedby={`${id}-msg`}
        onChange={(e) => field.onChange(e.currentTarget.value)}
      />
      <p className={messageClassName} id={`${id}-msg`} aria-live="polite">
        {field.message}
      </p>
    </>
  );
}

/** TextInput's several-line form (notes), with the same handling of refused text. */
export function TextArea({ id, value, onCommit, messageClassName = 'field__msg', ...rest }: TextAreaProps) {
  const field = useRefusable(value, onCommit);
  return (
    <>
      <textarea
        {...rest}
        id={id}
        value={field.shown}
        aria-invalid={field.invalid}
        aria-describedby={`${id}-msg`}
        onChange={(e) => field.onChange(e.currentTarget.value)}
      />
      <p className={messageClassName} id={`${id}-msg`} aria-live="polite">
        {field.message}
      </p>
    </>
  );
}
