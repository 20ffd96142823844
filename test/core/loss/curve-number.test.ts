import { describe, expect, it } from 'vitest';
import {
  computeLosses,
  curveNumberRetentionMm,
  curveNumberRunoffMm,
  validateMethod,
  type LossMethod,
} from '../../../src/core';
import { readFixtureCsv } from '../../helpers/fixture-csv';
import { expectClose } from '../../helpers/tolerance';
import { expectInputError } from '../../helpers/input-error';

const IN = 25.4; // mm per inch, exact

describe('curve number against USDA SCS (1986) TR-55, Table 2-1', () => {
  const table = readFixtureCsv('tr55-table-2-1-runoff-depth.csv');

  it('reads the fixture with its source header', () => {
    expect(table.header).toMatch(/Technical Release 55 \(TR-55\).*Table 2-1/s);
    expect(table.rows).toHaveLength(6);
    expect(table.columns).toHaveLength(13);
  });

  // Every cell: a one-bar storm of P inches, runoff in inches within the
  // table's printed rounding (0.005 in) plus float slack.
  const cells = table.rows.flatMap((row) =>
    table.columns.slice(1).map((col, c) => ({
      pIn: Number(row[0]),
      cn: Number(col.replace('CN', '')),
      qIn: Number(row[c + 1]),
    })),
  );
  it.each(cells)('P = $pIn in, CN $cn gives the printed $qIn in', ({ pIn, cn, qIn }) => {
    const r = computeLosses({ durationsH: [24], depthsMm: [pIn * IN] }, { kind: 'curve-number', cn, iaRatio: 0.2 });
    expect(Math.abs(r.totalExcessMm / IN - qIn)).toBeLessThanOrEqual(0.005 + 1e-9);
  });

  it('covers the fixture’s 72 cells (P = 1–6 in, 12 CN columns), not the whole printed table', () => {
    expect(cells).toHaveLength(72);
    expect(cells.every((c) => Number.isFinite(c.pIn) && Number.isFinite(c.cn) && Number.isFinite(c.qIn))).toBe(true);
  });
});

describe('curve number runoff', () => {
  it('takes S = 25400/CN − 254 mm (TR-55 eq. 2-4 in mm: S = 1000/CN − 10 in)', () => {
    expectClose(curveNumberRetentionMm(80), (1000 / 80 - 10) * IN, 1e-14);
    expect(curveNumberRetentionMm(100)).toBe(0);
  });

  it('gives bar excess as differences of cumulative runoff, so the total is Q(ΣP) for any bar pattern', () => {
    const storm = { durationsH: [0.5, 0.25, 1, 2, 0.1], depthsMm: [4, 12, 30, 0, 9] };
    const method = { kind: 'curve-number', cn: 72, iaRatio: 0.2 } as const;
    const r = computeLosses(storm, method);
    let cum = 0;
    for (let k = 0; k < storm.depthsMm.length; k++) {
      const before = curveNumberRunoffMm(72, 0.2, cum);
      cum += storm.depthsMm[k] as number;
      expectClose(r.excessMm[k] as number, curveNumberRunoffMm(72, 0.2, cum) - before, 1e-12, 1e-12);
    }
    expectClose(r.totalExcessMm, curveNumberRunoffMm(72, 0.2, 55), 1e-13);
  });

  it('loses everything until the initial abstraction 0.2 S is filled', () => {
    const s = curveNumberRetentionMm(60); // 169.33 mm, Iₐ = 33.87 mm
    const r = computeLosses(
      { durationsH: [1, 1], depthsMm: [0.2 * s - 1, 0.999] },
      { kind: 'curve-number', cn: 60, iaRatio: 0.2 },
    );
    expect(r.totalExcessMm).toBe(0);
  });

  it('runs off every drop at CN 100', () => {
    const r = computeLosses(
      { durationsH: [1, 0.5], depthsMm: [3, 7] },
      { kind: 'curve-number', cn: 100, iaRatio: 0.2 },
    );
    expect(Array.from(r.excessMm)).toEqual([3, 7]);
  });

  it('on the 0.05 basis by the constant ratio uses S₀.₀₅ = 1.42·S₀.₂ and Iₐ = 0.05·S₀.₀₅ (Woodward et al. 2003, from memory)', () => {
    // Hand computation from those equations: CN 80 → S₀.₂ = 63.5 mm,
    // S₀.₀₅ = 90.17 mm, Iₐ = 4.5085 mm; P = 50 mm → Q = 45.4915²/(45.4915 + 90.17).
    expectClose(curveNumberRetentionMm(80, 0.05, 'ratio'), 90.17, 1e-13);
    const r = computeLosses(
      { durationsH: [3], depthsMm: [50] },
      { kind: 'curve-number', cn: 80, iaRatio: 0.05, conversion: 'ratio' },
    );
    expectClose(r.totalExcessMm, (45.4915 * 45.4915) / (45.4915 + 90.17), 1e-12);
  });

  it('on the 0.05 basis by the power relation uses S₀.₀₅ = 1.33·S₀.₂^1.15, S in inches (Woodward et al. 2003; Hawkins et al. 2009; from memory)', () => {
    // By hand: CN 60 → S₀.₂ = 1000/60 − 10 = 6.6667 in; 6.6667^1.15 = e^(1.15·1.897120)
    // = 8.861251; S₀.₀₅ = 1.33·8.861251 = 11.785464 in = 299.35079 mm, Iₐ = 14.967540 mm.
    // P = 200 mm: x = P − Iₐ = 185.032460, Q = x²/(x + S) = 34237.01/484.38325 = 70.68166 mm.
    const power: LossMethod = { kind: 'curve-number', cn: 60, iaRatio: 0.05, conversion: 'power' };
    expectClose(curveNumberRetentionMm(60, 0.05, 'power'), 25.4 * 1.33 * Math.pow(1000 / 60 - 10, 1.15), 1e-13);
    expectClose(curveNumberRetentionMm(60, 0.05, 'power'), 299.35079, 1e-7);
    const r = computeLosses({ durationsH: [6], depthsMm: [200] }, power);
    expectClose(r.totalExcessMm, 70.68166, 1e-6);
    // The same storm by the constant ratio: S₀.₀₅ = 1.42·169.3333 = 240.4533 mm, Iₐ = 12.022667 mm,
    // x = 187.977333, Q = 35335.48/428.43067 = 82.47654 mm: 11.8 mm more runoff.
    const ratio = computeLosses({ durationsH: [6], depthsMm: [200] }, { ...power, conversion: 'ratio' } as LossMethod);
    expectClose(ratio.totalExcessMm, 82.47654, 1e-6);
  });

  it('uses the power relation when the conversion is left out, and ignores the conversion on the 0.2 basis', () => {
    const storm = { durationsH: [6], depthsMm: [120] };
    const left = computeLosses(storm, { kind: 'curve-number', cn: 65, iaRatio: 0.05 });
    const power = computeLosses(storm, { kind: 'curve-number', cn: 65, iaRatio: 0.05, conversion: 'power' });
    expect(left.totalExcessMm).toBe(power.totalExcessMm);
    const a = computeLosses(storm, { kind: 'curve-number', cn: 65, iaRatio: 0.2, conversion: 'power' });
    const b = computeLosses(storm, { kind: 'curve-number', cn: 65, iaRatio: 0.2, conversion: 'ratio' });
    expect(a.totalExcessMm).toBe(b.totalExcessMm);
  });

  it('gives the same S by both conversions where they cross, S₀.₂ = (1.42/1.33)^(1/0.15) = 1.547 in (CN 86.6)', () => {
    // 1.33·S^1.15 = 1.42·S ⇔ S^0.15 = 1.42/1.33 ⇔ S = 1.0676692^6.6667
    // = e^(6.6667·0.0654770) = e^0.436513 = 1.54731 in, CN = 1000/11.54731 = 86.60.
    const s02In = Math.pow(1.42 / 1.33, 1 / 0.15);
    expectClose(s02In, 1.54731, 1e-5);
    const cn = 1000 / (s02In + 10);
    expectClose(curveNumberRetentionMm(cn, 0.05, 'power'), curveNumberRetentionMm(cn, 0.05, 'ratio'), 1e-12);
  });

  it('on the 0.05 basis makes runoff from rain that the 0.2 basis fully abstracts', () => {
    // CN 70: Iₐ is 21.8 mm on the 0.2 basis, 7.7 mm on the 0.05 basis.
    const storm = { durationsH: [2], depthsMm: [15] };
    expect(computeLosses(storm, { kind: 'curve-number', cn: 70, iaRatio: 0.2 }).totalExcessMm).toBe(0);
    expect(computeLosses(storm, { kind: 'curve-number', cn: 70, iaRatio: 0.05 }).totalExcessMm).toBeGreaterThan(0);
  });

  it('keeps full precision on a long storm (no cancellation in Q differences)', () => {
    const n = 100_000;
    const storm = { durationsH: new Array<number>(n).fill(0.1), depthsMm: new Array<number>(n).fill(1) };
    const r = computeLosses(storm, { kind: 'curve-number', cn: 85, iaRatio: 0.2 });
    // Late bars: Q' → 1, bar excess 1 − S²/(x + S)² to full relative precision.
    const s = curveNumberRetentionMm(85);
    const x = n - 0.2 * s;
    const last = 1 - (s * s) / ((x + s) * (x - 1 + s));
    expectClose(r.excessMm[n - 1] as number, last, 1e-12);
    expectClose(r.totalExcessMm, curveNumberRunoffMm(85, 0.2, n), 1e-12);
  });
});

describe('curve number input checks', () => {
  it.each([
    [{ kind: 'curve-number', cn: 0, iaRatio: 0.2 }, 'cn', /greater than 0 and at most 100/],
    [{ kind: 'curve-number', cn: 101, iaRatio: 0.2 }, 'cn', /got 101/],
    [{ kind: 'curve-number', cn: Number.NaN, iaRatio: 0.2 }, 'cn', /finite number/],
    [{ kind: 'curve-number', cn: 70, iaRatio: 0.1 }, 'iaRatio', /0\.2 or 0\.05/],
    [{ kind: 'curve-number', cn: 70, iaRatio: 0.05, conversion: 'linear' }, 'conversion', /"power" or "ratio"/],
  ])('rejects %o naming the field', (method, field, message) => {
    expectInputError(() => validateMethod(method as never), field, message);
  });
});
