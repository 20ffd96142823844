import { useEffect, useState } from 'react';
import { formatCount } from '../format';
import type { ReadStage } from './reader-messages';

const STAGE_WORDS: Record<ReadStage, string> = {
  open: 'Step 1 of 3: opening the text',
  guess: 'Step 2 of 3: looking at the layout',
  read: 'Step 3 of 3: reading every line',
};

const STAGE_DONE: Record<ReadStage, number> = { open: 0.5, guess: 1.5, read: 2.5 };

export interface ReadProgressProps {
  readonly stage: ReadStage;
  readonly lines: number;
  readonly onCancel: () => void;
}

/** How far a long read has come, with the time it has taken so far and a way to stop it. */
export function ReadProgress({ stage, lines, onCancel }: ReadProgressProps) {
  const [started] = useState(() => Date.now());
  const [seconds, setSeconds] = useState(0);
  useEffect(() => {
    const timer = setInterval(() => setSeconds(Math.floor((Date.now() - started) / 1000)), 500);
    return () => clearInterval(timer);
  }, [started]);
  const label = stage === 'open' ? STAGE_WORDS.open : `${STAGE_WORDS[stage]} of ${formatCount(lines)} lines`;
  return (
    <div className="paste__progress">
      <progress aria-label={label} max={3} value={STAGE_DONE[stage]} />
      <span>{`${label}${seconds > 0 ? ` (${seconds} s)` : ''}…`}</span>
      <button type="button" className="button--small" onClick={onCancel}>
        Stop reading
      </button>
    </div>
  );
}
