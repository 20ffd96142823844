import type { ReadOutcome } from '../../io';
import {
  unpackColumns,
  type HeldSummary,
  type ReadReply,
  type ReadRequest,
  type ReadSource,
  type ReadStage,
} from './reader-messages';
import { openSource, readSteps, type OpenedSource } from './run-read';
import { startWorker } from './start-worker';

/** What a reader tells the dialog as it goes. */
export interface ReadListener {
  readonly stage: (stage: ReadStage, lines: number) => void;
  /** The source is open: what the page shows of its text. */
  readonly opened: (summary: HeldSummary) => void;
  /** The file cannot be used (not text, empty, unreadable); the message names it. Nothing more follows. */
  readonly refused: (message: string) => void;
  readonly done: (outcome: ReadOutcome) => void;
  readonly failed: (message: string) => void;
}

type Request = Omit<ReadRequest, 'job' | 'source'>;

/** Reads one source, again and again as the user corrects the guesses, until stopped. */
export interface TextReader {
  /** Reads the source with these corrections; a read still running is dropped. */
  readonly read: (request: Request, listener: ReadListener) => void;
  /** Stops any read and lets the source go. */
  readonly stop: () => void;
  /** 'worker' off the page's thread; 'page' when no worker could start (the one-file build). */
  readonly where: 'worker' | 'page';
}

/**
 * Marks the moment a read's outcome is back on the page, before the dialog
 * draws it: the UI benchmark (test/browser/bench-ui.mjs) tells the reading's
 * tasks from the preview's by it.
 */
export const READ_DONE_MARK = 'raincut:read-done';

/** Lets the page draw and answer input between two steps of a read on its own thread. */
const nextTask = (): Promise<void> => new Promise((resolve) => setTimeout(resolve, 0));

/**
 * A reader on the page's thread, for when no worker starts: the same
 * steps, with a pause for input and drawing between them (a file is
 * decoded a slice at a time). Each step still runs whole, so a very long
 * text holds the page for the read itself.
 */
function pageReader(source: ReadSource): TextReader {
  let job = 0;
  let opening: Promise<OpenedSource> | null = null;
  let told = false;
  return {
    where: 'page',
    read: (request, listener) => {
      const mine = ++job;
      const run = async (): Promise<void> => {
        try {
          if (opening === null) {
            listener.stage('open', 0);
            opening = openSource(source);
          }
          const opened = await opening;
          if (mine !== job) return;
          if (!told) {
            // Told once, to the first read still wanted when the source is open.
            told = true;
            if (opened.ok) listener.opened(opened.summary);
            else listener.refused(opened.message);
          }
          if (!opened.ok) return;
          const steps = readSteps(opened.text, opened.summary.lines, request);
          for (let step = steps.next(); ; step = steps.next()) {
            if (mine !== job) return;
            if (step.done) {
              const imported = await unpackColumns(step.value.imported);
              if (mine !== job) return;
              performance.mark(READ_DONE_MARK);
              listener.done({ ...step.value, imported });
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
 * A reader for a long text or file: in a Web Worker, so the page keeps
 * answering input while a 21 MB file is decoded and 10⁶ lines are split
 * (a File crosses to the worker as a handle, never as its bytes or text);
 * on the page's own thread, in steps, when no worker can start. A read
 * started while one runs ends the worker (its read cannot be interrupted)
 * and starts a fresh one with the source.
 */
export function startTextReader(source: ReadSource, start: () => Worker | null = startWorker): TextReader {
  let worker: Worker | null = start();
  if (worker === null) return pageReader(source);
  let job = 0;
  let busy = false;
  let sent = false;
  let fallback: TextReader | null = null;
  let listener: ReadListener | null = null;
  let last: Request | null = null;

  const attach = (w: Worker): void => {
    w.onmessage = (event: MessageEvent<ReadReply>) => {
      const reply = event.data;
      if (reply.job !== job || listener === null) return;
      if (reply.type === 'stage') listener.stage(reply.stage, reply.lines);
      else if (reply.type === 'opened') listener.opened(reply.summary);
      else if (reply.type === 'done') {
        busy = false;
        const mine = job;
        const { outcome } = reply;
        void unpackColumns(outcome.imported).then((imported) => {
          // A read asked for while the columns were copied replaces this one.
          if (mine !== job || listener === null) return;
          performance.mark(READ_DONE_MARK);
          listener.done({ ...outcome, imported });
        });
      } else {
        busy = false;
        if (reply.type === 'refused') listener.refused(reply.message);
        else listener.failed(reply.message);
      }
    };
    // A worker that fails to load (a refused script, a file:// page) leaves the read to the page.
    w.onerror = (event) => {
      event.preventDefault();
      w.terminate();
      worker = null;
      fallback = pageReader(source);
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
          fallback = pageReader(source);
          fallback.read(request, next);
          return;
        }
        attach(worker);
      }
      job++;
      busy = true;
      (worker as Worker).postMessage({ ...request, job, ...(sent ? {} : { source }) } satisfies ReadRequest);
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
