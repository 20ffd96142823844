import { describe, expect, it } from 'vitest';
import { createStoredSlot, envelopeCodec, type OtherTabWatch } from '../../src/scenario/stored-slot';
import { memoryStorage } from '../helpers/scenario-fixtures';

// One stored piece of data under one key, with the rules the saved list, the
// pins and the current scenario share: envelope and version, damaged data set
// aside as it was, and another tab's write told apart from this tab's own.

const NOW = () => new Date('2026-05-02T08:30:00.000Z');

/** A list of words in the envelope { "$format": "test-words", "version": 2, "words": [...] }. */
const codec = envelopeCodec<string[]>({
  format: 'test-words',
  version: 2,
  noun: 'list of words',
  readBody: (json) => {
    const words = json['words'];
    if (!Array.isArray(words)) return { unreadable: 'it has no words' };
    const good = words.filter((w): w is string => typeof w === 'string');
    const damage =
      words.length === good.length ? [] : [{ path: 'words', message: 'a word that was not text was left out.' }];
    return { value: good, damage };
  },
  writeBody: (words) => ({ words }),
});

describe('a stored slot', () => {
  it('writes the envelope and reads back what it wrote', () => {
    const storage = memoryStorage();
    const slot = createStoredSlot(storage, { key: 'k', codec, now: NOW });
    expect(slot.read()).toEqual({ kind: 'empty' });
    expect(slot.write(['a', 'b'])).toBeNull();
    expect(storage.data.get('k')).toBe('{"$format":"test-words","version":2,"words":["a","b"]}');
    expect(slot.read()).toMatchObject({ kind: 'ok', value: ['a', 'b'], damage: [] });
  });

  it('tells text that is not JSON, another format, an older and a newer version apart', () => {
    const cases: [string, object][] = [
      ['{"$format":', { kind: 'unreadable', reason: expect.stringMatching(/^it is not valid JSON/) }],
      [
        '{"$format":"other","version":2}',
        { kind: 'unreadable', reason: 'it is not a Raincut list of words (no "$format": "test-words")' },
      ],
      ['{"$format":"test-words","version":1,"words":[]}', { kind: 'unreadable', reason: 'its version is 1' }],
      ['{"$format":"test-words","version":3,"words":[]}', { kind: 'newer', version: 3 }],
      ['{"$format":"test-words","version":2,"words":["a",4]}', { kind: 'ok', value: ['a'] }],
    ];
    for (const [text, expected] of cases) {
      const slot = createStoredSlot(memoryStorage({ k: text }), { key: 'k', codec });
      expect(slot.read()).toMatchObject({ ...expected, text });
    }
  });

  it('sets damaged text aside as it was, under a key of its own that is never taken twice', () => {
    const storage = memoryStorage({ k: 'damaged', 'k.damaged.2026-05-02T08:30:00.000Z': 'older damage' });
    const slot = createStoredSlot(storage, { key: 'k', codec, now: NOW });
    expect(slot.setAside('damaged')).toEqual({ ok: true, key: 'k.damaged.2026-05-02T08:30:00.000Z-2' });
    expect(storage.data.get('k.damaged.2026-05-02T08:30:00.000Z-2')).toBe('damaged');
    expect(storage.data.get('k.damaged.2026-05-02T08:30:00.000Z')).toBe('older damage');
  });

  it('reports storage that refuses, never throwing', () => {
    const storage = memoryStorage();
    const slot = createStoredSlot(storage, { key: 'k', codec, now: NOW });
    storage.failNextWrites(new Error('the quota has been exceeded'));
    expect(slot.write(['a'])).toBe('the quota has been exceeded');
    expect(slot.setAside('x')).toEqual({ ok: false, reason: 'the quota has been exceeded' });
    const blocked = createStoredSlot(
      {
        getItem: () => {
          throw new Error('storage is disabled');
        },
        setItem: () => undefined,
        removeItem: () => undefined,
      },
      { key: 'k', codec },
    );
    expect(blocked.read()).toEqual({ kind: 'blocked', reason: 'storage is disabled' });
    expect(blocked.peek()).toBeNull();
  });

  it('knows its own writes from another tab’s: the text it last read or wrote is its stamp', () => {
    const storage = memoryStorage();
    const mine = createStoredSlot(storage, { key: 'k', codec });
    const theirs = createStoredSlot(storage, { key: 'k', codec });
    mine.write(['mine']);
    expect(mine.changedElsewhere()).toBe(false);
    theirs.write(['theirs']);
    expect(mine.changedElsewhere()).toBe(true);
    expect(theirs.changedElsewhere()).toBe(false);
    mine.read();
    expect(mine.changedElsewhere()).toBe(false);
    theirs.write(['again']);
    mine.acknowledge();
    expect(mine.changedElsewhere()).toBe(false);
  });

  it('calls back for another tab’s write of its own key, or a clearing of storage, and for nothing else', () => {
    let announce: (key: string | null) => void = () => undefined;
    const watch: OtherTabWatch = (changed) => {
      announce = changed;
      return () => (announce = () => undefined);
    };
    const slot = createStoredSlot(memoryStorage(), { key: 'k', codec, watch });
    const heard: number[] = [];
    const stop = slot.watch(() => heard.push(heard.length));
    announce('k');
    announce('another key');
    announce(null);
    stop();
    announce('k');
    expect(heard).toEqual([0, 1]);
  });
});
