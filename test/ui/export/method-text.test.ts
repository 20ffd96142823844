// The method line every export carries (CSV notes, chart heading, printed
// report): each setting that takes part, and nothing that takes none.
import { describe, expect, it } from 'vitest';
import { methodParametersText } from '../../../src/ui/export/bar-table-csv';

describe('the method line of an export', () => {
  it('carries recovery in dry spells and its rate while it is on', () => {
    const on = methodParametersText(
      { kind: 'horton', f0MmH: 60, fcMmH: 8, kPerH: 3, ponding: false, recovers: true, recoveryPerH: 0.4 },
      'si',
    );
    expect(on).toBe(
      'Initial capacity f₀ = 60 mm/h; Final capacity f_c = 8 mm/h; Decay constant k = 3 1/h; Recovery rate k_r = 0.4 1/h; ' +
        'Capacity follows: time since the rain began; Capacity recovers in dry spells: yes',
    );
  });

  it('says recovery is off and leaves the rate out while it is off', () => {
    const off = methodParametersText(
      { kind: 'horton', f0MmH: 60, fcMmH: 8, kPerH: 3, ponding: false, recovers: false, recoveryPerH: 0.4 },
      'si',
    );
    expect(off).toContain('Capacity recovers in dry spells: no');
    expect(off).not.toContain('Recovery rate');
  });

  it('carries Green–Ampt’s soil values for recovery (Sᵢ, λ) while it is on, and leaves them out while it is off', () => {
    const soil = { kind: 'green-ampt', ksMmH: 3.4, suctionMm: 88.9, moistureDeficit: 0.3 } as const;
    const on = methodParametersText({ ...soil, recovers: true, initialSaturation: 0.3, poreSizeIndex: 0.22 }, 'si');
    expect(on).toBe(
      'Hydraulic conductivity K = 3.4 mm/h; Wetting-front suction head ψ = 88.9 mm; Moisture deficit Δθ = 0.3; ' +
        'Initial saturation Sᵢ = 0.3; Pore-size distribution index λ = 0.22; Capacity recovers in dry spells: yes',
    );
    const off = methodParametersText({ ...soil, recovers: false, initialSaturation: 0.3, poreSizeIndex: 0.22 }, 'si');
    expect(off).toContain('Capacity recovers in dry spells: no');
    expect(off).not.toMatch(/Sᵢ|λ|Recovery rate/);
  });

  it('names the S conversion on the 0.05 basis only', () => {
    expect(methodParametersText({ kind: 'curve-number', cn: 70, iaRatio: 0.05, conversion: 'ratio' }, 'si')).toBe(
      'Curve number CN = 70; Initial abstraction: Iₐ = 0.05 S; S for Iₐ = 0.05 S: S₀.₀₅ = 1.42 S₀.₂',
    );
    expect(methodParametersText({ kind: 'curve-number', cn: 70, iaRatio: 0.2, conversion: 'ratio' }, 'si')).toBe(
      'Curve number CN = 70; Initial abstraction: Iₐ = 0.2 S (standard)',
    );
  });
});
