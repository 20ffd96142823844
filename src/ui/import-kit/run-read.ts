import { READERS, type ReadOutcome, type SeriesSettings } from '../../io';
import { readFailure, textRefusal } from './read-file';
import { summarise, type HeldSummary, type ReadRequest, type ReadSource, type ReadStage } from './reader-messages';

/** A source opened: its text and what the page shows of it, or why a file cannot be used. */
export type OpenedSource =
  | { readonly ok: true; readonly text: string; readonly summary: HeldSummary }
  | { readonly ok: false; readonly message: string };

/**
 * The text of a read's source, on whichever thread runs the read: a paste as
 * it is; a file decoded as Blob.text decodes it (decode-slices.ts), with
 * `pause` between slices, and refused when it is not text.
 */
export async function openSource(source: ReadSource, pause?: () => Promise<void>): Promise<OpenedSource> {
  let text: string;
  if ('text' in source) text = source.text;
  else {
    try {
      // Loaded as read-file.ts loads it (a module both imported and loaded on demand costs the first screen a runtime).
      text = await (await import('./decode-slices')).decodeInSlices(source.file, pause);
    } catch (error) {
      return { ok: false, message: readFailure(source.name, error) };
    }
    const refused = textRefusal(text, source.name, source.what);
    if (refused !== null) return { ok: false, message: refused };
  }
  return { ok: true, text, summary: summarise(text) };
}

/**
 * One read of an opened text (`lines` long), in its stages, on whichever
 * thread runs it: guess the layout (from the head of the text), then read it
 * all with the guesses and the user's corrections.
 */
export function* readSteps(
  text: string,
  lines: number,
  request: Omit<ReadRequest, 'source' | 'job'>,
): Generator<{ stage: ReadStage; lines: number }, ReadOutcome, void> {
  yield { stage: 'guess', lines };
  const reader = READERS[request.reader] as unknown as {
    guess: (t: string, c: ReadRequest['context']) => SeriesSettings;
    read: (t: string, s: SeriesSettings, c: ReadRequest['context']) => ReadOutcome;
  };
  const guessed = reader.guess(text, request.context);
  yield { stage: 'read', lines };
  return reader.read(text, { ...guessed, ...request.corrections }, request.context);
}
