// @vitest-environment jsdom
import { screen, waitFor, within } from '@testing-library/react';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { LONG_TEXT_CHARS } from '../../../src/ui/import-kit/read-file';
import { packColumns, type ReadReply, type ReadRequest } from '../../../src/ui/import-kit/reader-messages';
import { readSteps } from '../../../src/ui/import-kit/run-read';
import { LAZY_LOAD_MS, renderWorkbench } from '../../helpers/render';
import { gaugeRecordText } from '../../helpers/plain-records';

// Issue 11: a long file's text is never decoded on the page's thread (21 MB held it 150–300 ms and its copy
// to the worker 30–50 ms more); the File goes to the reader's worker, which sends back what the page shows.
// Invented gauge records for these tests (no real gauge or storm).

/** Stands in for the reader's worker: records what the page sent it; the test answers for it. */
class FakeWorker {
  static started: FakeWorker[] = [];
  sent: ReadRequest[] = [];
  onmessage: ((event: MessageEvent<ReadReply>) => void) | null = null;
  onerror: ((event: Event) => void) | null = null;
  constructor() {
    FakeWorker.started.push(this);
  }
  postMessage(message: ReadRequest): void {
    this.sent.push(message);
  }
  terminate(): void {}
  reply(data: ReadReply): void {
    this.onmessage?.({ data } as MessageEvent<ReadReply>);
  }
}

/** Every way the page could read a file's bytes or text, recorded when used. */
const pageReads: string[] = [];

/** A file whose every reading method records that the page read it. */
function watchedFile(text: string, name: string): File {
  const file = new File([text], name, { type: 'text/csv' });
  for (const method of ['text', 'arrayBuffer', 'stream', 'slice', 'bytes']) {
    Object.defineProperty(file, method, {
      value: () => {
        pageReads.push(method);
        throw new Error(`the page read the file (${method})`);
      },
    });
  }
  return file;
}

beforeEach(() => {
  FakeWorker.started = [];
  pageReads.length = 0;
  vi.stubGlobal('Worker', FakeWorker);
  vi.stubGlobal(
    'FileReader',
    class {
      constructor() {
        pageReads.push('FileReader');
      }
    },
  );
});
afterEach(() => {
  vi.unstubAllGlobals();
});

/** The dialog, a lazy part: its first load in a test file is slow on a loaded machine (the whole suite running). */
const DIALOG_MS = 5 * LAZY_LOAD_MS;

/** The first worker started, once the dialog has asked it to read. */
async function firstWorker(): Promise<FakeWorker> {
  await waitFor(() => expect(FakeWorker.started[0]?.sent.length).toBeGreaterThan(0), { timeout: DIALOG_MS });
  return FakeWorker.started[0] as FakeWorker;
}

describe('a long file opened on the workbench', () => {
  it('is handed to the worker unread; the page shows the first lines and the count the worker sends, and uses the bars', async () => {
    const { user, store } = renderWorkbench();
    // A 14-character header, then 10,000 readings of 20 characters each after a line break: 14 + 10,000 × 21 =
    // 210,014 bytes (ASCII), over the limit.
    const text = gaugeRecordText(10_000);
    expect(text.length).toBe(210_014);
    expect(text.length).toBeGreaterThanOrEqual(LONG_TEXT_CHARS);
    const file = watchedFile(text, 'gauge-invented.csv');
    await user.upload(screen.getByLabelText('Rainfall file to open'), file);
    const dialog = await screen.findByRole('dialog', { name: 'Paste rainfall' }, { timeout: DIALOG_MS });
    const worker = await firstWorker();
    const first = worker.sent[0] as ReadRequest;
    // The File itself crosses (in a browser, a handle to the same bytes), named for the worker's refusals.
    expect(first.source).toEqual({ file, name: 'gauge-invented.csv', what: 'the rainfall' });
    expect((first.source as { file: Blob }).file).toBe(file);
    expect(within(dialog).getByText('Opening gauge-invented.csv…')).toBeInTheDocument();
    expect(within(dialog).queryByRole('textbox', { name: 'Rainfall text' })).toBeNull();

    // The worker's side, as reader.worker.ts does it, from the text the test holds (never from the page's file).
    const head = text.split('\n').slice(0, 12).join('\n');
    worker.reply({ type: 'opened', job: 1, summary: { head, lines: 10_001, chars: text.length } });
    await waitFor(() =>
      expect(within(dialog).getByText(/^10,001 lines \(.* from gauge-invented\.csv; too long/)).toBeInTheDocument(),
    );
    expect(within(dialog).getByLabelText(/First 12 lines/)).toHaveTextContent('2024-01-01 02:15,0.2');
    const steps = readSteps(text, 10_001, first);
    let step = steps.next();
    while (!step.done) step = steps.next();
    const { value } = packColumns(step.value.imported);
    worker.reply({ type: 'done', job: 1, outcome: { ...step.value, imported: value } });

    const use = within(dialog).getByRole('button', { name: 'Use these bars' });
    await waitFor(() => expect(use).toBeEnabled(), { timeout: 20_000 });
    await user.click(use);
    const storm = store.getState().scenario.storm;
    expect(storm.depthsMm.length).toBe(10_000);
    // every third reading holds 0.2 mm: 3,333 × 0.2 = 666.6 mm
    let total = 0;
    for (const p of storm.depthsMm) total += p;
    expect(total).toBeCloseTo(666.6, 9);
    expect(store.getState().undoLabel).toBe('Open rainfall file gauge-invented.csv');
    expect(pageReads).toEqual([]);
  }, 60_000);

  it('that the worker finds is not text is refused by name, and the dialog is left empty for a paste', async () => {
    const { user, scenario } = renderWorkbench();
    const before = scenario().storm;
    const file = watchedFile('x'.repeat(LONG_TEXT_CHARS), 'sheet-invented.csv');
    await user.upload(screen.getByLabelText('Rainfall file to open'), file);
    const dialog = await screen.findByRole('dialog', { name: 'Paste rainfall' }, { timeout: DIALOG_MS });
    const worker = await firstWorker();
    const message = 'sheet-invented.csv is not a text file; save the rainfall as .csv or .txt and open that.';
    worker.reply({ type: 'refused', job: 1, message });
    expect(await within(dialog).findByRole('alert')).toHaveTextContent(message);
    expect(within(dialog).getByRole('textbox', { name: 'Rainfall text' })).toHaveValue('');
    expect(within(dialog).queryByText(/Read from/)).toBeNull();
    expect(scenario().storm).toBe(before);
    expect(pageReads).toEqual([]);
  }, 60_000);
});
