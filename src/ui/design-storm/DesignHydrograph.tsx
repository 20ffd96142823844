import { useMemo } from 'react';
import type { RunoffHydrograph, Storm, UnitSystem } from '../../core';
import { useElementWidth } from '../chart/useElementWidth';
import { dischargeText } from '../observed/discharge';
import { StaticHydrograph, staticHydrographFrame, visibleEndH } from '../observed/StaticHydrograph';
import { peakWhenText } from '../results/hours-minutes';

const HEIGHT = 200;

/** The design storm's direct runoff hydrograph through the workbench's unit hydrograph. */
export function DesignHydrograph({
  storm,
  hydrograph,
  units,
}: {
  readonly storm: Storm;
  readonly hydrograph: RunoffHydrograph;
  readonly units: UnitSystem;
}) {
  const [boxRef, width] = useElementWidth<HTMLDivElement>(420);
  const frame = useMemo(
    () => staticHydrographFrame(storm, hydrograph.peakM3s, visibleEndH(hydrograph), width, HEIGHT, units),
    [storm, hydrograph, width, units],
  );
  return (
    <figure className="design-hydrograph" aria-labelledby="design-hydrograph-title">
      <figcaption id="design-hydrograph-title">Design hydrograph</figcaption>
      <div ref={boxRef} className="chart__box">
        <StaticHydrograph
          frame={frame}
          series={hydrograph}
          label={`Design direct runoff hydrograph: peak ${dischargeText(hydrograph.peakM3s, units)} ${peakWhenText(hydrograph)}.`}
        />
      </div>
    </figure>
  );
}
