/**
 * Unit conversions at the edges. Inside the core everything is SI and fixed:
 * depth mm, time h, rate mm/h, area m², volume m³, discharge m³/s.
 *
 * Every factor is an exact definition: 1 in = 25.4 mm and 1 ft = 0.3048 m
 * (international yard and pound, US National Bureau of Standards 1959; NIST
 * SP 811, 2008, appendix B), 1 mi = 5280 ft, 1 acre = 43,560 ft², 1 ha = 10⁴ m²,
 * 1 ML = 10³ m³, 1 L = 10⁻³ m³. Derived factors below are products of these,
 * written out so they can be checked by eye.
 */

// Derived factors are written as their exact decimal values (the products of
// the definitions below, worked out by hand) so each is the double nearest the
// exact value (1 ft = 0.3048 m, 1 mi = 5280 ft); multiplying the factors in floating point would not be
// (43560 × 0.3048² gives 4046.8564224000006, one unit in the last place off).
const INCH_MM = 25.4;
const ACRE_M2 = 4046.8564224; // 43,560 ft²
const CUBIC_FOOT_M3 = 0.028316846592; // 0.3048³
const ACRE_FOOT_M3 = 1233.48183754752; // 43,560 ft³

/** Size of one unit in the internal unit of its quantity. */
export const DEPTH_UNITS = { mm: 1, in: INCH_MM } as const;
export const RATE_UNITS = { 'mm/h': 1, 'in/h': INCH_MM } as const;
export const AREA_UNITS = {
  m2: 1,
  ha: 1e4,
  km2: 1e6,
  acre: ACRE_M2,
  mi2: 2589988.110336, // (5280 ft)² = 1609.344² m²
} as const;
export const VOLUME_UNITS = {
  m3: 1,
  ML: 1e3,
  ft3: CUBIC_FOOT_M3,
  'acre-ft': ACRE_FOOT_M3,
} as const;
export const DISCHARGE_UNITS = {
  'm3/s': 1,
  'L/s': 1e-3,
  'ft3/s': CUBIC_FOOT_M3,
} as const;

export type DepthUnit = keyof typeof DEPTH_UNITS;
export type RateUnit = keyof typeof RATE_UNITS;
export type AreaUnit = keyof typeof AREA_UNITS;
export type VolumeUnit = keyof typeof VOLUME_UNITS;
export type DischargeUnit = keyof typeof DISCHARGE_UNITS;

/** Human labels for unit keys. */
export const UNIT_LABELS: Readonly<Record<string, string>> = {
  mm: 'mm',
  in: 'in',
  'mm/h': 'mm/h',
  'in/h': 'in/h',
  m2: 'm²',
  ha: 'ha',
  km2: 'km²',
  acre: 'acres',
  mi2: 'mi²',
  m3: 'm³',
  ML: 'ML',
  ft3: 'ft³',
  'acre-ft': 'acre-ft',
  'm3/s': 'm³/s',
  'L/s': 'L/s',
  'ft3/s': 'ft³/s',
};

type Table = Readonly<Record<string, number>>;

function convert<T extends Table>(table: T, value: number, from: keyof T, to: keyof T): number {
  if (from === to) return value;
  return (value * (table[from] as number)) / (table[to] as number);
}

export const convertDepth = (value: number, from: DepthUnit, to: DepthUnit): number =>
  convert(DEPTH_UNITS, value, from, to);
export const convertRate = (value: number, from: RateUnit, to: RateUnit): number =>
  convert(RATE_UNITS, value, from, to);
export const convertArea = (value: number, from: AreaUnit, to: AreaUnit): number =>
  convert(AREA_UNITS, value, from, to);
export const convertVolume = (value: number, from: VolumeUnit, to: VolumeUnit): number =>
  convert(VOLUME_UNITS, value, from, to);
export const convertDischarge = (value: number, from: DischargeUnit, to: DischargeUnit): number =>
  convert(DISCHARGE_UNITS, value, from, to);

/** Runoff volume, m³, of an excess depth (mm) over a catchment area (m²). */
export function runoffVolumeM3(excessMm: number, areaM2: number): number {
  return (excessMm / 1000) * areaM2;
}

/** Depth, mm, of a volume (m³) spread over an area (m²); 0 for no area. */
export function depthFromVolumeMm(volumeM3: number, areaM2: number): number {
  return areaM2 > 0 ? (volumeM3 / areaM2) * 1000 : 0;
}

/** The two unit systems the screen switches between. */
export type UnitSystem = 'si' | 'us';

/** Units each quantity is shown in, per system. */
export const DISPLAY_UNITS = {
  si: { depth: 'mm', rate: 'mm/h', area: 'ha', volume: 'm3', discharge: 'm3/s' },
  us: { depth: 'in', rate: 'in/h', area: 'acre', volume: 'acre-ft', discharge: 'ft3/s' },
} as const satisfies Record<
  UnitSystem,
  { depth: DepthUnit; rate: RateUnit; area: AreaUnit; volume: VolumeUnit; discharge: DischargeUnit }
>;

/** The area units of each system, its display unit first (the catchment-area field offers these). */
export const SYSTEM_AREA_UNITS: Readonly<Record<UnitSystem, readonly AreaUnit[]>> = {
  si: ['ha', 'km2', 'm2'],
  us: ['acre', 'mi2'],
};
