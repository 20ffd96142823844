import { describe, expect, it, vi } from 'vitest';
import { DEFAULT_NUMBER_FORMAT, type ReadOutcome } from '../../../src/io';
import { startTextReader, type ReadListener } from '../../../src/ui/import-kit/off-thread';
import { countLines, packColumns, unpackColumns, type ReadRequest } from '../../../src/ui/import-kit/reader-messages';
import { SLICE } from '../../../src/store/next-task';

/** A stand-in for a Worker: records what it was sent and whether it was ended; replies when told. */
class FakeWorker {
  sent: ReadRequest[] = [];
  ended = false;
  onmessage: ((event: MessageEvent) => void) | null = null;
  onerror: ((event: { preventDefault: () => void }) => void) | null = null;
  postMessage(message: ReadRequest): void {
    this.sent.push(message);
  }
  terminate(): void {
    this.ended = true;
  }
  reply(data: unknown): void {
    this.onmessage?.({ data } as MessageEvent);
  }
}

const request = {
  reader: 'rain',
  context: { numberFormat: DEFAULT_NUMBER_FORMAT, units: 'si' },
  corrections: {},
} as const;

function listen() {
  const heard: string[] = [];
  const outcomes: ReadOutcome[] = [];
  const listener: ReadListener = {
    stage: (stage, lines) => heard.push(`${stage} ${lines}`),
    opened: (summary) => heard.push(`opened ${summary.lines} lines, ${summary.chars} characters: ${summary.head}`),
    refused: (message) => heard.push(`refused ${message}`),
    done: (outcome) => outcomes.push(outcome),
    failed: (message) => heard.push(`failed ${message}`),
  };
  return { heard, outcomes, listener };
}

describe('a text reader in a worker', () => {
  it('sends the source once, then only the corrections', () => {
    const workers: FakeWorker[] = [];
    const reader = startTextReader({ text: '1\n2\n' }, () => {
      workers.push(new FakeWorker());
      return workers.at(-1) as unknown as Worker;
    });
    const { listener } = listen();
    reader.read(request, listener);
    const w = workers[0] as FakeWorker;
    expect(w.sent[0]?.source).toEqual({ text: '1\n2\n' });
    w.reply({ type: 'done', job: 1, outcome: { imported: null } });
    reader.read({ ...request, corrections: { skipLines: 1 } }, listener);
    expect(w.sent[1]?.source).toBeUndefined();
    expect(w.sent[1]?.corrections).toEqual({ skipLines: 1 });
    expect(reader.where).toBe('worker');
  });

  it('a read asked for while one runs ends that worker and starts another with the text', async () => {
    const workers: FakeWorker[] = [];
    const reader = startTextReader({ text: 'abc' }, () => {
      workers.push(new FakeWorker());
      return workers.at(-1) as unknown as Worker;
    });
    const { heard, outcomes, listener } = listen();
    reader.read(request, listener);
    reader.read({ ...request, corrections: { hasHeader: true } }, listener);
    expect(workers).toHaveLength(2);
    expect(workers[0]?.ended).toBe(true);
    expect(workers[1]?.sent[0]?.source).toEqual({ text: 'abc' });
    // A late reply of the ended job is not heard.
    workers[1]?.reply({ type: 'stage', job: 1, stage: 'read', lines: 1 });
    workers[1]?.reply({ type: 'stage', job: 2, stage: 'read', lines: 1 });
    expect(heard).toEqual(['read 1']);
    // Columns come back as plain arrays (copied in slices, so the outcome follows a task later).
    workers[1]?.reply({ type: 'done', job: 2, outcome: { imported: { depthsMm: new Float64Array([1, 2]) } } });
    await vi.waitFor(() => expect(outcomes[0]?.imported).toEqual({ depthsMm: [1, 2] }));
  });

  it('an outcome whose columns are still being copied when a new read is asked for is not heard', async () => {
    const workers: FakeWorker[] = [];
    const reader = startTextReader({ text: 'abc' }, () => {
      workers.push(new FakeWorker());
      return workers.at(-1) as unknown as Worker;
    });
    const { outcomes, listener } = listen();
    reader.read(request, listener);
    workers[0]?.reply({ type: 'done', job: 1, outcome: { imported: { depthsMm: new Float64Array([1, 2]) } } });
    reader.read({ ...request, corrections: { hasHeader: true } }, listener);
    await new Promise((resolve) => setTimeout(resolve, 20));
    expect(outcomes).toEqual([]);
  });

  it('stop ends the worker and nothing more is heard', () => {
    const w = new FakeWorker();
    const reader = startTextReader({ text: 'abc' }, () => w as unknown as Worker);
    const { heard, listener } = listen();
    reader.read(request, listener);
    reader.stop();
    expect(w.ended).toBe(true);
    w.reply({ type: 'stage', job: 1, stage: 'read', lines: 1 });
    expect(heard).toEqual([]);
  });

  it('reads on the page when the worker fails to load, and when none can start', async () => {
    const w = new FakeWorker();
    const text = '10:15\t0.2\n10:30\t0.4\n10:45\t0.6';
    const reader = startTextReader({ text }, () => w as unknown as Worker);
    const { heard, outcomes, listener } = listen();
    reader.read(request, listener);
    w.onerror?.({ preventDefault: () => undefined });
    expect(reader.where).toBe('page');
    await vi.waitFor(() => expect(outcomes).toHaveLength(1));
    expect(heard).toEqual(['open 0', `opened 3 lines, ${text.length} characters: ${text}`, 'guess 3', 'read 3']);
    // 0.2 + 0.4 + 0.6 mm in three 15-min bars
    expect((outcomes[0]?.imported as { depthsMm: number[] }).depthsMm).toEqual([0.2, 0.4, 0.6]);

    const none = startTextReader({ text }, () => null);
    expect(none.where).toBe('page');
  });

  it('hands a file to the worker as it is (a handle, never its text), and again to a fresh worker', () => {
    const workers: FakeWorker[] = [];
    const file = new Blob(['10:15\t0.2\n']);
    const reader = startTextReader({ file, name: 'g.csv', what: 'the rainfall' }, () => {
      workers.push(new FakeWorker());
      return workers.at(-1) as unknown as Worker;
    });
    const { heard, listener } = listen();
    reader.read(request, listener);
    const sent = workers[0]?.sent[0]?.source as { file: Blob };
    expect(sent.file).toBe(file);
    workers[0]?.reply({ type: 'opened', job: 1, summary: { head: '10:15\t0.2', lines: 1, chars: 10 } });
    expect(heard).toEqual(['opened 1 lines, 10 characters: 10:15\t0.2']);
    reader.read({ ...request, corrections: { hasHeader: false } }, listener);
    expect((workers[1]?.sent[0]?.source as { file: Blob }).file).toBe(file);
  });

  it('on the page, decodes a file itself, or refuses it by name, and reads no further', async () => {
    const file = new Blob(['10:15\t0.2\n10:30\t0.4\n']);
    const { heard, outcomes, listener } = listen();
    startTextReader({ file, name: 'g.csv', what: 'the rainfall' }, () => null).read(request, listener);
    await vi.waitFor(() => expect(outcomes).toHaveLength(1));
    expect(heard).toEqual(['open 0', 'opened 2 lines, 20 characters: 10:15\t0.2\n10:30\t0.4', 'guess 2', 'read 2']);
    // 0.2 + 0.4 mm in two 15-min bars
    expect((outcomes[0]?.imported as { depthsMm: number[] }).depthsMm).toEqual([0.2, 0.4]);

    const refusal = listen();
    startTextReader({ file: new Blob(['\n\n']), name: 'blank.csv', what: 'the rainfall' }, () => null).read(
      request,
      refusal.listener,
    );
    await vi.waitFor(() => expect(refusal.heard).toContain('refused blank.csv is empty.'));
    await new Promise((ok) => setTimeout(ok, 20));
    expect(refusal.heard).toEqual(['open 0', 'refused blank.csv is empty.']);
    expect(refusal.outcomes).toEqual([]);
  });
});

describe('the messages', () => {
  it('count lines with and without a last line break', () => {
    expect(countLines('')).toBe(0);
    expect(countLines('a')).toBe(1);
    expect(countLines('a\nb')).toBe(2);
    expect(countLines('a\nb\n')).toBe(2);
  });

  it('pack number columns into buffers to hand over, and back', async () => {
    const { value, transfer } = packColumns({ durationsH: [0.25, 0.5], startIso: '2024-01-01T00:00' });
    expect(transfer).toHaveLength(1);
    expect(await unpackColumns(value)).toEqual({ durationsH: [0.25, 0.5], startIso: '2024-01-01T00:00' });
  });

  it('unpack a column longer than a slice exactly, every value in its place', async () => {
    // 2.5 slices of numbers that no two neighbours share (k / 7 + 0.1: not representable exactly, so a rounding slip shows).
    const n = Math.floor(SLICE * 2.5);
    const depths = Array.from({ length: n }, (_, k) => k / 7 + 0.1);
    const { value } = packColumns({ depthsMm: depths });
    const back = await unpackColumns<{ depthsMm: number[] }>(value);
    expect(Array.isArray(back.depthsMm)).toBe(true);
    expect(back.depthsMm).toEqual(depths);
  });
});
