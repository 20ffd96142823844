import type { ReactNode } from 'react';

export interface ToolFieldProps {
  readonly id: string;
  readonly label: string;
  readonly unit?: string;
  readonly text: string;
  readonly onText: (text: string) => void;
  /** Why the typed text cannot be used, shown beside the field; the text itself is kept. */
  readonly message: string | null;
  readonly hint?: ReactNode;
  readonly placeholder?: string;
  readonly inputMode?: 'decimal' | 'numeric' | 'text';
}

/**
 * A labelled text field for a storm tool. Unlike the method fields it stores
 * nothing as you type: the tool's button applies it, and a value it refuses
 * stays in the field with the reason beside it.
 */
export function ToolField({ id, label, unit, text, onText, message, hint, placeholder, inputMode = 'decimal' }: ToolFieldProps) {
  const describedBy = [hint ? `${id}-hint` : null, `${id}-msg`].filter(Boolean).join(' ');
  return (
    <div className={`field tool-field${message ? ' field--bad' : ''}`}>
      <label htmlFor={id}>
        {label}
        {unit ? (
          <>
            {' '}
            <span className="field__unit">({unit})</span>
          </>
        ) : null}
      </label>
      <input
        id={id}
        type="text"
        inputMode={inputMode}
        autoComplete="off"
        spellCheck={false}
        value={text}
        placeholder={placeholder}
        aria-invalid={message ? true : undefined}
        aria-describedby={describedBy}
        onChange={(e) => onText(e.currentTarget.value)}
      />
      {hint ? (
        <p className="field__hint" id={`${id}-hint`}>
          {hint}
        </p>
      ) : null}
      <p className="field__msg" id={`${id}-msg`} aria-live="polite">
        {message}
      </p>
    </div>
  );
}
