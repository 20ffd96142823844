import { describe, expect, it } from 'vitest';
import { HELD_LINES } from '../../../src/ui/import-kit/reader-messages';
import { openSource } from '../../../src/ui/import-kit/run-read';

// What the reader's worker does with a File (reader.worker.ts runs openSource): the text must be the one
// Blob.text gives, so that reading a long file off the page changes nothing of what is read.

const source = (file: Blob, name = 'gauge-invented.csv') => ({ file, name, what: 'the rainfall' });

describe('a file opened by its reader', () => {
  it('gives the text Blob.text gives across slices (split characters, a leading BOM, bad bytes), with its summary', async () => {
    // 'é' is 2 bytes, '€' 3, '𝄞' 4 in UTF-8: lines of them put characters across every 1 MiB slice boundary.
    const line = 'a,é€𝄞,0.5\n';
    const body = line.repeat(250_000); // 250,000 × 16 bytes = 4,000,000 bytes: four slices of 1 MiB
    const file = new Blob([
      new Uint8Array([0xef, 0xbb, 0xbf]),
      new TextEncoder().encode(body),
      new Uint8Array([0xff]), // never valid in UTF-8: U+FFFD
      new TextEncoder().encode('end'),
    ]);
    let pauses = 0;
    const opened = await openSource(source(file), async () => {
      pauses++;
    });
    if (!opened.ok) throw new Error(opened.message);
    expect(opened.text).toBe(`${body}\uFFFDend`);
    expect(opened.text).toBe(await file.text());
    // 4,000,007 bytes in slices of 1,048,576: 4 slices, 3 pauses between them.
    expect(pauses).toBe(3);
    // 250,000 line breaks, and "\uFFFDend" after the last: 250,001 lines; 'a,é€' is 4 UTF-16 units, '𝄞' 2,
    // ',0.5\n' 5: 11 a line, so 2,750,000 + 4 characters.
    expect(opened.summary.lines).toBe(250_001);
    expect(opened.summary.chars).toBe(2_750_004);
    expect(opened.summary.head).toBe(line.repeat(HELD_LINES).slice(0, -1));
  });

  it('refuses a file with NULs in it, or nothing but blanks, by name', async () => {
    const zip = new Blob([new Uint8Array([0x50, 0x4b, 0x03, 0x04, 0x00, 0x00])]);
    expect(await openSource(source(zip, 'sheet.csv'))).toEqual({
      ok: false,
      message: 'sheet.csv is not a text file; save the rainfall as .csv or .txt and open that.',
    });
    expect(await openSource(source(new Blob([' \n\t\n']), 'blank.csv'))).toEqual({
      ok: false,
      message: 'blank.csv is empty.',
    });
  });

  it('says which file could not be read', async () => {
    const broken = { size: 10, arrayBuffer: () => Promise.reject(new Error('the file changed on disk')) };
    expect(await openSource(source(broken as unknown as Blob, 'moved.csv'))).toEqual({
      ok: false,
      message: 'moved.csv could not be read (the file changed on disk).',
    });
  });

  it('keeps a pasted text as it is', async () => {
    const opened = await openSource({ text: '1\n2\n3' });
    expect(opened).toEqual({ ok: true, text: '1\n2\n3', summary: { head: '1\n2\n3', lines: 3, chars: 5 } });
  });
});
