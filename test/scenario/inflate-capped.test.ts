import { deflateSync, inflateSync } from 'fflate';
import { describe, expect, it } from 'vitest';
import { inflateRawCapped } from '../../src/scenario/inflate-capped';
import { zeroBomb } from '../helpers/fuzz';

describe('inflateRawCapped', () => {
  it('inflates what fflate deflates, in any slice size', () => {
    const text = 'hyetograph '.repeat(5000);
    const bytes = new TextEncoder().encode(text);
    const packed = deflateSync(bytes);
    for (const slice of [1, 7, 512, 1 << 20]) {
      const result = inflateRawCapped(packed, bytes.length, slice);
      if (!result.ok) expect.fail(result.reason);
      // Compared as text: element-by-element equality of large arrays is slow.
      expect(new TextDecoder().decode(result.bytes)).toBe(text);
    }
  });

  it('reads the hand-made bomb as the zeros it stands for', () => {
    const out = inflateSync(zeroBomb(1000));
    expect(out.length).toBe(258_001);
    expect(out.every((b) => b === 0)).toBe(true);
  });

  it('gives up on a bomb of a quarter gigabyte soon after the cap', () => {
    const bomb = zeroBomb(Math.ceil(2 ** 28 / 258)); // about 1.7 MB that stand for 256 MB
    const cap = 2 * 1024 * 1024;
    const result = inflateRawCapped(bomb, cap, 512);
    if (result.ok) expect.fail('the bomb was inflated');
    expect(result.tooLarge).toBe(true);
    expect(result.reason).toBe('it unpacks to more than 2097152 bytes');
    // DEFLATE expands at most 1032 : 1, so one 512-byte slice past the cap adds
    // at most about half a megabyte.
    expect(result.inflatedBytes).toBeGreaterThan(cap);
    expect(result.inflatedBytes).toBeLessThanOrEqual(cap + 512 * 1032);
  });

  it('accepts output of exactly the cap, and refuses one byte more', () => {
    const data = new Uint8Array(4096).map((_, i) => i % 251);
    const packed = deflateSync(data);
    expect(inflateRawCapped(packed, 4096).ok).toBe(true);
    expect(inflateRawCapped(packed, 4095)).toMatchObject({ ok: false, tooLarge: true });
  });

  it('reports damaged and cut data instead of throwing', () => {
    const packed = deflateSync(new TextEncoder().encode('rainfall excess '.repeat(100)));
    expect(inflateRawCapped(packed.subarray(0, packed.length - 3), 1 << 20)).toMatchObject({
      ok: false,
      tooLarge: false,
      reason: 'its compressed data is damaged (unexpected EOF)',
    });
    expect(inflateRawCapped(new Uint8Array([0xff, 0xff, 0xff]), 1 << 20)).toMatchObject({ ok: false, tooLarge: false });
  });
});
