// CRC-32 as in ISO 3309 / ITU-T V.42 and the PNG and gzip formats (reflected
// polynomial 0xEDB88320, initial value and final xor 0xFFFFFFFF). The share
// link carries it so that a link damaged on the way is noticed even where
// the damage still inflates to well-formed JSON.

const TABLE = (() => {
  const table = new Uint32Array(256);
  for (let n = 0; n < 256; n++) {
    let c = n;
    for (let k = 0; k < 8; k++) c = c & 1 ? 0xedb88320 ^ (c >>> 1) : c >>> 1;
    table[n] = c >>> 0;
  }
  return table;
})();

export function crc32(bytes: Uint8Array): number {
  let c = 0xffffffff;
  for (let i = 0; i < bytes.length; i++) c = (TABLE[(c ^ (bytes[i] as number)) & 0xff] as number) ^ (c >>> 8);
  return (c ^ 0xffffffff) >>> 0;
}
