import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { decodeBase64Url, encodeBase64Url } from '../../src/scenario/base64url';
import { crc32 } from '../../src/scenario/crc32';

const bytesOf = (text: string): Uint8Array => new TextEncoder().encode(text);

describe('base64url', () => {
  it.each([
    ['', ''],
    ['f', 'Zg'],
    ['fo', 'Zm8'],
    ['foo', 'Zm9v'],
    ['foob', 'Zm9vYg'],
    ['fooba', 'Zm9vYmE'],
    ['foobar', 'Zm9vYmFy'],
  ])('writes %j as %j (RFC 4648 §10 vectors, unpadded)', (text, encoded) => {
    expect(encodeBase64Url(bytesOf(text))).toBe(encoded);
    expect(decodeBase64Url(encoded)).toEqual({ ok: true, bytes: bytesOf(text) });
  });

  it('uses "-" and "_" where standard base64 uses "+" and "/"', () => {
    expect(encodeBase64Url(new Uint8Array([0xfb, 0xff, 0xbf]))).toBe('-_-_');
  });

  it('agrees with Node for random bytes, both ways', () => {
    fc.assert(
      fc.property(fc.uint8Array({ maxLength: 200 }), (bytes) => {
        const encoded = encodeBase64Url(bytes);
        expect(encoded).toBe(Buffer.from(bytes).toString('base64url'));
        expect(decodeBase64Url(encoded)).toEqual({ ok: true, bytes });
      }),
      { numRuns: 500, seed: 11 },
    );
  });

  it('refuses padding, other characters and impossible lengths, saying where', () => {
    expect(decodeBase64Url('Zm8=')).toEqual({
      ok: false,
      reason: 'it has a character that does not belong in it ("=" at position 4)',
    });
    expect(decodeBase64Url('Zm+v')).toMatchObject({ ok: false });
    expect(decodeBase64Url('Zm 9v')).toMatchObject({ ok: false });
    expect(decodeBase64Url('Zm9vé')).toMatchObject({ ok: false });
    expect(decodeBase64Url('Zm9vY')).toEqual({
      ok: false,
      reason: 'its length is impossible for its encoding (a character is missing or extra)',
    });
  });

  it('refuses a last character with bits the encoder never sets', () => {
    // "Zg" is "f"; "Zh" carries the same byte plus a stray low bit.
    expect(decodeBase64Url('Zh')).toMatchObject({ ok: false });
    expect(decodeBase64Url('Zm9')).toMatchObject({ ok: false });
    expect(decodeBase64Url('Zm8')).toMatchObject({ ok: true });
  });
});

describe('crc32', () => {
  it('gives the standard check value for "123456789"', () => {
    expect(crc32(bytesOf('123456789'))).toBe(0xcbf43926);
  });

  it('is 0 for no bytes and differs for any one flipped bit', () => {
    expect(crc32(new Uint8Array(0))).toBe(0);
    const data = bytesOf('initial loss, then continuing loss');
    const sum = crc32(data);
    for (let bit = 0; bit < data.length * 8; bit++) {
      const copy = data.slice();
      copy[bit >>> 3] = (copy[bit >>> 3] as number) ^ (1 << (bit & 7));
      expect(crc32(copy)).not.toBe(sum);
    }
  });
});
