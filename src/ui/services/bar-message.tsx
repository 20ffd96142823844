import { createContext, useContext, type ReactNode } from 'react';

/**
 * The one message line under the scenario bar: what the last share, file,
 * export or pin action did, or what stopped it. A new action replaces it.
 * It floats over the top of the page (share.css) and never pushes the chart
 * down; screen readers hear it through its live region.
 */
export interface BarMessage {
  /** 'problem' is announced at once (role alert); 'done' politely (role status). */
  readonly tone: 'done' | 'problem';
  readonly title: string;
  readonly body?: ReactNode;
}

/** The accessible name of the message line. */
const MESSAGE_LABEL = 'Scenario tools message';

export type ShowMessage = (message: BarMessage | null) => void;

const MessageContext = createContext<ShowMessage>(() => {});

export const BarMessageProvider = MessageContext.Provider;

export function useBarMessage(): ShowMessage {
  return useContext(MessageContext);
}

export function BarMessageView({ message, onDismiss }: { message: BarMessage | null; onDismiss: () => void }) {
  if (!message) return null;
  const problem = message.tone === 'problem';
  return (
    <div
      className={`bar-message bar-message--${message.tone}`}
      role={problem ? 'alert' : 'status'}
      aria-live={problem ? 'assertive' : 'polite'}
      aria-label={MESSAGE_LABEL}
    >
      <div className="bar-message__text">
        <p>
          <strong>{message.title}</strong>
        </p>
        {message.body}
      </div>
      <button type="button" className="share-button--small" onClick={onDismiss}>
        Dismiss message
      </button>
    </div>
  );
}

/** A list of problems as the scenario layer reports them (each message starts with its field path). */
export function ProblemList({
  problems,
  label,
}: {
  problems: readonly { path: string; message: string }[];
  label: string;
}) {
  return (
    <ul className="bar-message__problems" aria-label={label}>
      {problems.map((p, i) => (
        <li key={i} data-path={p.path}>
          {p.message}
        </li>
      ))}
    </ul>
  );
}
