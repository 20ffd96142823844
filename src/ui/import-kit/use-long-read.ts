import { useEffect, useRef, useState } from 'react';
import type { ReadOutcome, ReaderContext, ReaderName, SeriesSettings } from '../../io';
import { startTextReader, type TextReader } from './off-thread';
import type { ReadStage } from './reader-messages';

export type LongReadState<S extends SeriesSettings, R> =
  | { readonly phase: 'idle' }
  | { readonly phase: 'reading'; readonly stage: ReadStage; readonly lines: number }
  | { readonly phase: 'done'; readonly outcome: ReadOutcome<S, R> }
  | { readonly phase: 'failed'; readonly message: string };

export interface LongRead<S extends SeriesSettings, R> {
  readonly state: LongReadState<S, R>;
  /** Stops the read under way (the reader lets the text go). */
  readonly stop: () => void;
}

/**
 * Reads a long text with a reader off the page's thread (off-thread.ts),
 * again whenever the corrections change. `text` null: nothing to read.
 */
export function useLongRead<S extends SeriesSettings, R>(
  text: string | null,
  reader: { readonly name: ReaderName; readonly context: ReaderContext } | undefined,
  corrections: Partial<S>,
): LongRead<S, R> {
  const [state, setState] = useState<LongReadState<S, R>>({ phase: 'idle' });
  const readerRef = useRef<TextReader | null>(null);

  useEffect(() => {
    if (text === null || reader === undefined) {
      setState({ phase: 'idle' });
      return;
    }
    const started = startTextReader(text);
    readerRef.current = started;
    return () => {
      started.stop();
      if (readerRef.current === started) readerRef.current = null;
    };
  }, [text, reader]);

  useEffect(() => {
    const current = readerRef.current;
    if (current === null || reader === undefined) return;
    setState({ phase: 'reading', stage: 'guess', lines: 0 });
    current.read(
      { reader: reader.name, context: reader.context, corrections },
      {
        stage: (stage, lines) => setState({ phase: 'reading', stage, lines }),
        done: (outcome) => setState({ phase: 'done', outcome: outcome as ReadOutcome<S, R> }),
        failed: (message) => setState({ phase: 'failed', message }),
      },
    );
  }, [text, reader, corrections]);

  return {
    state,
    stop: () => {
      readerRef.current?.stop();
      setState({ phase: 'idle' });
    },
  };
}
