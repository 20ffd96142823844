import type { ReactNode } from 'react';

export interface FieldFrameProps {
  readonly id: string;
  /** Visible label; also the field's accessible name. */
  readonly label: string;
  /** Unit shown after the label (part of it, so it is read out too). */
  readonly unit?: string | undefined;
  /** Extra class beside `field` (the frame adds `field--bad` itself while there is a message). */
  readonly className?: string | undefined;
  readonly bad: boolean;
  readonly hint?: ReactNode;
  /** What the message line says (why the text cannot be used, or a note). */
  readonly message: ReactNode;
  /** The input, and whatever stands beside it. */
  readonly children: ReactNode;
}

/** The ids the input names in `aria-describedby`: the hint (when there is one), then the message. */
export function fieldDescribedBy(id: string, hasHint: boolean): string {
  return hasHint ? `${id}-hint ${id}-msg` : `${id}-msg`;
}

/**
 * The frame every text field shares: label with its unit, the input, a hint
 * and a message line that is read out as it changes.
 */
export function FieldFrame({ id, label, unit, className, bad, hint, message, children }: FieldFrameProps) {
  return (
    <div className={`field${className ? ` ${className}` : ''}${bad ? ' field--bad' : ''}`}>
      <label htmlFor={id}>
        {label}
        {unit ? (
          <>
            {' '}
            <span className="field__unit">({unit})</span>
          </>
        ) : null}
      </label>
      {children}
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
