import { scenarioFromFileText } from '../scenario/file';
import { readScenarioLink } from '../scenario/link-read';
import { problem } from '../scenario/problems';
import { copyNumbers, PACK_FROM, readLarge } from './large-read';
import type { ScenarioReadAnswer, ScenarioReadRequest } from './scenario-read-messages';

/**
 * The scenario reader's work (scenario-read.worker.ts runs it off the
 * page; apart from the worker's wiring so tests run it in Node).
 */

/**
 * A deep copy with every long list of numbers a Float64Array (as large-read.ts `pack`), a part met twice
 * packed once: the message keeps it one object on the page (an event's storm is the workbench's own).
 */
function packShared(value: unknown, buffers: ArrayBuffer[], seen = new Map<object, unknown>()): unknown {
  if (value === null || typeof value !== 'object') return value;
  const known = seen.get(value);
  if (known !== undefined) return known;
  let out: unknown;
  if (Array.isArray(value)) {
    const list = value as unknown[];
    if (list.length >= PACK_FROM) {
      const column = new Float64Array(list.length);
      if (copyNumbers(list, column, 0, list.length) === list.length) {
        buffers.push(column.buffer);
        out = column;
      }
    }
    out ??= list.map((v) => packShared(v, buffers, seen));
  } else {
    const copy: Record<string, unknown> = {};
    for (const [k, v] of Object.entries(value)) copy[k] = packShared(v, buffers, seen);
    out = copy;
  }
  seen.set(value, out);
  return out;
}

async function read(request: ScenarioReadRequest): Promise<ScenarioReadAnswer> {
  const { job } = request;
  if (request.kind === 'link') {
    const link = readScenarioLink(request.fragment);
    return link.ok ? { job, ok: true, packed: link.scenario } : { job, ok: false, problems: link.problems };
  }
  if (request.kind === 'record') {
    const large = await readLarge(request.marker);
    if (!large.ok) return { job, ok: false, problems: [problem(large.message)] };
    return { job, ok: true, packed: large.scenario };
  }
  let text: string;
  try {
    text = await request.file.text();
  } catch (error) {
    return {
      job,
      ok: false,
      problems: [problem(`It could not be read (${error instanceof Error ? error.message : String(error)}).`)],
    };
  }
  const parsed = scenarioFromFileText(text);
  return parsed.ok ? { job, ok: true, packed: parsed.scenario } : { job, ok: false, problems: parsed.problems };
}

/** The answer to a request, and the buffers to hand over with it (its packed columns'). */
export async function answerRead(
  request: ScenarioReadRequest,
): Promise<{ readonly answer: ScenarioReadAnswer; readonly transfer: ArrayBuffer[] }> {
  try {
    const answer = await read(request);
    if (!answer.ok) return { answer, transfer: [] };
    const transfer: ArrayBuffer[] = [];
    return { answer: { ...answer, packed: packShared(answer.packed, transfer) }, transfer };
  } catch (error) {
    // A safety net only (the readers never throw): the page must never wait for an answer that is not coming.
    const why = error instanceof Error ? error.message : String(error);
    return {
      answer: { job: request.job, ok: false, problems: [problem(`It could not be read (unexpected error: ${why}).`)] },
      transfer: [],
    };
  }
}
