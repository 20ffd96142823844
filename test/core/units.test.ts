// Unit conversions against the published exact definitions.
import { describe, expect, it } from 'vitest';
import {
  AREA_UNITS,
  DISCHARGE_UNITS,
  VOLUME_UNITS,
  convertArea,
  convertDepth,
  convertDischarge,
  convertRate,
  convertVolume,
  depthFromVolumeMm,
  runoffVolumeM3,
} from '../../src/core';
import { expectClose } from '../helpers/tolerance';

describe('exact definitions', () => {
  it('1 in = 25.4 mm exactly (international inch; NBS notice 1959; NIST SP 811 (2008) appendix B.8)', () => {
    expect(convertDepth(1, 'in', 'mm')).toBe(25.4);
    expect(convertRate(1, 'in/h', 'mm/h')).toBe(25.4);
    expect(convertDepth(254, 'mm', 'in')).toBe(10);
  });

  it('1 ft³ = 0.028316846592 m³ exactly (1 ft = 0.3048 m; NIST SP 811 (2008) B.8)', () => {
    expect(VOLUME_UNITS.ft3).toBe(0.028316846592);
    expect(DISCHARGE_UNITS['ft3/s']).toBe(0.028316846592);
    expectClose(0.3048 ** 3, VOLUME_UNITS.ft3, 1e-15); // the product of the definitions, to rounding
  });

  it('1 acre = 43,560 ft² = 4046.8564224 m² (international foot; NIST Handbook 44 (2023) appendix C)', () => {
    // The double nearest the exact value, not 43560 × 0.3048² in floating point (1 ulp above).
    expect(AREA_UNITS.acre).toBe(4046.8564224);
    expectClose(43560 * 0.3048 * 0.3048, AREA_UNITS.acre, 1e-15);
  });

  it('1 acre-ft = 1233.48183754752 m³ (43,560 ft³ of the international foot)', () => {
    expect(VOLUME_UNITS['acre-ft']).toBe(1233.48183754752);
    expectClose(43560 * 0.3048 ** 3, VOLUME_UNITS['acre-ft'], 1e-15);
  });

  it('1 mi² = 2,589,988.110336 m² (1 mi = 5280 ft = 1609.344 m; NIST SP 811 (2008) B.8)', () => {
    expect(AREA_UNITS.mi2).toBe(2589988.110336);
    expectClose((5280 * 0.3048) ** 2, AREA_UNITS.mi2, 1e-15);
    expectClose(convertArea(1, 'mi2', 'acre'), 640, 1e-14);
  });

  it('1 ha = 10⁴ m², 1 km² = 100 ha, 1 ML = 10³ m³, 1 L/s = 10⁻³ m³/s (SI, BIPM brochure 9th ed. table 8)', () => {
    expect(convertArea(1, 'km2', 'ha')).toBe(100);
    expect(convertVolume(1, 'ML', 'm3')).toBe(1000);
    expect(convertDischarge(1000, 'L/s', 'm3/s')).toBe(1);
  });
});

describe('runoff volume', () => {
  it('is excess depth × area: 10 mm over 1 km² is 10,000 m³ = 10 ML', () => {
    expect(runoffVolumeM3(10, 1e6)).toBe(10000);
    expect(convertVolume(runoffVolumeM3(10, 1e6), 'm3', 'ML')).toBe(10);
  });

  it('1 in over 1 acre is 1/12 acre-ft (definition of the acre-foot)', () => {
    const m3 = runoffVolumeM3(25.4, AREA_UNITS.acre);
    expectClose(convertVolume(m3, 'm3', 'acre-ft'), 1 / 12, 1e-14);
  });

  it('depth from volume inverts it, and is 0 without an area', () => {
    expectClose(depthFromVolumeMm(runoffVolumeM3(12.5, 3.2e6), 3.2e6), 12.5, 1e-14);
    expect(depthFromVolumeMm(100, 0)).toBe(0);
  });

  it('round-trips every unit pair', () => {
    for (const table of [AREA_UNITS, VOLUME_UNITS]) {
      for (const a of Object.keys(table)) {
        for (const b of Object.keys(table)) {
          const convert = table === AREA_UNITS ? convertArea : convertVolume;
          expectClose(convert(convert(7.3, a as never, b as never), b as never, a as never), 7.3, 1e-14);
        }
      }
    }
  });
});
