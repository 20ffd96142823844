import { describe, expect, it, vi } from 'vitest';
import { FOUR_BARS } from '../helpers/scenario-fixtures';

// The share link's reader (src/scenario/link-read.ts: base64url, check sum,
// header, the capped decompressor) is not on the first screen: it is fetched
// when a link is opened. Until then decodeScenarioLink says so plainly rather
// than misreading the link; once loaded, the same call reads it. (test/setup.ts
// loads the reader for every other test; here the module is fresh.)

describe('the share link reader, fetched when a link is opened', () => {
  it('is said to be missing before loadLinkReader, and reads the link after', async () => {
    vi.resetModules();
    const link = await import('../../src/scenario/link');
    const { encodeScenarioLink } = await import('../../src/scenario/link-make');
    const fragment = encodeScenarioLink(FOUR_BARS);
    expect(link.isScenarioLink(fragment)).toBe(true);
    const before = link.decodeScenarioLink(fragment);
    expect(before.ok).toBe(false);
    expect(!before.ok && before.problems[0]?.message).toBe(
      'The link reader could not be loaded (no connection?); reload the page to open the link.',
    );
    await link.loadLinkReader();
    const after = link.decodeScenarioLink(fragment);
    expect(after.ok && after.scenario).toEqual(FOUR_BARS);
  });
});
