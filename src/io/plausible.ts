import { MIN_STEP_H, type Storm } from '../core';

/**
 * What each quantity a person types or pastes can mean: one stated range per
 * quantity, in SI, with where each bound comes from. A value outside it is
 * refused at the edge, with a message quoting what was typed, before it
 * reaches the store or the chart (so no field ever holds 10³⁰⁰ mm). These are
 * bounds of meaning, far wider than any design value: the core's own
 * physical bounds (a runoff coefficient between 0 and 1, CN up to 100) still
 * apply inside them.
 *
 * Rainfall that is possible but beyond the world's records is not refused;
 * `stormBeyondRecords` flags it in plain words instead.
 */
export type PlausibleQuantity =
  | 'depth'
  | 'rate'
  | 'decay'
  | 'area'
  | 'volume'
  | 'barDuration'
  | 'stormDuration'
  | 'offset'
  | 'barCount'
  | 'responseTime'
  | 'unitDischarge'
  | 'uncertainty';

export interface PlausibleRange {
  /** SI unit of the bounds: mm, mm/h, 1/h, m², m³, h, or '' for counts. */
  readonly unit: string;
  /** What the quantity is, for messages: "a rainfall depth". */
  readonly noun: string;
  readonly min: number;
  /** True when `min` itself is not allowed (a bar must last some time). */
  readonly minExclusive: boolean;
  readonly max: number;
  /** Where each bound comes from, in a sentence. */
  readonly why: { readonly min: string; readonly max: string };
}

/** Land area of the Earth, about 1.49·10⁸ km² (from memory). */
const EARTH_LAND_M2 = 1.49e14;
/** A year of 366 days, in hours. */
const YEAR_H = 366 * 24;
// The times below are the first gate for typed values; the core's limits of
// time (src/core/time-limits.ts: bars of at least MIN_STEP_H, spans of at most
// MAX_RECORD_H) are the last. The shortest bar is the core's, read from there
// so the bound lives in one place; the longest here (a year) lies well inside.

/** The one table of plausible ranges. */
export const PLAUSIBLE: Readonly<Record<PlausibleQuantity, PlausibleRange>> = {
  depth: {
    unit: 'mm',
    noun: 'a rainfall or runoff depth',
    min: 0,
    minExclusive: false,
    max: 30_000,
    why: {
      min: 'a depth of water cannot be negative (physical limit).',
      max: 'no storm, bar or runoff can hold more than the wettest 12 months on record, about 26,470 mm at Cherrapunji, India, in 1860–61 (world record, from memory).',
    },
  },
  rate: {
    unit: 'mm/h',
    noun: 'a loss rate or infiltration capacity',
    min: 0,
    minExclusive: false,
    max: 1e7,
    why: {
      min: 'a rate of loss cannot be negative (physical limit).',
      max: 'the most intense rain on record is about 38 mm in a minute (some 2,300 mm/h, Barot, Guadeloupe, 1970; from memory) and clean gravel conducts at most about 1 m/s (3.6 million mm/h; Freeze & Cherry 1979, from memory); a faster rate only means every drop is lost, which any rate above the storm’s peak already gives.',
    },
  },
  decay: {
    unit: '1/h',
    noun: 'a decay constant',
    min: 0,
    minExclusive: false,
    max: 10_000,
    why: {
      min: 'a capacity that grows with time is not a decay (physical limit).',
      max: 'at 10,000 per hour the capacity falls to its final value within a second, finer than any rainfall record resolves (common practice, no source).',
    },
  },
  area: {
    unit: 'm²',
    noun: 'a catchment area',
    min: 0,
    minExclusive: false,
    max: EARTH_LAND_M2,
    why: {
      min: 'an area cannot be negative (physical limit).',
      max: 'no catchment is larger than the land of the Earth, about 149 million km² (from memory).',
    },
  },
  volume: {
    unit: 'm³',
    noun: 'a runoff volume',
    min: 0,
    minExclusive: false,
    max: 30 * EARTH_LAND_M2,
    why: {
      min: 'a volume of water cannot be negative (physical limit).',
      max: 'it is more than 30 m of runoff over all the land of the Earth, the largest depth and the largest catchment above (limits of this table).',
    },
  },
  barDuration: {
    unit: 'h',
    noun: 'a bar or time step',
    min: MIN_STEP_H,
    minExclusive: false,
    max: YEAR_H,
    why: {
      min: 'no rain gauge resolves less than a second (common practice, no source).',
      max: 'a rainfall bar is one reading of a gauge, and the longest totals kept are yearly (common practice, no source).',
    },
  },
  stormDuration: {
    unit: 'h',
    noun: 'a storm duration',
    min: MIN_STEP_H,
    minExclusive: false,
    max: YEAR_H,
    why: {
      min: 'no rain gauge resolves less than a second (common practice, no source).',
      max: 'an event for loss calculations lasts hours or days; a year is far beyond any (common practice, no source).',
    },
  },
  offset: {
    unit: 'h',
    noun: 'a time between the storm and the record',
    min: -YEAR_H,
    minExclusive: false,
    max: YEAR_H,
    why: {
      min: 'a streamflow record for an event starts within days of its storm; a year is far beyond that (common practice, no source).',
      max: 'a streamflow record for an event starts within days of its storm; a year is far beyond that (common practice, no source).',
    },
  },
  responseTime: {
    unit: 'h',
    noun: 'a lag, time of concentration or storage constant',
    min: 0,
    minExclusive: true,
    max: YEAR_H,
    why: {
      min: 'a catchment takes some time to respond (physical limit).',
      max: 'the largest river basins take weeks to respond to a storm; a year is far beyond any (common practice, no source).',
    },
  },
  unitDischarge: {
    unit: 'm³/s per mm',
    noun: 'a unit hydrograph ordinate',
    min: 0,
    minExclusive: false,
    max: 1e5,
    why: {
      min: 'a discharge cannot be negative (physical limit).',
      max: 'the largest river floods on record carry a few hundred thousand m³/s from many tens of mm of runoff (the Amazon, from memory), a few thousand m³/s per mm; 100,000 per mm is far beyond any (limits of this table).',
    },
  },
  uncertainty: {
    unit: '%',
    noun: 'an uncertainty of the observed runoff',
    min: 0,
    minExclusive: false,
    max: 99.99,
    why: {
      min: 'an uncertainty is a width, not a direction, so it cannot be negative (physical limit).',
      max: 'at 100 % or more the lower end of the observed runoff would be no runoff at all, and nothing could be fitted there (physical limit).',
    },
  },
  barCount: {
    unit: '',
    noun: 'a number of bars',
    min: 1,
    minExclusive: false,
    max: 1_000_000,
    why: {
      min: 'a storm to draw on needs at least one bar.',
      max: 'a million bars is the most a storm tool makes (the core’s MAX_TOOL_BARS), over six years of 5-minute bars.',
    },
  },
};

/** A value outside its quantity's range: which side, and the bound it passed. */
export interface Breach {
  readonly quantity: PlausibleQuantity;
  readonly side: 'above' | 'below';
  /** The bound passed, in SI. */
  readonly limit: number;
}

/** The bound a value (SI) passes, or null when it is within the quantity's range. */
export function checkPlausible(quantity: PlausibleQuantity, valueSI: number): Breach | null {
  const range = PLAUSIBLE[quantity];
  if (!Number.isFinite(valueSI) || valueSI > range.max) return { quantity, side: 'above', limit: range.max };
  const below = range.minExclusive ? valueSI <= range.min : valueSI < range.min;
  return below ? { quantity, side: 'below', limit: range.min } : null;
}

/**
 * The sentence that refuses a breach: what was typed (quoted, with its unit),
 * the bound as the screen writes it, and where the bound comes from.
 */
export function breachMessage(breach: Breach, typed: string, limitText: string): string {
  const range = PLAUSIBLE[breach.quantity];
  if (breach.side === 'above') {
    return `${typed} is more than ${range.noun} can be (at most ${limitText}): ${range.why.max}`;
  }
  return range.min === 0 && !range.minExclusive
    ? `${typed}: ${range.noun} cannot be negative.`
    : `${typed} is less than ${range.noun} can be (at least ${limitText}): ${range.why.min}`;
}

/**
 * The first bar of a storm holding more than a rainfall depth can be, or
 * null when every bar can be rain. A storm made by a tool (scaled, drawn,
 * designed) or read from text is checked with it before it is used. The
 * total is not bounded: a gauge record of many years holds more than any
 * one storm.
 */
export function checkStormDepths(storm: Storm): { readonly bar: number; readonly breach: Breach } | null {
  const n = storm.depthsMm.length;
  for (let k = 0; k < n; k++) {
    const breach = checkPlausible('depth', storm.depthsMm[k] as number);
    if (breach) return { bar: k, breach };
  }
  return null;
}

/**
 * The world-record envelope of rainfall depth against duration,
 * P ≈ 422·D^0.475 (P in mm, D in hours), drawn above the world's greatest
 * observed point rainfalls (Jennings 1950; the constants from memory). It
 * gives about 60 mm in a minute, 422 mm in an hour and 1,900 mm in a day,
 * above the records it was drawn over (38 mm in a minute, 305 mm in 42
 * minutes, 1,825 mm in a day; from memory).
 */
export function recordDepthMm(durationH: number): number {
  return 422 * Math.pow(durationH, 0.475);
}

/** A bar holding more rain than has ever been recorded over its duration. */
export interface RecordBreach {
  /** 0-based bar index. */
  readonly bar: number;
  readonly depthMm: number;
  readonly durationH: number;
  readonly recordMm: number;
}

/**
 * Bars of a storm beyond the world-record envelope: possible in a typed or
 * made-up storm, never seen in a real one. Returns how many, and the first.
 */
export function stormBeyondRecords(storm: Storm): { readonly count: number; readonly first: RecordBreach | null } {
  let count = 0;
  let first: RecordBreach | null = null;
  const n = storm.depthsMm.length;
  // The envelope is never negative, so a dry bar is never beyond it: most bars of a long record cost no power.
  // Bars of one length share the envelope's value (one power per step length, not per bar).
  let lastDurationH = NaN;
  let lastRecordMm = NaN;
  for (let k = 0; k < n; k++) {
    const depthMm = storm.depthsMm[k] as number;
    if (!(depthMm > 0)) continue;
    const durationH = storm.durationsH[k] as number;
    if (durationH !== lastDurationH) {
      lastDurationH = durationH;
      lastRecordMm = recordDepthMm(durationH);
    }
    const recordMm = lastRecordMm;
    if (depthMm > recordMm) {
      count++;
      first ??= { bar: k, depthMm, durationH, recordMm };
    }
  }
  return { count, first };
}
