import type { ReadOutcome } from '../../io';
import { unpackColumns, type ReadReply, type ReadRequest, type ReadStage } from './reader-messages';
import { readSteps } from './run-read';
import { startWorker } from './start-worker';

/** What a reader tells the dialog as it goes. */
export interface ReadListener {
  readonly stage: (stage: ReadStage, lines: number) => void;
  readonly done: (outcome: ReadOutcome) => void;
  readonly failed: (message: string) => void;
}

/** Reads one text, again and again as the user corrects the guesses, until stopped. */
export interface TextReader {
  /** Reads the text with these corrections; a read still running is dropped. */
  readonly read: (request: Omit<ReadRequest, 'job' | 'text'>, listener: ReadListener) => void;
  /** Stops any read and lets the text go. */
  readonly stop: () => void;
  /** 'worker' off the page's thread; 'page' when no worker could start (the one-file build). */
  readonly where: 'worker' | 'page';
}

/** Lets the page draw and answer input between two steps of a read on its own thread. */
const nextTask = (): Promise<void> => new Promise((resolve) => setTimeout(resolve, 0));

/**
 * A reader on the page's thread, for when no worker starts: the same
 * steps, with a pause for input and drawing between them. Each step still
 * runs whole, so a very long text holds the page for the read itself.
 */
function pageReader(text: string): TextReader {
  let job = 0;
  return {
    where: 'page',
    read: (request, listener) => {
      const mine = ++job;
      const steps = readSteps(text, request);
      const run = async (): Promise<void> => {
        try {
          for (let step = steps.next(); ; step = steps.next()) {
            if (mine !== job) return;
            if (step.done) {
              const imported = await unpackColumns(step.value.imported);
              if (mine === job) listener.done({ ...step.value, imported });
              return;
            }
            listener.stage(step.value.stage, step.value.lines);
            await nextTask();
            if (mine !== job) return;
          }
        } catch (error) {
          if (mine === job) listener.failed(error instanceof Error ? error.message : String(error));
        }
      };
      void run();
    },
    stop: () => {
      job++;
    },
  };
}

/**
 * A reader for a long text: in a Web Worker, so the page keeps answering
 * input while 10⁶ lines are split; on the page's own thread, in steps,
 * when no worker can start. A read started while one runs ends the worker
 * (its read cannot be interrupted) and starts a fresh one with the text.
 */
export function startTextReader(text: string, start: () => Worker | null = startWorker): TextReader {
  let worker: Worker | null = start();
  if (worker === null) return pageReader(text);
  let job = 0;
  let busy = false;
  let sent = false;
  let fallback: TextReader | null = null;
  let listener: ReadListener | null = null;
  let last: Omit<ReadRequest, 'job' | 'text'> | null = null;

  const attach = (w: Worker): void => {
    w.onmessage = (event: MessageEvent<ReadReply>) => {
      const reply = event.data;
      if (reply.job !== job || listener === null) return;
      if (reply.type === 'stage') listener.stage(reply.stage, reply.lines);
      else if (reply.type === 'done') {
        busy = false;
        const mine = job;
        const { outcome } = reply;
        void unpackColumns(outcome.imported).then((imported) => {
          // A read asked for while the columns were copied replaces this one.
          if (mine === job && listener !== null) listener.done({ ...outcome, imported });
        });
      } else {
        busy = false;
        listener.failed(reply.message);
      }
    };
    // A worker that fails to load (a refused script, a file:// page) leaves the read to the page.
    w.onerror = (event) => {
      event.preventDefault();
      w.terminate();
      worker = null;
      fallback = pageReader(text);
      if (last !== null && listener !== null) fallback.read(last, listener);
    };
  };
  attach(worker);

  return {
    get where() {
      return fallback === null ? 'worker' : 'page';
    },
    read: (request, next) => {
      last = request;
      listener = next;
      if (fallback !== null) {
        fallback.read(request, next);
        return;
      }
      if (busy && worker !== null) {
        worker.terminate();
        worker = start();
        sent = false;
        if (worker === null) {
          fallback = pageReader(text);
          fallback.read(request, next);
          return;
        }
        attach(worker);
      }
      job++;
      busy = true;
      (worker as Worker).postMessage({ ...request, job, ...(sent ? {} : { text }) } satisfies ReadRequest);
      sent = true;
    },
    stop: () => {
      job++;
      listener = null;
      worker?.terminate();
      worker = null;
      fallback?.stop();
    },
  };
}
