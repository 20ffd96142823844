import { baseflowEndPoint, baseflowMethodSpec } from '../../core';
import type { Streamflow } from '../../scenario/types';
import { loadHydrographSide, useDerived, useScenario } from '../../store';
import { lazyPart } from '../layout/LazyPart';
import { StreamflowButtons } from './StreamflowButtons';
import './observed.css';

export { HYDROGRAPH_HEIGHT } from './hydrograph-frame';

// The plot and its separation layers load once there is a record to draw (they are not part of the first screen).
const HydrographPlot = lazyPart<{ flow: Streamflow | null }>('hydrograph', () =>
  Promise.all([import('./HydrographPlot'), loadHydrographSide()]).then(([m]) => m.HydrographPlot),
);

/**
 * The hydrograph under the hyetograph, on the same time axis: the record,
 * the core's baseflow line and the direct runoff shaded between them, and
 * for the straight-line separation the end point to drag; over it the
 * computed direct runoff hydrograph when a unit hydrograph is chosen (alone
 * when there is no record). With neither, the region says how to bring a
 * record in.
 */
export function HydrographChart() {
  const flow = useScenario((s) => s.streamflow);
  const computed = useScenario((s) => s.hydrograph.transform !== null);
  // Whether the chart draws a computed total flow, without routing the excess here (this part is on the first
  // screen, and the routing is read a render behind, see store/deferred.ts): a transform over a separated record,
  // with losses and an area to route.
  const withTotal = useDerived(
    (d, s) =>
      s.hydrograph.transform !== null && s.catchment.areaM2 > 0 && d.results(s).ok && d.separation(s)?.ok === true,
  );
  const endKey = flow ? baseflowEndPoint(flow.baseflow)?.key : undefined;
  const endLabel =
    flow && endKey ? baseflowMethodSpec(flow.baseflow.kind).params.find((p) => p.key === endKey)?.label : undefined;
  return (
    <figure className="chart hydro" aria-labelledby="hydrograph-title">
      <figcaption className="chart__head hydro__head">
        <h2 id="hydrograph-title">Hydrograph</h2>
        {flow || computed ? (
          <ul className="legend" aria-label="Hydrograph legend">
            <HydrographLegendItems flow={flow !== null} computed={computed} />
            {withTotal ? (
              <li>
                <span className="swatch swatch--total" aria-hidden="true" /> Computed total flow
              </li>
            ) : null}
            {endLabel ? (
              <li>
                <span className="swatch swatch--end" aria-hidden="true" /> {endLabel} (drag or use arrow keys)
              </li>
            ) : null}
          </ul>
        ) : null}
        <StreamflowButtons />
      </figcaption>
      {flow || computed ? (
        <HydrographPlot flow={flow} />
      ) : (
        <p className="hydro__empty">
          No streamflow record yet. Paste or open a gauge record of the event (time and discharge) to separate baseflow
          and match the loss to the observed direct runoff.
        </p>
      )}
    </figure>
  );
}

/** The hydrograph's legend entries: the record's three lines with a record, the computed one with a transform. */
export function HydrographLegendItems({ flow, computed }: { readonly flow: boolean; readonly computed: boolean }) {
  return (
    <>
      {flow ? (
        <>
          <li>
            <span className="swatch swatch--discharge" aria-hidden="true" /> Discharge
          </li>
          <li>
            <span className="swatch swatch--baseflow" aria-hidden="true" /> Baseflow
          </li>
          <li>
            <span className="swatch swatch--direct" aria-hidden="true" /> Direct runoff
          </li>
        </>
      ) : null}
      {computed ? (
        <li>
          <span className="swatch swatch--computed" aria-hidden="true" /> Computed direct runoff
        </li>
      ) : null}
    </>
  );
}
