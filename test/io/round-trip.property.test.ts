import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  applyRainImport,
  describeProblem,
  guessRainImport,
  applyFlowImport,
  guessFlowSettings,
  type Separator,
} from '../../src/io';
import { expectClose } from '../helpers/tolerance';
import { formatPaste, type Paste, type PasteSpec, type TimeFormat } from '../helpers/format-storm';

// Storms here are random and INVENTED; they stand for no real event.

const DECIMALS = ['point', 'comma'] as const;
const KINDS = ['depth', 'intensity', 'cumulative'] as const;
const UNITS = ['mm', 'in'] as const;
const TIMED: TimeFormat[] = ['iso', 'iso-zone', 'hhmm', 'date+time', 'elapsed-min', 'elapsed-h'];

/** A value as pasted: zero, small, or up to a heavy bar; any finite double in range. */
const value = fc.oneof(
  fc.constant(0),
  fc.double({ min: 0, max: 200, noNaN: true, noDefaultInfinity: true }),
  fc.integer({ min: 0, max: 50 }),
);

const bars = fc.integer({ min: 1, max: 25 }).chain((n) =>
  fc.record({
    durMin: fc.array(fc.integer({ min: 1, max: 180 }), { minLength: n, maxLength: n }),
    values: fc.array(value, { minLength: n, maxLength: n }),
  }),
);

const common = {
  timeMarks: fc.constantFrom('end' as const, 'start' as const),
  cumulativeFrom: fc.constantFrom('zero' as const, 'first-value' as const),
  baseLevel: fc.oneof(fc.constant(0), fc.double({ min: 0, max: 2000, noNaN: true, noDefaultInfinity: true })),
  startMin: fc.integer({ min: 0, max: 30 * 365 * 1440 }),
  elapsedOrigin: fc.integer({ min: 0, max: 600 }),
  zone: fc.constantFrom('Z' as const, '+05:30' as const, '-03:00' as const),
  dateTimeJoin: fc.constantFrom('T' as const, ' ' as const),
  dateOrder: fc.constantFrom('day-month' as const, 'month-day' as const),
  header: fc.boolean(),
  indexColumn: fc.boolean(),
  crlf: fc.boolean(),
  trailingNewline: fc.boolean(),
};

/** Every layout: any separator (none only for a bare column), either decimal mark, every value kind and time format. */
const anySpec: fc.Arbitrary<PasteSpec> = fc
  .record({
    ...common,
    bars,
    valueKind: fc.constantFrom(...KINDS),
    unit: fc.constantFrom(...UNITS),
    decimal: fc.constantFrom(...DECIMALS),
    timeFormat: fc.constantFrom<TimeFormat>(...TIMED, 'none'),
    separator: fc.constantFrom<Separator>('tab', 'comma', 'semicolon', 'none'),
  })
  .map(({ bars: b, ...rest }) => {
    // One column has no separator; several columns need one.
    const single = rest.timeFormat === 'none' && !rest.indexColumn;
    const separator: Separator = single
      ? rest.separator === 'none'
        ? 'none'
        : rest.separator
      : rest.separator === 'none'
        ? 'tab'
        : rest.separator;
    return { ...rest, ...b, separator };
  });

function expectSameStorm(paste: Paste): void {
  const result = applyRainImport(paste.text, paste.settings);
  if (!result.ok) {
    expect.fail(
      `the import failed on\n${paste.text}\nwith ${JSON.stringify(paste.settings)}:\n${result.problems.map(describeProblem).join('\n')}`,
    );
  }
  const { storm } = result;
  expect(storm.durationsH.length).toBe(paste.durationsH.length);
  // Times pass through minutes → hours (and decimal hours for elapsed-h); relative 1e-9 is far below a second.
  for (let k = 0; k < paste.durationsH.length; k++)
    expectClose(storm.durationsH[k]!, paste.durationsH[k]!, 1e-9, 1e-12);
  // Depths: a cumulative reading minus the one before carries the rounding of the level (up to
  // ~50,000 mm here), not of the bar, so an absolute 1e-7 mm, far below any gauge's resolution.
  for (let k = 0; k < paste.depthsMm.length; k++) expectClose(storm.depthsMm[k]!, paste.depthsMm[k]!, 1e-9, 1e-7);
  expect(storm.startIso).toBe(paste.startIso);
}

describe('a storm written out as text and read back is the same storm', () => {
  it('for every separator, decimal mark, value kind, unit and time format', () => {
    fc.assert(
      fc.property(anySpec, (spec) => expectSameStorm(formatPaste(spec))),
      { numRuns: 1500 },
    );
  }, 60_000);

  it.each(
    (['tab', 'comma', 'semicolon'] as const).flatMap((separator) =>
      DECIMALS.flatMap((decimal) => KINDS.map((valueKind) => [separator, decimal, valueKind] as const)),
    ),
  )('with %s separators, decimal %s and %s values', (separator, decimal, valueKind) => {
    const spec = fc.record({ ...common, bars, unit: fc.constantFrom(...UNITS), timeFormat: fc.constantFrom(...TIMED) });
    fc.assert(
      fc.property(spec, ({ bars: b, ...rest }) =>
        expectSameStorm(formatPaste({ ...rest, ...b, separator, decimal, valueKind })),
      ),
      { numRuns: 60 },
    );
  });
});

/**
 * The same round trip through the guesses alone, for pastes whose column names
 * say what they hold. Limits, each a documented ambiguity rather than a gap:
 * comma-separated text has decimal points; a bare column has decimal points
 * (a lone "1,5" could be two columns); a cumulative column without times must
 * not start at 0 (a leading 0 reads as the starting level); times need two
 * rows (one stamp gives no step); times of day have no date, so no start.
 */
const describedSpec: fc.Arbitrary<PasteSpec> = fc
  .record({
    ...common,
    bars: fc.integer({ min: 2, max: 25 }).chain((n) =>
      fc.record({
        durMin: fc.array(fc.integer({ min: 1, max: 180 }), { minLength: n, maxLength: n }),
        values: fc.array(value, { minLength: n, maxLength: n }),
      }),
    ),
    valueKind: fc.constantFrom(...KINDS),
    unit: fc.constantFrom(...UNITS),
    layout: fc.constantFrom(
      { separator: 'tab' as const, decimal: 'point' as const },
      { separator: 'tab' as const, decimal: 'comma' as const },
      { separator: 'semicolon' as const, decimal: 'comma' as const },
      { separator: 'comma' as const, decimal: 'point' as const },
    ),
    timeFormat: fc.constantFrom<TimeFormat>('iso', 'iso-zone', 'hhmm', 'elapsed-min', 'none'),
  })
  .map(({ bars: b, layout, ...rest }) => {
    const unitName = rest.valueKind === 'intensity' ? `${rest.unit}/h` : rest.unit;
    const kindName =
      rest.valueKind === 'intensity' ? 'Intensity' : rest.valueKind === 'cumulative' ? 'Cumulative rain' : 'Rain depth';
    const step = rest.timeFormat === 'none' ? `, ${b.durMin[0]}-min bars` : '';
    const values =
      rest.valueKind === 'cumulative' && rest.timeFormat === 'none'
        ? b.values.map((v, k) => (k === 0 ? v + 0.5 : v))
        : b.values;
    const timeName = rest.timeFormat === 'elapsed-min' ? 'Elapsed (min)' : 'Time';
    // Single columns keep the decimal point; see above.
    const bare = rest.timeFormat === 'none';
    return {
      ...rest,
      ...layout,
      ...(bare ? { separator: 'none' as const, decimal: 'point' as const } : {}),
      durMin: b.durMin,
      values,
      header: true,
      indexColumn: false,
      // The guesses read elapsed times from 0 as bar starts; written from later, they are bar ends.
      elapsedOrigin: rest.timeFormat === 'elapsed-min' ? rest.elapsedOrigin + 1 : rest.elapsedOrigin,
      timeMarks: 'end' as const,
      cumulativeFrom: rest.timeFormat === 'none' ? ('zero' as const) : ('first-value' as const),
      names: { time: timeName, value: `${kindName} (${unitName})${step}` },
    };
  });

describe('the guesses read a described paste as the storm it stands for', () => {
  it('for tab, semicolon and comma layouts, every value kind and unit', () => {
    fc.assert(
      fc.property(describedSpec, (spec) => {
        const paste = formatPaste(spec);
        const preview = guessRainImport(paste.text);
        expect(preview.problems, `${paste.text}\n${JSON.stringify(preview.settings)}`).toEqual([]);
        expect(preview.settings).toMatchObject({
          valueKind: spec.valueKind,
          unit: spec.unit,
          separator: spec.separator,
          timeKind: paste.settings.timeKind,
          timeColumn: paste.settings.timeColumn,
          valueColumn: paste.settings.valueColumn,
        });
        // Times of day carry no date, and a guess never invents one. The text was written from bars, so its
        // long steps are long bars: read them as such (the guess fills gaps, as a gauge record needs).
        const settings = { ...preview.settings, gaps: 'keep' as const };
        const expected =
          spec.timeFormat === 'hhmm' ? { ...paste, startIso: undefined, settings } : { ...paste, settings };
        expectSameStorm(expected);
      }),
      { numRuns: 800 },
    );
  }, 60_000);
});

describe('a streamflow record written out and read back is the same record', () => {
  it('for every separator, decimal mark and unit', () => {
    const units = { 'm3/s': 1, 'L/s': 1e-3, 'ft3/s': 0.028316846592 } as const;
    const record = fc.record({
      stepsMin: fc.array(fc.integer({ min: 1, max: 24 * 60 }), { minLength: 1, maxLength: 40 }),
      flows: fc.array(fc.double({ min: 0, max: 5000, noNaN: true, noDefaultInfinity: true }), {
        minLength: 41,
        maxLength: 41,
      }),
      unit: fc.constantFrom('m3/s' as const, 'L/s' as const, 'ft3/s' as const),
      layout: fc.constantFrom(
        { separator: 'tab' as const, decimal: 'point' as const, sep: '\t' },
        { separator: 'tab' as const, decimal: 'comma' as const, sep: '\t' },
        { separator: 'semicolon' as const, decimal: 'comma' as const, sep: ';' },
        { separator: 'comma' as const, decimal: 'point' as const, sep: ',' },
      ),
      startMin: fc.integer({ min: 0, max: 30 * 365 * 1440 }),
    });
    fc.assert(
      fc.property(record, ({ stepsMin, flows, unit, layout, startMin }) => {
        const minutes = [0];
        for (const s of stepsMin) minutes.push((minutes[minutes.length - 1] as number) + s);
        const lines = minutes.map((m, k) => {
          const d = new Date(Date.UTC(2000, 0, 1) + (startMin + m) * 60_000).toISOString().slice(0, 16);
          const q = String(flows[k]);
          return `${d}${layout.sep}${layout.decimal === 'comma' ? q.replace('.', ',') : q}`;
        });
        const text = [`Time${layout.sep}Q (${unit})`, ...lines].join('\n');
        const settings = guessFlowSettings(text);
        expect(settings).toMatchObject({ unit, separator: layout.separator, timeKind: 'clock', valueColumn: 2 });
        const result = applyFlowImport(text, { ...settings, decimal: layout.decimal });
        if (!result.ok) expect.fail(result.problems.map(describeProblem).join('\n'));
        const { record: r } = result;
        expect(r.timesH.length).toBe(minutes.length);
        minutes.forEach((m, k) => expectClose(r.timesH[k]!, m / 60, 1e-12, 1e-12));
        minutes.forEach((_, k) => expectClose(r.dischargeM3s[k]!, flows[k]! * units[unit], 1e-15, 0));
        expect(r.startIso).toBe(new Date(Date.UTC(2000, 0, 1) + startMin * 60_000).toISOString().slice(0, 16) + ':00');
      }),
      { numRuns: 500 },
    );
  }, 60_000);
});
