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
      { kind: 'green-ampt', ksMmH: 3.4, suctionMm: 88.9, moistureDeficit: 0.3, recovers: false, recoveryPerH: 0.4 },
      'si',
    );
    expect(off).toContain('Capacity recovers in dry spells: no');
    expect(off).not.toContain('Recovery rate');
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
