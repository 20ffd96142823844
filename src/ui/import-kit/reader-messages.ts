import { plainArrayInSlices } from '../../store/next-task';
import { type ReadOutcome, type ReaderContext, type ReaderName, type SeriesSettings } from '../../io';

/**
 * What a long read starts from: a text already on the page (a paste), or a
 * chosen file the reader decodes itself, so that megabytes of a file's text
 * never pass through the page's thread (issue 11). `name` and `what` word
 * the refusal of a file that is not text ("the rainfall").
 */
export type ReadSource =
  { readonly text: string } | { readonly file: Blob; readonly name: string; readonly what: string };

/** What the page asks of a reader: the source (sent once, the first time), the kind of import, the user's corrections. */
export interface ReadRequest {
  readonly job: number;
  readonly reader: ReaderName;
  readonly context: ReaderContext;
  readonly corrections: Partial<SeriesSettings>;
  /** Sent with the first request only; later ones read the text the reader kept. */
  readonly source?: ReadSource;
}

/** Lines of a held text shown, so the reader sees what was pasted or opened. */
export const HELD_LINES = 12;

/** What the page shows of a held text in place of the text itself: its first lines, its lines and characters. */
export interface HeldSummary {
  readonly head: string;
  readonly lines: number;
  readonly chars: number;
}

/**
 * What a reader says back: the stage it is at; the summary of the text once
 * opened; that the file cannot be used (the message names it); the outcome;
 * or why the read failed.
 */
export type ReadReply =
  | { readonly type: 'stage'; readonly job: number; readonly stage: ReadStage; readonly lines: number }
  | { readonly type: 'opened'; readonly job: number; readonly summary: HeldSummary }
  | { readonly type: 'refused'; readonly job: number; readonly message: string }
  | { readonly type: 'done'; readonly job: number; readonly outcome: ReadOutcome }
  | { readonly type: 'failed'; readonly job: number; readonly message: string };

/** Opening the source (decoding a file), guessing the layout, reading every line. */
export type ReadStage = 'open' | 'guess' | 'read';

/** Lines in a text: the line breaks, plus one for a last line without a break. */
export function countLines(text: string): number {
  if (text === '') return 0;
  let n = 0;
  for (let i = text.indexOf('\n'); i !== -1; i = text.indexOf('\n', i + 1)) n++;
  return text.endsWith('\n') ? n : n + 1;
}

/** The first HELD_LINES lines of a text, its lines and its length. */
export function summarise(text: string): HeldSummary {
  let end = -1;
  for (let k = 0; k < HELD_LINES; k++) {
    const next = text.indexOf('\n', end + 1);
    if (next === -1) {
      // A last line without a break, if there is one.
      if (end + 1 < text.length) end = text.length;
      break;
    }
    end = next;
  }
  return { head: text.slice(0, end), lines: countLines(text), chars: text.length };
}

/**
 * Long columns of numbers cross between threads as Float64Array buffers,
 * handed over rather than copied value by value (a structured clone of 10⁶
 * numbers is read on the receiving thread, element by element).
 */
export function packColumns(imported: unknown): { value: unknown; transfer: ArrayBuffer[] } {
  if (imported === null || typeof imported !== 'object') return { value: imported, transfer: [] };
  const packed: Record<string, unknown> = {};
  const transfer: ArrayBuffer[] = [];
  for (const [key, v] of Object.entries(imported)) {
    if (v instanceof Float64Array) {
      packed[key] = v;
      // Two columns on one buffer hand it over once.
      if (!transfer.includes(v.buffer as ArrayBuffer)) transfer.push(v.buffer as ArrayBuffer);
    } else if (Array.isArray(v) && v.every((x) => typeof x === 'number')) {
      const column = Float64Array.from(v as number[]);
      packed[key] = column;
      transfer.push(column.buffer);
    } else packed[key] = v;
  }
  return { value: packed, transfer };
}

/**
 * The plain arrays back from packColumns, or from a reader that gave columns
 * of doubles: copied a slice at a time with a pause between slices, so 10⁶
 * numbers never hold the page for one long task (issue 11).
 */
export async function unpackColumns<R>(imported: unknown): Promise<R> {
  if (imported === null || typeof imported !== 'object') return imported as R;
  const plain: Record<string, unknown> = {};
  for (const [key, v] of Object.entries(imported))
    plain[key] = v instanceof Float64Array ? await plainArrayInSlices(v) : v;
  return plain as R;
}
