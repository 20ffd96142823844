import { READERS, type ReadOutcome, type SeriesSettings } from '../../io';
import { countLines, type ReadRequest, type ReadStage } from './reader-messages';

/**
 * One read, in its stages, on whichever thread runs it: count the lines,
 * guess the layout (from the head of the text), then read it all with the
 * guesses and the user's corrections.
 */
export function* readSteps(
  text: string,
  request: Omit<ReadRequest, 'text' | 'job'>,
): Generator<{ stage: ReadStage; lines: number }, ReadOutcome, void> {
  const lines = countLines(text);
  yield { stage: 'guess', lines };
  const reader = READERS[request.reader] as unknown as {
    guess: (t: string, c: ReadRequest['context']) => SeriesSettings;
    read: (t: string, s: SeriesSettings, c: ReadRequest['context']) => ReadOutcome;
  };
  const guessed = reader.guess(text, request.context);
  yield { stage: 'read', lines };
  return reader.read(text, { ...guessed, ...request.corrections }, request.context);
}
