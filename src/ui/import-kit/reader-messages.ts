import { plainArrayInSlices } from '../../store/next-task';
import { type ReadOutcome, type ReaderContext, type ReaderName, type SeriesSettings } from '../../io';

/** What the page asks of a reader: the text (sent once, the first time), the kind of import, the user's corrections. */
export interface ReadRequest {
  readonly job: number;
  readonly reader: ReaderName;
  readonly context: ReaderContext;
  readonly corrections: Partial<SeriesSettings>;
  /** Sent with the first request only; later ones read the text the reader kept. */
  readonly text?: string;
}

/** What a reader says back: the stage it is at, or the outcome, or why it failed. */
export type ReadReply =
  | { readonly type: 'stage'; readonly job: number; readonly stage: ReadStage; readonly lines: number }
  | { readonly type: 'done'; readonly job: number; readonly outcome: ReadOutcome }
  | { readonly type: 'failed'; readonly job: number; readonly message: string };

export type ReadStage = 'guess' | 'read';

/** Lines in a text: the line breaks, plus one for a last line without a break. */
export function countLines(text: string): number {
  if (text === '') return 0;
  let n = 0;
  for (let i = text.indexOf('\n'); i !== -1; i = text.indexOf('\n', i + 1)) n++;
  return text.endsWith('\n') ? n : n + 1;
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
