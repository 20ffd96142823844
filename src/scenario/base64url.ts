// URL-safe base64 (RFC 4648 §5: '-' and '_' for '+' and '/'), without '='
// padding. Decoding is strict: any other character, an impossible length, or
// stray bits in the last character are refused, so a link mangled in copying
// is caught here with the position of the first bad character.

const ALPHABET = 'ABCDEFGHIJKLMNOPQRSTUVWXYZabcdefghijklmnopqrstuvwxyz0123456789-_';

const VALUES = (() => {
  const values = new Int16Array(128).fill(-1);
  for (let i = 0; i < ALPHABET.length; i++) values[ALPHABET.charCodeAt(i)] = i;
  return values;
})();

export function encodeBase64Url(bytes: Uint8Array): string {
  let out = '';
  let i = 0;
  for (; i + 2 < bytes.length; i += 3) {
    const n = ((bytes[i] as number) << 16) | ((bytes[i + 1] as number) << 8) | (bytes[i + 2] as number);
    out +=
      ALPHABET.charAt(n >>> 18) +
      ALPHABET.charAt((n >>> 12) & 63) +
      ALPHABET.charAt((n >>> 6) & 63) +
      ALPHABET.charAt(n & 63);
  }
  const rest = bytes.length - i;
  if (rest === 1) {
    const n = (bytes[i] as number) << 16;
    out += ALPHABET.charAt(n >>> 18) + ALPHABET.charAt((n >>> 12) & 63);
  } else if (rest === 2) {
    const n = ((bytes[i] as number) << 16) | ((bytes[i + 1] as number) << 8);
    out += ALPHABET.charAt(n >>> 18) + ALPHABET.charAt((n >>> 12) & 63) + ALPHABET.charAt((n >>> 6) & 63);
  }
  return out;
}

export type Base64Result =
  { readonly ok: true; readonly bytes: Uint8Array } | { readonly ok: false; readonly reason: string };

export function decodeBase64Url(text: string): Base64Result {
  for (let i = 0; i < text.length; i++) {
    const code = text.charCodeAt(i);
    if (code >= 128 || VALUES[code] === -1) {
      const shown = JSON.stringify(text.charAt(i));
      return { ok: false, reason: `it has a character that does not belong in it (${shown} at position ${i + 1})` };
    }
  }
  if (text.length % 4 === 1)
    return { ok: false, reason: 'its length is impossible for its encoding (a character is missing or extra)' };
  const bytes = new Uint8Array(Math.floor((text.length * 3) / 4));
  const value = (i: number): number => VALUES[text.charCodeAt(i)] as number;
  let o = 0;
  let i = 0;
  for (; i + 3 < text.length; i += 4) {
    const n = (value(i) << 18) | (value(i + 1) << 12) | (value(i + 2) << 6) | value(i + 3);
    bytes[o++] = n >>> 16;
    bytes[o++] = (n >>> 8) & 255;
    bytes[o++] = n & 255;
  }
  const rest = text.length - i;
  if (rest === 2) {
    const n = (value(i) << 18) | (value(i + 1) << 12);
    if (n & 0xffff)
      return { ok: false, reason: 'its last character is not one the encoder writes (the link was changed)' };
    bytes[o] = n >>> 16;
  } else if (rest === 3) {
    const n = (value(i) << 18) | (value(i + 1) << 12) | (value(i + 2) << 6);
    if (n & 0xff)
      return { ok: false, reason: 'its last character is not one the encoder writes (the link was changed)' };
    bytes[o] = n >>> 16;
    bytes[o + 1] = (n >>> 8) & 255;
  }
  return { ok: true, bytes };
}
