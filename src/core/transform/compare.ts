import { InputError, attempt } from '../errors';
import { dischargeAtH, validateHydrograph } from '../baseflow/hydrograph';
import { findPeakIndex } from '../baseflow/peak';
import type { Hydrograph } from '../baseflow/types';
import { recordVolumeM3 } from '../baseflow/volume';

/** How a computed direct runoff hydrograph compares with an observed one. */
export interface HydrographComparison {
  readonly computedPeakM3s: number;
  readonly observedPeakM3s: number;
  /** Times of the highest sample of each series (the first when repeated), h. */
  readonly computedPeakTimeH: number;
  readonly observedPeakTimeH: number;
  /** ∫ q dt of each series over its own samples, trapezoidal rule, m³. */
  readonly computedVolumeM3: number;
  readonly observedVolumeM3: number;
  /** (computed − observed)/observed peak × 100; null when the observed peak is 0. */
  readonly peakErrorPct: number | null;
  /** Computed minus observed time of peak, h: positive when the computed peak comes late. */
  readonly timingErrorH: number;
  /** (computed − observed)/observed volume × 100; null when the observed volume is 0. */
  readonly volumeErrorPct: number | null;
  /**
   * Nash–Sutcliffe efficiency (Nash & Sutcliffe 1970),
   * 1 − Σ(o_i − c(t_i))² / Σ(o_i − ō)², over the observed samples; 1 is a
   * perfect match, 0 no better than the observed mean. null when the observed
   * samples are all equal (no variance to explain).
   */
  readonly nse: number | null;
}

/** Validates one series, naming it in the field and the message. */
export function checkSeries(series: Hydrograph, name: 'computed' | 'observed', valuesField: string): void {
  const r = attempt(() => validateHydrograph(series));
  if (!r.ok) {
    const { error } = r;
    const field = error.field === 'dischargeM3s' ? valuesField : error.field;
    const message = error.message.startsWith('The streamflow record')
      ? error.message.replace('The streamflow record', `The ${name} hydrograph`)
      : `The ${name} hydrograph, ${error.message.charAt(0).toLowerCase()}${error.message.slice(1)}`;
    throw new InputError(`${name}.${field}`, message.replace('(dischargeM3s)', `(${valuesField})`), error.index);
  }
}

/**
 * The computed discharge at time t: linear between its samples (as the
 * trapezoidal rule takes it), zero before its first sample and after its last
 * (a computed direct runoff hydrograph starts at the storm start and ends at
 * zero).
 */
function dischargeOrZeroAt(series: Hydrograph, tH: number): number {
  const { timesH, dischargeM3s } = series;
  const first = timesH[0] as number;
  const last = timesH[timesH.length - 1] as number;
  if (tH < first || tH > last) return 0;
  return dischargeAtH(timesH, dischargeM3s, tH);
}

/**
 * Nash–Sutcliffe efficiency of a computed series against observed samples:
 * the computed one is read at the observed times by `dischargeOrZeroAt`.
 * Clean input (at least two samples each); null without observed variance.
 */
export function nashSutcliffe(computed: Hydrograph, observed: Hydrograph): number | null {
  const { timesH, dischargeM3s: o } = observed;
  const n = o.length;
  let mean = 0;
  for (let i = 0; i < n; i++) mean += o[i] as number;
  mean /= n;
  let residual = 0;
  let spread = 0;
  for (let i = 0; i < n; i++) {
    const oi = o[i] as number;
    const e = oi - dischargeOrZeroAt(computed, timesH[i] as number);
    residual += e * e;
    spread += (oi - mean) * (oi - mean);
  }
  return spread > 0 ? 1 - residual / spread : null;
}

/**
 * Goodness of fit of a computed direct runoff hydrograph against an observed
 * one, on time grids that may differ (both in h from the storm start): peak
 * error %, timing error h, volume error %, Nash–Sutcliffe efficiency. Peaks
 * and their times are each series' highest sample; volumes each series' own
 * trapezoidal integral; the efficiency is taken at the observed samples, with
 * the computed series linear between its samples and zero outside them.
 * Throws an InputError naming `computed.…` or `observed.…` for bad input.
 */
export function compareHydrographs(computed: Hydrograph, observed: Hydrograph): HydrographComparison {
  checkSeries(computed, 'computed', 'dischargeM3s');
  checkSeries(observed, 'observed', 'dischargeM3s');
  return compareClean(computed, observed);
}

/** `compareHydrographs` for validated series. */
export function compareClean(computed: Hydrograph, observed: Hydrograph): HydrographComparison {
  const ci = findPeakIndex(computed.dischargeM3s);
  const oi = findPeakIndex(observed.dischargeM3s);
  const computedPeakM3s = computed.dischargeM3s[ci] as number;
  const observedPeakM3s = observed.dischargeM3s[oi] as number;
  const computedPeakTimeH = computed.timesH[ci] as number;
  const observedPeakTimeH = observed.timesH[oi] as number;
  const computedVolumeM3 = recordVolumeM3(computed.timesH, computed.dischargeM3s);
  const observedVolumeM3 = recordVolumeM3(observed.timesH, observed.dischargeM3s);
  return {
    computedPeakM3s,
    observedPeakM3s,
    computedPeakTimeH,
    observedPeakTimeH,
    computedVolumeM3,
    observedVolumeM3,
    peakErrorPct: observedPeakM3s > 0 ? ((computedPeakM3s - observedPeakM3s) / observedPeakM3s) * 100 : null,
    timingErrorH: computedPeakTimeH - observedPeakTimeH,
    volumeErrorPct: observedVolumeM3 > 0 ? ((computedVolumeM3 - observedVolumeM3) / observedVolumeM3) * 100 : null,
    nse: nashSutcliffe(computed, observed),
  };
}
