// Reads a long import off the page's thread (see off-thread.ts): the page stays answering while a 21 MB file
// is decoded and 10⁶ lines are split.
import { packColumns, type ReadReply, type ReadRequest } from './reader-messages';
import { openSource, readSteps, type OpenedSource } from './run-read';

// The worker's global, typed by hand: the project's types are the page's (DOM), not the worker's.
interface WorkerScope {
  onmessage: ((event: MessageEvent<ReadRequest>) => void) | null;
  postMessage(message: ReadReply, transfer: Transferable[]): void;
}
const scope = self as unknown as WorkerScope;
/** The source opened by the first request, kept for the corrections that follow. */
let opened: Promise<OpenedSource> | null = null;

const reply = (message: ReadReply, transfer: Transferable[] = []): void => scope.postMessage(message, transfer);
// No pause between a file's slices: nothing else waits on this thread.
const noPause = (): Promise<void> => Promise.resolve();

async function answer(request: ReadRequest): Promise<void> {
  const { job } = request;
  if (request.source !== undefined) {
    reply({ type: 'stage', job, stage: 'open', lines: 0 });
    opened = openSource(request.source, noPause);
    const source = await opened;
    reply(
      source.ok ? { type: 'opened', job, summary: source.summary } : { type: 'refused', job, message: source.message },
    );
  }
  const source = opened === null ? null : await opened;
  if (source === null) throw new Error('nothing was sent to read');
  if (!source.ok) return;
  const steps = readSteps(source.text, source.summary.lines, request);
  for (let step = steps.next(); ; step = steps.next()) {
    if (step.done) {
      const { value, transfer } = packColumns(step.value.imported);
      reply({ type: 'done', job, outcome: { ...step.value, imported: value } }, transfer);
      return;
    }
    reply({ type: 'stage', job, ...step.value });
  }
}

scope.onmessage = (event: MessageEvent<ReadRequest>) => {
  const { job } = event.data;
  answer(event.data).catch((error: unknown) =>
    reply({ type: 'failed', job, message: error instanceof Error ? error.message : String(error) }),
  );
};
