import { useMemo } from 'react';
import { TRANSFORMS, methodSpec, totalDurationH } from '../../core';
import { CAUTION_TEXT } from '../../scenario';
import { useDerived, useScenario, useWorkbench } from '../../store';
import { chartFrame } from '../chart/frame';
import { rateLine } from '../chart/method-layers';
import { formatWallDate, formatWallTime, wallClockMs } from '../chart/clock';
import { totalsOf } from '../../store/totals';
import { fittedCellText } from '../results/fit-words';
import { formatCount, formatPercent, formatValue } from '../format';
import { displayUnit, toDisplay, unitText, type Quantity } from '../units';
import { useServices } from '../services/services';
import { areaText, methodParametersText } from './bar-table-csv';
import { ReportBars } from './ReportBars';
import { transformParametersText } from './hydrograph-csv';
import { dischargeText } from '../observed/discharge';
import { peakAtText } from '../results/hours-minutes';
import { StaticChart } from './StaticChart';
import './export.css';
import { scenarioTitle } from '../../scenario/label-text';

const REPORT_CHART = { width: 720, height: 280 } as const;

/** The report's body: inputs, chart, results and the caution, for the scenario on screen. */
export function ReportBody() {
  const scenario = useScenario((s) => s);
  const derived = useDerived((d) => d);
  const { now } = useServices();
  const { storm, units, catchment, observed } = scenario;
  // The area in the unit chosen beside the area field (a preference in the store, as the CSV export reads it).
  const areaUnit = useWorkbench((s) => s.areaUnits[units]);
  const method = derived.effectiveMethod(scenario);
  const results = derived.results(scenario);
  const totals = totalsOf(scenario, derived);
  const frame = useMemo(() => chartFrame(storm, REPORT_CHART.width, REPORT_CHART.height, units), [storm, units]);

  const show = (q: Quantity, si: number | null): string =>
    si === null ? '—' : `${formatValue(toDisplay(q, si, units))} ${unitText(displayUnit(q, units))}`;
  const n = storm.depthsMm.length;
  const startMs = storm.startIso === undefined ? null : wallClockMs(storm.startIso);
  const lineValue = rateLine(method)?.valueMmH;
  const spec = methodSpec(method.kind);
  const observedParam = spec.params.find((p) => p.key === observed?.parameter);
  const observedText =
    observed === null
      ? 'None'
      : derived.observedFromSeparation(scenario)
        ? 'Direct runoff separated from the streamflow record'
        : observed.as === 'depth'
          ? show('depth', observed.value)
          : show('volume', observed.value);
  const printed = now();
  const computed = derived.hydrograph(scenario);
  const transform = scenario.hydrograph.transform;

  return (
    <>
      <header className="report__head">
        <p className="report__kind">Raincut scenario report</p>
        <h2 className="report__title">{scenarioTitle(scenario.name)}</h2>
        <p className="report__date">
          Printed {printed.toLocaleString(undefined, { dateStyle: 'medium', timeStyle: 'short' })}
        </p>
      </header>
      <p className="report__caution" role="note">
        <strong>Caution.</strong> {CAUTION_TEXT}
      </p>

      <section className="report__inputs" aria-label="Inputs">
        <h3>Inputs</h3>
        <dl>
          <dt>Storm</dt>
          <dd>
            {formatCount(n)} bar{n === 1 ? '' : 's'}, {show('depth', totals.rainMm)} in{' '}
            {formatValue(totalDurationH(storm))} h
            {startMs === null ? '' : `, from ${formatWallDate(startMs)} ${formatWallTime(startMs)}`}
          </dd>
          <dt>Catchment</dt>
          <dd>
            {catchment.name === '' ? 'Unnamed' : catchment.name},{' '}
            {catchment.areaM2 > 0 ? areaText(catchment.areaM2, units, areaUnit, formatValue) : 'area not given'}
          </dd>
          <dt>Loss method</dt>
          <dd>
            {spec.label}: {methodParametersText(method, units)}
          </dd>
          <dt>Runoff hydrograph</dt>
          <dd data-report="hydrograph">
            {transform === null
              ? 'None'
              : `${TRANSFORMS[transform.kind].label}: ${transformParametersText(transform, formatValue)}; ` +
                (computed?.ok
                  ? `peak discharge ${peakAtText(computed.hydrograph, dischargeText(computed.hydrograph.peakM3s, units))}`
                  : `no hydrograph (${computed?.message ?? 'not worked out'})`)}
          </dd>
          <dt>Observed runoff</dt>
          <dd>
            {observedText}
            {observed !== null && observedParam
              ? `; fitting ${observedParam.label}${observed.locked ? ', kept matched' : ''}`
              : ''}
          </dd>
          {scenario.notes.trim() !== '' ? (
            <>
              <dt>Notes</dt>
              <dd className="report__notes">{scenario.notes}</dd>
            </>
          ) : null}
        </dl>
      </section>

      <figure className="report__chart">
        <StaticChart
          frame={frame}
          storm={storm}
          lossMm={results.ok ? results.result.lossMm : null}
          lineMmH={typeof lineValue === 'number' ? lineValue : null}
          label={`Hyetograph of ${scenarioTitle(scenario.name)}: rainfall excess over loss for each bar`}
        />
        <figcaption>
          Hyetograph: rainfall excess (dark) above loss (light) in each bar
          {typeof lineValue === 'number' ? '; the line is the loss rate' : ''}.
        </figcaption>
      </figure>

      <section className="report__results" aria-label="Results">
        <h3>Results</h3>
        {totals.error ? <p>Losses cannot be worked out: {totals.error}</p> : null}
        <table>
          <tbody>
            <tr>
              <th scope="row">Rainfall depth</th>
              <td>{show('depth', totals.rainMm)}</td>
            </tr>
            <tr>
              <th scope="row">Loss depth</th>
              <td>{show('depth', totals.lossMm)}</td>
            </tr>
            <tr>
              <th scope="row">Rainfall excess depth</th>
              <td>{show('depth', totals.excessMm)}</td>
            </tr>
            <tr>
              <th scope="row">Runoff volume</th>
              <td>{totals.volumeM3 === null ? '— (needs the catchment area)' : show('volume', totals.volumeM3)}</td>
            </tr>
            <tr>
              <th scope="row">Runoff fraction</th>
              <td>{totals.fraction === null ? '—' : formatPercent(totals.fraction)}</td>
            </tr>
            <tr>
              <th scope="row">Peak excess intensity</th>
              <td>{show('rate', totals.peakExcessMmH)}</td>
            </tr>
            <tr>
              <th scope="row">Fitted parameter</th>
              <td>{fittedCellText(totals, units)}</td>
            </tr>
          </tbody>
        </table>
      </section>
      <p className="report__foot">
        Losses and excess computed by Raincut’s core; method source: {spec.source.replace(/\.$/, '')}. The CSV export
        holds every bar with its cumulative rainfall, loss and excess.
      </p>
      <ReportBars storm={storm} units={units} result={results.ok ? results.result : null} />
    </>
  );
}
