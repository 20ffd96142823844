import { useState, type InputHTMLAttributes } from 'react';
import { isInputError } from '../../core';

export interface TextInputProps extends Omit<
  InputHTMLAttributes<HTMLInputElement>,
  'value' | 'onChange' | 'aria-invalid' | 'aria-describedby'
> {
  readonly id: string;
  /** The stored text. */
  readonly value: string;
  /** Stores typed text; an InputError thrown here (e.g. a name over its cap) is shown below the field. */
  readonly onCommit: (text: string) => void;
  /** Class of the message line (default `field__msg`). */
  readonly messageClassName?: string;
}

interface Refused {
  readonly text: string;
  readonly message: string;
  /** The stored text when this was refused: a change from elsewhere (undo) drops the refused text. */
  readonly over: string;
}

/**
 * A text input that stores as you type and never throws away what was
 * typed: text the store refuses stays in the field, with the reason in a
 * message line read out as it changes, and the store keeps its last good
 * text. Its message line's id is `${id}-msg`.
 */
export function TextInput({ id, value, onCommit, messageClassName = 'field__msg', ...rest }: TextInputProps) {
  const [refused, setRefused] = useState<Refused | null>(null);
  const live = refused !== null && refused.over === value ? refused : null;
  const onChange = (text: string): void => {
    try {
      onCommit(text);
      setRefused(null);
    } catch (error) {
      if (!isInputError(error)) throw error;
      setRefused({ text, message: error.message, over: value });
    }
  };
  return (
    <>
      <input
        {...rest}
        id={id}
        type="text"
        value={live ? live.text : value}
        aria-invalid={live ? true : undefined}
        aria-describedby={`${id}-msg`}
        onChange={(e) => onChange(e.currentTarget.value)}
      />
      <p className={messageClassName} id={`${id}-msg`} aria-live="polite">
        {live?.message}
      </p>
    </>
  );
}
