/** A number as people read it in a message: integers as they are, others to 4 significant digits. */
export const fmt = (x: number): string =>
  Number.isInteger(x)
    ? String(x)
    : x
        .toPrecision(4)
        .replace(/(\.\d*?)0+$/, '$1')
        .replace(/\.$/, '');
