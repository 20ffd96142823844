import type { ReactNode } from 'react';
import { FieldFrame, fieldDescribedBy } from '../../fields/FieldFrame';

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
export function ToolField({
  id,
  label,
  unit,
  text,
  onText,
  message,
  hint,
  placeholder,
  inputMode = 'decimal',
}: ToolFieldProps) {
  return (
    <FieldFrame
      id={id}
      label={label}
      unit={unit}
      className="tool-field"
      bad={Boolean(message)}
      hint={hint}
      message={message}
    >
      <input
        id={id}
        type="text"
        inputMode={inputMode}
        autoComplete="off"
        spellCheck={false}
        value={text}
        placeholder={placeholder}
        aria-invalid={message ? true : undefined}
        aria-describedby={fieldDescribedBy(id, Boolean(hint))}
        onChange={(e) => onText(e.currentTarget.value)}
      />
    </FieldFrame>
  );
}
