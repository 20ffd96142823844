// JSON for people to read and diff: objects one key a line, and lists of
// plain values (a storm's bars) packed into lines of about `width` columns
// instead of one number a line. Values are written by JSON.stringify, so the
// text parses back to exactly what JSON.stringify would have given.

function isPlain(value: unknown): boolean {
  return value === null || typeof value === 'number' || typeof value === 'string' || typeof value === 'boolean';
}

/** JSON.stringify's rule: undefined, functions and symbols are left out of objects and are null in lists. */
function isSkipped(value: unknown): boolean {
  return value === undefined || typeof value === 'function' || typeof value === 'symbol';
}

function write(value: unknown, depth: number, indent: string, width: number): string {
  if (isPlain(value)) return JSON.stringify(value);
  const inner = indent.repeat(depth + 1);
  const outer = indent.repeat(depth);
  if (Array.isArray(value)) {
    if (value.length === 0) return '[]';
    const items = value.map((item) => (isSkipped(item) ? 'null' : write(item, depth + 1, indent, width)));
    if (value.every((item) => isPlain(item) || isSkipped(item))) {
      const lines: string[] = [];
      let line = '';
      for (const item of items) {
        // The line as it would be: indent, items so far, ", ", the item, ",".
        if (line !== '' && inner.length + line.length + 2 + item.length + 1 > width) {
          lines.push(line + ',');
          line = '';
        }
        line = line === '' ? item : `${line}, ${item}`;
      }
      lines.push(line);
      if (lines.length === 1 && outer.length + (lines[0] as string).length + 2 <= width) return `[${lines[0]}]`;
      return `[\n${lines.map((l) => inner + l).join('\n')}\n${outer}]`;
    }
    return `[\n${items.map((item) => inner + item).join(',\n')}\n${outer}]`;
  }
  if (typeof value === 'object' && value !== null) {
    const entries = Object.entries(value).filter(([, v]) => !isSkipped(v));
    if (entries.length === 0) return '{}';
    const lines = entries.map(([key, v]) => `${inner}${JSON.stringify(key)}: ${write(v, depth + 1, indent, width)}`);
    return `{\n${lines.join(',\n')}\n${outer}}`;
  }
  return 'null';
}

export function prettyJson(value: unknown, indent = '  ', width = 100): string {
  return write(value, 0, indent, width);
}
