import { Inflate } from 'fflate';

export type InflateResult =
  | { readonly ok: true; readonly bytes: Uint8Array }
  | {
      readonly ok: false;
      readonly reason: string;
      readonly tooLarge: boolean;
      /** Bytes inflated before giving up: at most maxBytes plus what one slice yields. */
      readonly inflatedBytes: number;
    };

/**
 * Inflates raw DEFLATE data (RFC 1951) but gives up as soon as the output
 * passes `maxBytes`, so a small crafted input (a "deflate bomb") cannot make
 * it allocate without end. Input is fed in slices: DEFLATE expands at most
 * about 1032 : 1, so one slice of `sliceBytes` yields at most about a
 * thousand times that (4 MB for the default 4 kB) before the size is checked
 * again. Share links are mostly under 4 kB, so they inflate in one step.
 * Never throws.
 */
export function inflateRawCapped(data: Uint8Array, maxBytes: number, sliceBytes = 4096): InflateResult {
  const chunks: Uint8Array[] = [];
  let total = 0;
  let over = false;
  const inflater = new Inflate((chunk) => {
    total += chunk.length;
    if (total > maxBytes) over = true;
    else if (chunk.length > 0) chunks.push(chunk);
  });
  const tooLarge = (): InflateResult => ({
    ok: false,
    tooLarge: true,
    reason: `it unpacks to more than ${maxBytes} bytes`,
    inflatedBytes: total,
  });
  try {
    if (data.length === 0) inflater.push(data, true);
    for (let at = 0; at < data.length; at += sliceBytes) {
      const end = Math.min(at + sliceBytes, data.length);
      inflater.push(data.subarray(at, end), end === data.length);
      if (over) return tooLarge();
    }
  } catch (error) {
    // fflate reports damage as Error('unexpected EOF' | 'invalid block type' | …).
    const why = error instanceof Error ? error.message : String(error);
    return { ok: false, tooLarge: false, reason: `its compressed data is damaged (${why})`, inflatedBytes: total };
  }
  if (over) return tooLarge();
  const bytes = new Uint8Array(total);
  let offset = 0;
  for (const chunk of chunks) {
    bytes.set(chunk, offset);
    offset += chunk.length;
  }
  return { ok: true, bytes };
}
