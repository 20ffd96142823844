// Reads a long import off the page's thread (see off-thread.ts): the page stays answering while 10⁶ lines are split.
import { packColumns, type ReadReply, type ReadRequest } from './reader-messages';
import { readSteps } from './run-read';

// The worker's global, typed by hand: the project's types are the page's (DOM), not the worker's.
interface WorkerScope {
  onmessage: ((event: MessageEvent<ReadRequest>) => void) | null;
  postMessage(message: ReadReply, transfer: Transferable[]): void;
}
const scope = self as unknown as WorkerScope;
let text = '';

const reply = (message: ReadReply, transfer: Transferable[] = []): void => scope.postMessage(message, transfer);

scope.onmessage = (event: MessageEvent<ReadRequest>) => {
  const request = event.data;
  if (request.text !== undefined) text = request.text;
  try {
    const steps = readSteps(text, request);
    for (let step = steps.next(); ; step = steps.next()) {
      if (step.done) {
        const { value, transfer } = packColumns(step.value.imported);
        reply({ type: 'done', job: request.job, outcome: { ...step.value, imported: value } }, transfer);
        return;
      }
      reply({ type: 'stage', job: request.job, ...step.value });
    }
  } catch (error) {
    reply({ type: 'failed', job: request.job, message: error instanceof Error ? error.message : String(error) });
  }
};
