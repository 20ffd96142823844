import 'fake-indexeddb/auto';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { LARGE_BARS, largeScenario, quotaStorage } from '../helpers/scenario-fixtures';

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

  it('a save to the saved list puts its record through the writer too, not from the page', async () => {
    // Before, the list's save packed 10⁶ bars in one go and put them from the page (pack + write
    // 319 ms at the last measure); now it packs in slices and hands the columns to the writer.
    vi.resetModules();
    vi.stubGlobal('Worker', FakeWorker);
    const [{ saveToList }, { createScenarioLibrary }] = await Promise.all([
      import('../../src/store/large-library'),
      import('../../src/scenario/library'),
    ]);
    const library = createScenarioLibrary(quotaStorage(200_000));
    const saving = saveToList(library, largeScenario('A long record for the list (invented)'), {
      now: new Date('2026-02-20T08:30:00Z'),
    });
    await vi.waitFor(() => expect(FakeWorker.last?.sent).toHaveLength(1));
    const { message, transfer } = FakeWorker.last?.sent[0] ?? { message: null, transfer: [] };
    expect(message?.key).toMatch(/^library\.2026-02-20T08:30:00\.000Z\./);
    // Both columns of the storm handed over, not copied.
    expect(transfer).toHaveLength(2);
    expect(transfer.every((b) => b.byteLength === 8 * LARGE_BARS)).toBe(true);
    FakeWorker.last?.onmessage?.({ data: { job: message?.job, ok: true } });
    const saved = await saving;
    expect(saved.ok && 'large' in saved.value ? saved.value.large.record : null).toBe(message?.key);
  });
});
