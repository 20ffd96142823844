import { useEffect, useState } from 'react';
import { formatCount } from '../format';
import type { ReadStage } from './reader-messages';

const STAGE_WORDS: Record<ReadStage, string> = {
  guess: 'Step 1 of 2: looking at the layout',
  read: 'Step 2 of 2: reading every line',
};

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
  const label = `${STAGE_WORDS[stage]} of ${formatCount(lines)}`;
  return (
    <div className="paste__progress">
      <progress aria-label={label} max={2} value={stage === 'guess' ? 0.5 : 1.5} />
      <span>{`${label}${seconds > 0 ? ` (${seconds} s)` : ''}…`}</span>
      <button type="button" className="button--small" onClick={onCancel}>
        Stop reading
      </button>
    </div>
  );
}
