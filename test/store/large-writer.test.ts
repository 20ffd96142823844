import { afterEach, describe, expect, it, vi } from 'vitest';

/** A stand-in for the writer worker: keeps what it was sent, answers when told. */
class FakeWorker {
  static last: FakeWorker | null = null;
  onmessage: ((event: { data: unknown }) => void) | null = null;
  onerror: ((event: { preventDefault(): void }) => void) | null = null;
  sent: { message: { job: number; key: string; value: unknown }; transfer: ArrayBuffer[] }[] = [];
  terminated = false;
  constructor() {
    FakeWorker.last = this;
  }
  postMessage(message: { job: number; key: string; value: unknown }, transfer: ArrayBuffer[]): void {
    this.sent.push({ message, transfer });
  }
  terminate(): void {
    this.terminated = true;
  }
}

async function freshWriter() {
  vi.resetModules();
  vi.stubGlobal('Worker', FakeWorker);
  return import('../../src/store/large-writer');
}

afterEach(() => {
  vi.unstubAllGlobals();
  FakeWorker.last = null;
});

describe('the large store’s writer', () => {
  it('hands a record’s columns to the worker (transferred, each buffer once) and settles when it has put it', async () => {
    const { putOffPage } = await freshWriter();
    const depths = new Float64Array(4096);
    const record = { storm: { durationsH: new Float64Array(4096), depthsMm: depths, same: depths }, name: 'x' };
    const put = putOffPage('scenario.1', record);
    const worker = FakeWorker.last;
    expect(worker?.sent).toHaveLength(1);
    const { message, transfer } = worker?.sent[0] ?? { message: null, transfer: [] };
    expect(message?.key).toBe('scenario.1');
    expect(transfer).toHaveLength(2);
    expect(transfer).toContain(depths.buffer);
    worker?.onmessage?.({ data: { job: message?.job, ok: true } });
    await expect(put).resolves.toBe('put');
  });

  it('gives IndexedDB’s refusal as an Error, and says "lost" for writes a worker that failed to start took', async () => {
    const { putOffPage } = await freshWriter();
    const refused = putOffPage('a', { n: 1 });
    const worker = FakeWorker.last;
    worker?.onmessage?.({ data: { job: worker.sent[0]?.message.job, ok: false, message: 'QuotaExceededError' } });
    await expect(refused).rejects.toThrow('QuotaExceededError');
    const lost = putOffPage('b', { n: 2 });
    worker?.onerror?.({ preventDefault: () => {} });
    await expect(lost).resolves.toBe('lost');
    expect(worker?.terminated).toBe(true);
    // From then on there is no writer: the page puts its records itself.
    await expect(putOffPage('c', { n: 3 })).resolves.toBe('none');
  });

  it('says "none" where there is no Worker (the page puts the record)', async () => {
    vi.resetModules();
    vi.stubGlobal('Worker', undefined);
    const { putOffPage } = await import('../../src/store/large-writer');
    await expect(putOffPage('a', { n: 1 })).resolves.toBe('none');
  });
});
