import { useEffect, useEffectEvent, useRef, useState } from 'react';
import type { ReadOutcome, ReaderContext, ReaderName, SeriesSettings } from '../../io';
import { startTextReader, type TextReader } from './off-thread';
import type { HeldSummary, ReadSource, ReadStage } from './reader-messages';

export type LongReadState<S extends SeriesSettings, R> =
  | { readonly phase: 'idle' }
  | { readonly phase: 'reading'; readonly stage: ReadStage; readonly lines: number }
  | { readonly phase: 'done'; readonly outcome: ReadOutcome<S, R> }
  | { readonly phase: 'failed'; readonly message: string };

export interface LongRead<S extends SeriesSettings, R> {
  readonly state: LongReadState<S, R>;
  /** The first lines and the size of the text, once the reader has opened it; null before. */
  readonly summary: HeldSummary | null;
  /** Stops the read under way (the reader lets the source go). */
  readonly stop: () => void;
}

/**
 * Reads a long text or file with a reader off the page's thread
 * (off-thread.ts), again whenever the corrections change. `source` null:
 * nothing to read. `onRefused` hears why a file cannot be used.
 */
export function useLongRead<S extends SeriesSettings, R>(
  source: ReadSource | null,
  reader: { readonly name: ReaderName; readonly context: ReaderContext },
  corrections: Partial<S>,
  onRefused: (message: string) => void,
): LongRead<S, R> {
  const [state, setState] = useState<LongReadState<S, R>>({ phase: 'idle' });
  const [summary, setSummary] = useState<{ of: ReadSource; summary: HeldSummary } | null>(null);
  const readerRef = useRef<TextReader | null>(null);
  // Whether the reader under way has opened its source (later reads start at the guess).
  const openedRef = useRef(false);
  const refused = useEffectEvent(onRefused);

  useEffect(() => {
    if (source === null) {
      setState({ phase: 'idle' });
      return;
    }
    const started = startTextReader(source);
    readerRef.current = started;
    openedRef.current = false;
    return () => {
      started.stop();
      if (readerRef.current === started) readerRef.current = null;
    };
  }, [source, reader]);

  useEffect(() => {
    const current = readerRef.current;
    if (current === null || source === null) return;
    setState({ phase: 'reading', stage: openedRef.current ? 'guess' : 'open', lines: 0 });
    current.read(
      { reader: reader.name, context: reader.context, corrections },
      {
        stage: (stage, lines) => setState({ phase: 'reading', stage, lines }),
        opened: (held) => {
          openedRef.current = true;
          setSummary({ of: source, summary: held });
        },
        refused: (message) => {
          setState({ phase: 'idle' });
          refused(message);
        },
        done: (outcome) => setState({ phase: 'done', outcome: outcome as ReadOutcome<S, R> }),
        failed: (message) => setState({ phase: 'failed', message }),
      },
    );
  }, [source, reader, corrections]);

  return {
    state,
    // A summary of an earlier source is never shown for this one.
    summary: summary !== null && summary.of === source ? summary.summary : null,
    stop: () => {
      readerRef.current?.stop();
      setState({ phase: 'idle' });
    },
  };
}
