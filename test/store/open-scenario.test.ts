import 'fake-indexeddb/auto';
import { createStore, set } from 'idb-keyval';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { computeLosses } from '../../src/core';
import { scenarioToFileText } from '../../src/scenario/file';
import { encodeScenarioLink } from '../../src/scenario/link-make';
import type { Scenario } from '../../src/scenario/types';
import { createWorkbenchStore } from '../../src/store';
import { startWorkbench } from '../../src/store/start';
import { LARGE_DB, LARGE_OBJECTS, pack } from '../../src/store/large-store';
import { answerRead } from '../../src/store/scenario-read';
import type { ScenarioReadAnswer, ScenarioReadRequest } from '../../src/store/scenario-read-messages';
import { FOUR_BARS, memoryStorage } from '../helpers/scenario-fixtures';

// Opening a whole scenario without holding the page (issue 11's rule, here for the scenario file and the
// large store's records): read and checked in the scenario reader (a worker; here its work run in-process),
// the columns handed back and made plain lists in slices, a long storm made ready, then one edit.

/** n bars of 5 min, 0 to 2.9 mm in steps of 0.1 mm (invented). Over 65,536 bars the storm is placed in steps. */
function barsOf(n: number, name = `${n} bars (invented)`): Scenario {
  const durationsH = new Array<number>(n).fill(5 / 60);
  const depthsMm = Array.from({ length: n }, (_, i) => (i % 30) / 10);
  return { ...FOUR_BARS, name, storm: { durationsH, depthsMm } };
}
const LONG = 70_000;

/** Stands in for the scenario reader worker: runs its work (scenario-read.ts) in this process and answers. */
class InProcessReader {
  static last: InProcessReader | null = null;
  onmessage: ((event: { data: ScenarioReadAnswer }) => void) | null = null;
  onerror: ((event: { preventDefault(): void }) => void) | null = null;
  sent: ScenarioReadRequest[] = [];
  handedOver: ArrayBuffer[] = [];
  constructor() {
    InProcessReader.last = this;
  }
  postMessage(request: ScenarioReadRequest): void {
    this.sent.push(request);
    void answerRead(request).then(({ answer, transfer }) => {
      this.handedOver.push(...transfer);
      this.onmessage?.({ data: answer });
    });
  }
  terminate(): void {}
}

async function freshOpening(worker: unknown = InProcessReader) {
  vi.resetModules();
  if (worker !== undefined) vi.stubGlobal('Worker', worker);
  return import('../../src/store/open-scenario');
}

afterEach(() => {
  vi.unstubAllGlobals();
  InProcessReader.last = null;
});

describe('a scenario file read off the page', () => {
  it('is read and checked by the reader, its columns handed over and made the document’s plain lists again', async () => {
    const { readScenarioFileOffPage } = await freshOpening();
    const original = barsOf(LONG);
    const file = new Blob([scenarioToFileText(original)]);
    expect(file.size).toBeGreaterThan(1 << 20);
    const read = await readScenarioFileOffPage(file);
    expect(InProcessReader.last?.sent.map((r) => r.kind)).toEqual(['file']);
    // Two columns of LONG numbers went over as buffers, not as 140,000 numbers to copy in one task.
    expect(InProcessReader.last?.handedOver.map((b) => b.byteLength)).toEqual([8 * LONG, 8 * LONG]);
    expect(read?.ok).toBe(true);
    if (!read?.ok) return;
    expect(Array.isArray(read.scenario.storm.durationsH) && Array.isArray(read.scenario.storm.depthsMm)).toBe(true);
    expect(read.scenario).toEqual(original);
  });

  it('gives back the schema’s problems, with the field’s path, for a damaged long file', async () => {
    const { readScenarioFileOffPage } = await freshOpening();
    const damaged = barsOf(LONG);
    (damaged.storm.depthsMm as number[])[LONG - 1] = -1;
    const read = await readScenarioFileOffPage(new Blob([scenarioToFileText(damaged)]));
    expect(read?.ok).toBe(false);
    if (read?.ok !== false) return;
    expect(read.problems.length).toBeGreaterThan(0);
    expect(read.problems[0]?.path).toMatch(/^storm/);
  });

  it('leaves a short file, a page without workers, and a reader that failed to start to the page’s own reading', async () => {
    let opening = await freshOpening();
    expect(await opening.readScenarioFileOffPage(new Blob([scenarioToFileText(FOUR_BARS)]))).toBeNull();
    expect(InProcessReader.last).toBeNull();

    opening = await freshOpening(null);
    expect(await opening.readScenarioFileOffPage(new Blob([scenarioToFileText(barsOf(LONG))]))).toBeNull();

    class FailsToStart extends InProcessReader {
      override postMessage(request: ScenarioReadRequest): void {
        this.sent.push(request);
        queueMicrotask(() => this.onerror?.({ preventDefault: () => {} }));
      }
    }
    opening = await freshOpening(FailsToStart);
    expect(await opening.readScenarioFileOffPage(new Blob([scenarioToFileText(barsOf(LONG))]))).toBeNull();
  });
});

describe('the large store’s record read off the page', () => {
  const records = createStore(LARGE_DB, LARGE_OBJECTS);

  it('comes back through the schema as the scenario saved, or says which record is missing', async () => {
    const { readLargeInSteps } = await freshOpening();
    const saved = barsOf(LONG, 'Kept in the large store (invented)');
    await set('scenario.test.1', pack(saved), records);
    const read = await readLargeInSteps({ id: 'scenario.test.1', numbers: 2 * LONG, savedAt: '2026-03-01T10:00:00Z' });
    expect(InProcessReader.last?.sent.map((r) => r.kind)).toEqual(['record']);
    expect(read).toEqual({ ok: true, scenario: saved });

    const gone = await readLargeInSteps({ id: 'scenario.none', numbers: 2 * LONG, savedAt: '2026-03-01T10:00:00Z' });
    expect(gone.ok).toBe(false);
    expect(!gone.ok && gone.message).toContain('holds no record "scenario.none"');
  });
});

describe('placing an opened scenario', () => {
  it('makes one undoable edit, taken only once a long storm is checked and its results’ arrays are made', async () => {
    const { placeScenario } = await freshOpening();
    const store = createWorkbenchStore(FOUR_BARS);
    const opened = barsOf(LONG, 'Opened (invented)');
    const atEdit: boolean[] = [];
    store.subscribe((state, before) => {
      if (state.scenario !== before.scenario) atEdit.push(store.derived.stormReady(state.scenario.storm));
    });
    const placing = placeScenario(store, opened, 'Open long.json');
    // Not in the task of the click: the storm's arrays are made first, in tasks of their own.
    expect(store.getState().scenario).toBe(FOUR_BARS);
    await placing;
    expect(atEdit).toEqual([true]);
    expect(store.getState().scenario.storm).toBe(opened.storm);
    expect(store.getState().history.past).toHaveLength(1);
    expect(store.getState().undoLabel).toBe('Open long.json');
    const r = store.derived.results(store.getState().scenario);
    expect(r.ok && r.result.excessMm).toEqual(computeLosses(opened.storm, opened.method).excessMm);
    store.getState().actions.undo();
    expect(store.getState().scenario).toBe(FOUR_BARS);
  });

  it('places a short scenario in the same task, as replaceScenario does', async () => {
    const { placeScenario } = await freshOpening();
    const store = createWorkbenchStore(FOUR_BARS);
    const opened = barsOf(10, 'Short (invented)');
    await placeScenario(store, opened, 'Open short.json');
    expect(store.getState().scenario).toEqual(opened);
    expect(store.getState().history.past).toHaveLength(1);
  });
});

describe('the reader’s answer', () => {
  it('is a problem saying why for a file that cannot be read (a rejected or a throwing read)', async () => {
    const broken = { size: 2 << 20, text: () => Promise.reject(new Error('disk gone')) } as unknown as Blob;
    const thrown = {
      size: 2 << 20,
      text: () => {
        throw new TypeError('no text here');
      },
    } as unknown as Blob;
    const a = await answerRead({ job: 1, kind: 'file', file: broken });
    expect(a.answer).toEqual({
      job: 1,
      ok: false,
      problems: [{ path: '', message: 'It could not be read (disk gone).' }],
    });
    const b = await answerRead({ job: 2, kind: 'file', file: thrown });
    expect(b.answer.ok).toBe(false);
    expect(!b.answer.ok && b.answer.problems[0]?.message).toContain('no text here');
  });
});

describe('a share link at start-up read off the page', () => {
  it('comes back through the link reader and the schema, or with the reader’s problems', async () => {
    const { readLinkOffPage } = await freshOpening();
    const shared = barsOf(LONG, 'Shared (invented)');
    const read = await readLinkOffPage(`#${encodeScenarioLink(shared)}`);
    expect(InProcessReader.last?.sent.map((r) => r.kind)).toEqual(['link']);
    expect(read).toEqual({ ok: true, scenario: shared });
    const cut = await readLinkOffPage(`#${encodeScenarioLink(shared).slice(0, -40)}`);
    expect(cut?.ok).toBe(false);
    expect(cut?.ok === false && cut.problems.length).toBeGreaterThan(0);
    expect(await (await freshOpening(null)).readLinkOffPage('#anything')).toBeNull();
  });

  it('is what the workbench shows, not read again on the page', () => {
    const inAddress = barsOf(10, 'In the address (invented)');
    const readOff = barsOf(12, 'Read off the page (invented)');
    const { store, link } = startWorkbench({
      storage: memoryStorage(),
      fragment: `#${encodeScenarioLink(inAddress)}`,
      fallback: FOUR_BARS,
      nowIso: '2026-03-01T10:00:00.000Z',
      clearFragment: () => {},
      linkRead: { ok: true, scenario: readOff },
    });
    expect(store.getState().scenario).toEqual(readOff);
    expect(link.getState().kind).toBe('shared');
  });
});
