import { useMemo } from 'react';
import type { RunoffHydrograph, UnitSystem } from '../../core';
import { useScenario, type ComputedHydrograph, type TimeSeries } from '../../store';
import { useDeferredDerived } from '../../store/deferred';
import { peakWhenText } from '../results/hours-minutes';
import { dischargeText } from './discharge';
import type { HydrographFrame } from './hydrograph-frame';
import { seriesPath } from './hydrograph-paths';

/** The highest computed discharge on the chart (direct runoff or total flow), m³/s; 0 without one. */
export function computedPeakM3s(computed: ComputedHydrograph | null, total: TimeSeries | null): number {
  let peak = computed?.ok ? computed.hydrograph.peakM3s : 0;
  if (total) for (let i = 0; i < total.dischargeM3s.length; i++) peak = Math.max(peak, total.dischargeM3s[i] as number);
  return peak;
}

/** The computed hydrograph in words, for a screen reader. */
export function computedSummary(h: RunoffHydrograph, units: UnitSystem, withTotal: boolean): string {
  return (
    `Computed direct runoff: peak ${dischargeText(h.peakM3s, units)} ${peakWhenText(h)}` +
    (withTotal ? '; computed total flow is the computed direct runoff over the separated baseflow.' : '.')
  );
}

/**
 * The computed direct runoff hydrograph (and, over a separated record, the
 * computed total flow), derived in the store from the loss in use: a drag of
 * the loss line redraws this layer only. Times are already storm hours.
 */
export function ComputedLayer({ frame }: { frame: HydrographFrame }) {
  const units = useScenario((s) => s.units);
  // A render behind the hyetograph during a drag (see useDeferredDerived), so the drag never waits for the routing.
  const computed = useDeferredDerived((d, s) => d.hydrograph(s));
  const total = useDeferredDerived((d, s) => d.totalFlow(s));
  const direct = computed?.ok ? computed.hydrograph : null;
  const d = useMemo(
    () => (direct ? seriesPath(direct.timesH, direct.dischargeM3s, 0, frame.x, frame.y) : ''),
    [direct, frame],
  );
  const t = useMemo(
    () => (total ? seriesPath(total.timesH, total.dischargeM3s, 0, frame.x, frame.y) : ''),
    [total, frame],
  );
  if (!direct) return null;
  return (
    <g role="img" aria-label={computedSummary(direct, units, total !== null)}>
      {total ? <path className="hydro__total" d={t} data-layer="computed-total" /> : null}
      <path className="hydro__computed" d={d} data-layer="computed-direct" />
    </g>
  );
}
