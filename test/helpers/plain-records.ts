import fc from 'fast-check';

// Records for the columnar reader's property tests (test/io/plain-columns*.test.ts):
// invented times and values, clean or with one flaw, written as a logger might.

/** A record's lines as a generator writes them: times (or none), values, now and then a flaw. */
export const recordArbitrary = fc.record({
  n: fc.integer({ min: 1, max: 60 }),
  timed: fc.boolean(),
  header: fc.boolean(),
  separator: fc.constantFrom(',', ';', '\t'),
  stepMin: fc.constantFrom(1, 5, 15, 60),
  seconds: fc.boolean(),
  gapAt: fc.option(fc.integer({ min: 1, max: 59 })),
  flaw: fc.option(
    fc.record({
      at: fc.integer({ min: 0, max: 59 }),
      kind: fc.constantFrom('text', 'negative', 'blank', 'missing', 'quote', 'same-time', 'unicode', 'huge', 'spaces'),
    }),
  ),
  crlf: fc.boolean(),
  trailing: fc.constantFrom('', '\n', '\n\n'),
  values: fc.array(fc.integer({ min: 0, max: 400 }), { minLength: 60, maxLength: 60 }),
  decimals: fc.constantFrom(0, 1, 2),
});

export function recordText(
  r: typeof recordArbitrary extends fc.Arbitrary<infer T> ? T : never,
  valueName = 'Rain (mm)',
): string {
  const lines: string[] = [];
  if (r.header) lines.push(r.timed ? `Time${r.separator}${valueName}` : valueName);
  const start = Date.UTC(2024, 1, 28, 22, 0);
  let minutes = 0;
  for (let k = 0; k < r.n; k++) {
    minutes += r.stepMin * (r.gapAt === k ? 5 : 1);
    const iso = new Date(start + minutes * 60_000).toISOString();
    const stamp = `${iso.slice(0, 10)} ${iso.slice(11, r.seconds ? 19 : 16)}`;
    let value = ((r.values[k] as number) / 10 ** r.decimals).toFixed(r.decimals);
    let time = stamp;
    if (r.flaw !== null && r.flaw.at === k) {
      const f = r.flaw.kind;
      if (f === 'text') value = 'n/a';
      else if (f === 'negative') value = `-${value === '0' ? '1' : value}`;
      else if (f === 'missing') value = '';
      else if (f === 'quote') value = `"${value}"`;
      else if (f === 'same-time' && k > 0) time = lines[lines.length - 1]?.split(r.separator)[0] ?? stamp;
      else if (f === 'unicode') value = `${value}\u00a0`;
      else if (f === 'huge') value = '9'.repeat(400);
      else if (f === 'spaces') value = `  ${value} `;
      if (f === 'blank' && k > 0) lines.push('');
    }
    lines.push(r.timed ? `${time}${r.separator}${value}` : value);
  }
  const text = lines.join(r.crlf ? '\r\n' : '\n') + r.trailing;
  return text;
}

/**
 * A header and n readings of an invented 15-min gauge record from 2024-01-01 00:15, 0.2 mm every third
 * one: 21 characters a line (the long-import tests' file).
 */
export function gaugeRecordText(n: number): string {
  const lines: string[] = ['Time,Rain (mm)'];
  for (let k = 1; k <= n; k++) {
    const stamp = new Date(Date.UTC(2024, 0, 1) + k * 900_000).toISOString().slice(0, 16).replace('T', ' ');
    lines.push(`${stamp},${k % 3 === 0 ? '0.2' : '0.0'}`);
  }
  return lines.join('\n');
}
