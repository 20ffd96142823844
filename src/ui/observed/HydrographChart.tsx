import { baseflowMethodSpec } from '../../core';
import type { Streamflow } from '../../scenario/types';
import { useScenario } from '../../store';
import { lazyPart } from '../layout/LazyPart';
import { StreamflowButtons } from './StreamflowButtons';

export { HYDROGRAPH_HEIGHT } from './hydrograph-frame';

// The plot and its separation layers load once there is a record to draw (they are not part of the first screen).
const HydrographPlot = lazyPart<{ flow: Streamflow }>('hydrograph', () =>
  import('./HydrographPlot').then((m) => m.HydrographPlot),
);

/**
 * The hydrograph under the hyetograph, on the same time axis: the record,
 * the core's baseflow line and the direct runoff shaded between them, and
 * for the straight-line separation the end point to drag. With no record,
 * the region says how to bring one in.
 */
export function HydrographChart() {
  const flow = useScenario((s) => s.streamflow);
  const endLabel =
    flow?.baseflow.kind === 'straight-line'
      ? baseflowMethodSpec('straight-line').params.find((p) => p.key === 'endTimeH')?.label
      : undefined;
  return (
    <figure className="chart hydro" aria-labelledby="hydrograph-title">
      <figcaption className="chart__head hydro__head">
        <h2 id="hydrograph-title">Hydrograph</h2>
        {flow ? (
          <ul className="legend" aria-label="Hydrograph legend">
            <li>
              <span className="swatch swatch--discharge" aria-hidden="true" /> Discharge
            </li>
            <li>
              <span className="swatch swatch--baseflow" aria-hidden="true" /> Baseflow
            </li>
            <li>
              <span className="swatch swatch--direct" aria-hidden="true" /> Direct runoff
            </li>
            {endLabel ? (
              <li>
                <span className="swatch swatch--end" aria-hidden="true" /> {endLabel} (drag or use arrow keys)
              </li>
            ) : null}
          </ul>
        ) : null}
        <StreamflowButtons />
      </figcaption>
      {flow ? (
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
