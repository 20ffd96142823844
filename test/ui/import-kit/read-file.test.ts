import { describe, expect, it } from 'vitest';
import { readAsText } from '../../../src/ui/import-kit/read-file';

describe('a long file read as text in slices', () => {
  it('gives the text Blob.text gives: characters split between slices kept whole, a leading BOM dropped, bad bytes replaced', async () => {
    // 'é' is 2 bytes, '€' 3, '𝄞' 4 in UTF-8: lines of them put characters across every 1 MiB slice boundary.
    const line = 'a,é€𝄞,0.5\n';
    const body = line.repeat(250_000); // 250,000 × 16 bytes = 4,000,000 bytes: four slices of 1 MiB
    const bom = new Uint8Array([0xef, 0xbb, 0xbf]);
    const bad = new Uint8Array([0xff]); // never valid in UTF-8: U+FFFD
    const file = new Blob([bom, new TextEncoder().encode(body), bad, new TextEncoder().encode('end')]);
    expect(file.size).toBeGreaterThan(3 * (1 << 20));
    const text = await readAsText(file);
    expect(text).toBe(`${body}\uFFFDend`);
    expect(text).toBe(await file.text());
  });

  it('reads a short file whole', async () => {
    expect(await readAsText(new Blob(['0.2\n0.4\n']))).toBe('0.2\n0.4\n');
  });
});
