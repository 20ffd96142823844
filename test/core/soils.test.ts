import { describe, expect, it } from 'vitest';
import {
  greenAmptForTexture,
  InputError,
  moistureDeficitFromSaturation,
  SOIL_TEXTURES,
  soilTexture,
  validateMethod,
} from '../../src/core';
import { readFixtureCsv } from '../helpers/fixture-csv';
import { expectClose } from '../helpers/tolerance';

// Rawls, Brakensiek & Miller (1983), J. Hydraul. Eng. 109(1), mean Green–Ampt
// parameters for 11 textures (as tabulated in Chow, Maidment & Mays 1988, Table 4.3.1).
describe('soil-texture presets against Rawls, Brakensiek & Miller (1983)', () => {
  const table = readFixtureCsv('rawls-1983-green-ampt-parameters.csv');

  it('reads the fixture with its source header', () => {
    expect(table.header).toMatch(/Rawls, W\.J\., Brakensiek, D\.L\. and Miller, N\. \(1983\)/);
    expect(table.columns).toEqual([
      'texture',
      'porosity',
      'effective_porosity',
      'suction_head_cm',
      'hydraulic_conductivity_cm_per_h',
    ]);
  });

  it('has the same 11 textures, in the same order', () => {
    expect(SOIL_TEXTURES.map((t) => t.name)).toEqual(table.rows.map((r) => r[0]));
    expect(SOIL_TEXTURES).toHaveLength(11);
  });

  it.each(table.rows.map((r) => [r[0] as string, r]))('matches the published row for %s (cm → mm)', (name, row) => {
    const soil = soilTexture(name as never);
    expectClose(soil.porosity, Number(row[1]), 1e-15);
    expectClose(soil.effectivePorosity, Number(row[2]), 1e-15);
    expectClose(soil.suctionMm, Number(row[3]) * 10, 1e-14);
    expectClose(soil.ksMmH, Number(row[4]) * 10, 1e-14);
  });
});

// Rawls, Brakensiek & Saxton (1982), Trans. ASAE 25(5): Brooks–Corey λ and h_b by texture,
// from memory (see the fixture's header). The memory is checked against the published table above.
describe('Brooks–Corey pore-size index λ of each texture (Rawls, Brakensiek & Saxton 1982; from memory)', () => {
  const bc = readFixtureCsv('rawls-1982-brooks-corey-parameters.csv');
  const ga = readFixtureCsv('rawls-1983-green-ampt-parameters.csv');

  it('reads the fixture with its source header, marked from memory', () => {
    expect(bc.header).toMatch(/Rawls, W\.J\., Brakensiek, D\.L\. and Saxton, K\.E\. \(1982\)/);
    expect(bc.header).toMatch(/FROM MEMORY/);
    expect(bc.rows.map((r) => r[0])).toEqual(SOIL_TEXTURES.map((t) => t.name));
  });

  it.each(bc.rows.map((r) => [r[0] as string, r]))('carries λ of %s', (name, row) => {
    expect(soilTexture(name as never).poreSizeIndex).toBe(Number(row[3]));
  });

  it.each(bc.rows.map((r, i) => [r[0] as string, r, ga.rows[i] as readonly string[]]))(
    'gives back the published Green–Ampt ψ of %s within 2 % by ψ = h_b(2 + 3λ)/(2(1 + 3λ)) (Rawls, Brakensiek & Miller 1983)',
    (_name, row, published) => {
      // e.g. loam: 11.15·(2 + 0.66)/(2·(1 + 0.66)) = 11.15·2.66/3.32 = 8.933 cm against 8.89 cm printed.
      const lambda = Number(row[3]);
      const psi = (Number(row[2]) * (2 + 3 * lambda)) / (2 * (1 + 3 * lambda));
      expect(Math.abs(psi / Number(published[3]) - 1)).toBeLessThanOrEqual(0.02);
    },
  );
});

describe('moisture deficit from initial effective saturation', () => {
  it('is (1 − Sₑ)·θₑ (Chow, Maidment & Mays 1988, §4.3): silt loam at Sₑ = 0.3 gives 0.340', () => {
    // Chow et al. (1988) Example 4.3.1 prints Δθ = 0.340 (from memory): 0.7 × 0.486 = 0.3402.
    expectClose(moistureDeficitFromSaturation(0.486, 0.3), 0.3402, 1e-14);
    expect(moistureDeficitFromSaturation(0.4, 1)).toBe(0);
    expect(moistureDeficitFromSaturation(0.4, 0)).toBe(0.4);
  });

  it('builds a valid Green–Ampt method from a texture', () => {
    const m = greenAmptForTexture('clay loam', 0.5);
    expect(m).toEqual({
      kind: 'green-ampt',
      ksMmH: 1,
      suctionMm: 208.8,
      moistureDeficit: 0.5 * 0.309,
      initialSaturation: 0.5,
      poreSizeIndex: 0.194,
    });
    expect(() => validateMethod(m)).not.toThrow();
  });

  it('names the field for a saturation or porosity outside 0..1, and an unknown texture', () => {
    const fieldOf = (fn: () => unknown): string | undefined => {
      try {
        fn();
      } catch (error) {
        if (error instanceof InputError) return error.field;
      }
      return undefined;
    };
    expect(fieldOf(() => moistureDeficitFromSaturation(0.4, 1.2))).toBe('initialSaturation');
    expect(fieldOf(() => moistureDeficitFromSaturation(0.4, Number.NaN))).toBe('initialSaturation');
    expect(fieldOf(() => moistureDeficitFromSaturation(-0.1, 0.5))).toBe('effectivePorosity');
    expect(fieldOf(() => soilTexture('peat' as never))).toBe('texture');
  });
});
