import { useEffect, useMemo, useState } from 'react';
import { methodSpec, type UnitSystem } from '../../core';
import { useScenario } from '../../store';
import type { ChartFrame } from '../chart/frame';
import { useElementWidth } from '../chart/useElementWidth';
import { methodParametersText } from '../export/bar-table-csv';
import { StaticChart } from '../export/StaticChart';
import { formatPercent, formatValue } from '../format';
import { useServices, usePins } from '../services/services';
import { displayUnit, paramToDisplay, paramUnitText, toDisplay, unitText, type Quantity } from '../units';
import { fittedCellText } from '../results/fit-words';
import { dischargeText, dischargeToDisplay, dischargeUnitText } from '../observed/discharge';
import { StaticHydrograph, staticHydrographFrame, visibleEndH } from '../observed/StaticHydrograph';
import { hoursMinutes, NO_RUNOFF_TEXT, peakWhenText } from '../results/hours-minutes';
import { commonFrames } from './common-frame';
import { difference, type Difference } from './difference';
import { MAX_PINS } from '../../store/pin-board';
import { pinTotals, whenPinHydrographsReady, type PinTotals } from '../../store/pin-totals';
import type { Pin } from '../../store/pins';
import type { Totals } from '../../store/totals';
import './compare.css';

const SMALL_CHART_HEIGHT = 190;
const SMALL_HYDROGRAPH_HEIGHT = 150;

const GAP_PX = 12;

interface Row {
  readonly id: string;
  readonly label: string;
  /** Shown value and the value compared (display units), per pin. */
  readonly cell: (t: PinTotals) => { text: string; value: number | null };
  readonly unit: string;
  readonly percentPoints?: boolean;
  /** Only pins whose cell key matches the first's are compared (a fitted value of another parameter is not). */
  readonly key?: (t: Totals) => string;
}

/** Peak discharge and time to peak, while a pin has a hydrograph (a pinned design storm's, say). */
function hydrographRows(units: UnitSystem): Row[] {
  return [
    {
      id: 'peak-discharge',
      label: 'Peak discharge',
      cell: (t) =>
        t.hydrograph
          ? {
              text: dischargeText(t.hydrograph.peakM3s, units),
              value: dischargeToDisplay(t.hydrograph.peakM3s, units),
            }
          : { text: '—', value: null },
      unit: dischargeUnitText(units),
    },
    {
      id: 'time-to-peak',
      label: 'Time to peak',
      cell: (t) =>
        t.hydrograph
          ? t.hydrograph.peakM3s > 0
            ? { text: `${hoursMinutes(t.hydrograph.timeOfPeakH)} h:mm`, value: t.hydrograph.timeOfPeakH }
            : { text: `— (${NO_RUNOFF_TEXT})`, value: null }
          : { text: '—', value: null },
      unit: 'h',
    },
  ];
}

function rows(units: UnitSystem): Row[] {
  const q =
    (quantity: Quantity, pick: (t: Totals) => number | null): Row['cell'] =>
    (t) => {
      const si = pick(t);
      if (si === null) return { text: '—', value: null };
      const v = toDisplay(quantity, si, units);
      return { text: `${formatValue(v)} ${unitText(displayUnit(quantity, units))}`, value: v };
    };
  const u = (quantity: Quantity): string => unitText(displayUnit(quantity, units));
  return [
    { id: 'rain', label: 'Rainfall depth', cell: q('depth', (t) => t.rainMm), unit: u('depth') },
    { id: 'loss', label: 'Loss depth', cell: q('depth', (t) => t.lossMm), unit: u('depth') },
    { id: 'excess', label: 'Excess depth', cell: q('depth', (t) => t.excessMm), unit: u('depth') },
    { id: 'volume', label: 'Runoff volume', cell: q('volume', (t) => t.volumeM3), unit: u('volume') },
    {
      id: 'fraction',
      label: 'Runoff fraction',
      cell: (t) =>
        t.fraction === null ? { text: '—', value: null } : { text: formatPercent(t.fraction), value: t.fraction * 100 },
      unit: 'percentage points',
      percentPoints: true,
    },
    {
      id: 'fitted',
      label: 'Fitted parameter',
      cell: (t) => {
        const text = fittedCellText(t, units);
        return { text, value: t.fitted ? paramToDisplay(t.fitted.param.unit, t.fitted.value, units) : null };
      },
      unit: '',
      key: (t) => t.fitted?.param.key ?? '',
    },
  ];
}

function DifferenceNote({ diff }: { diff: Difference }) {
  if (diff.direction === 'none') return null;
  return <span className={`compare__diff compare__diff--${diff.direction}`}>{diff.text}</span>;
}

/** Unit text of a fitted parameter, for its difference. */
function fittedUnit(t: Totals, units: UnitSystem): string {
  return t.fitted ? paramUnitText(t.fitted.param.unit, units) : '';
}

interface PinnedChartProps {
  readonly pin: Pin;
  readonly index: number;
  readonly frame: ChartFrame;
  readonly units: UnitSystem;
  readonly values: PinTotals;
  /** The discharge axis's top and the time axis's end shared by every pin's hydrograph (null: no pin has one). */
  readonly hydroScale: { readonly peakM3s: number; readonly endH: number } | null;
}

function PinnedChart({ pin, index, frame, units, values, hydroScale }: PinnedChartProps) {
  const { pins } = useServices();
  const { method } = values;
  const name = pin.scenario.name;
  return (
    <li className="compare__card">
      <div className="compare__card-head">
        <h3>
          <span className="compare__index">{index + 1}</span> {name}
        </h3>
        <button
          type="button"
          className="share-button--small"
          aria-label={`Unpin ${name}`}
          onClick={() => void pins.unpin(pin.id)}
        >
          Unpin
        </button>
      </div>
      <p className="compare__method" title={`${methodSpec(method.kind).label}: ${methodParametersText(method, units)}`}>
        {methodSpec(method.kind).label}: {methodParametersText(method, units)}
      </p>
      <StaticChart
        frame={frame}
        storm={pin.scenario.storm}
        lossMm={values.barLossMm}
        lineMmH={null}
        label={`Chart of ${name}`}
        className="compare__chart"
      />
      {hydroScale ? (
        <PinnedHydrograph pin={pin} frame={frame} units={units} hydrograph={values.hydrograph} scale={hydroScale} />
      ) : null}
    </li>
  );
}

/** A pin's computed hydrograph on the scale every pin shares, or a line saying it has none. */
function PinnedHydrograph({
  pin,
  frame,
  units,
  hydrograph: h,
  scale,
}: {
  pin: Pin;
  frame: ChartFrame;
  units: UnitSystem;
  hydrograph: PinTotals['hydrograph'];
  scale: { readonly peakM3s: number; readonly endH: number };
}) {
  const hFrame = useMemo(
    () =>
      staticHydrographFrame(pin.scenario.storm, scale.peakM3s, scale.endH, frame.width, SMALL_HYDROGRAPH_HEIGHT, units),
    [pin.scenario.storm, scale, frame.width, units],
  );
  if (!h) return <p className="compare__no-hydrograph">No unit hydrograph chosen in this pin.</p>;
  return (
    <StaticHydrograph
      frame={hFrame}
      series={h}
      className="compare__chart"
      label={`Hydrograph of ${pin.scenario.name}: peak ${dischargeText(h.peakM3s, units)} ${peakWhenText(h)}`}
    />
  );
}

/** The small charts, each as wide as a share of the panel, on frames with one scale. */
function PinnedCharts({
  pins,
  values,
  units,
}: {
  pins: readonly Pin[];
  /** Each pin's derived values, in the order of `pins`. */
  values: readonly PinTotals[];
  units: UnitSystem;
}) {
  const [boxRef, width] = useElementWidth<HTMLDivElement>(1000);
  const n = Math.max(1, pins.length);
  const chartWidth = Math.max(220, Math.floor((width - GAP_PX * (n - 1)) / n));
  const frames = useMemo(
    () =>
      commonFrames(
        pins.map((p) => p.scenario.storm),
        chartWidth,
        SMALL_CHART_HEIGHT,
        units,
      ),
    [pins, chartWidth, units],
  );
  // One discharge and time scale over every pin's hydrograph, as the hyetographs share theirs.
  let peakM3s = 0;
  let endH = 0;
  let any = false;
  for (const { hydrograph } of values) {
    if (!hydrograph) continue;
    any = true;
    peakM3s = Math.max(peakM3s, hydrograph.peakM3s);
    endH = Math.max(endH, visibleEndH(hydrograph));
  }
  const hydroKey = any ? `${peakM3s} ${endH}` : '';
  const hydroScale = useMemo(
    () => (hydroKey === '' ? null : { peakM3s, endH }),
    // eslint-disable-next-line react-hooks/exhaustive-deps -- keyed on the two numbers, read through the key
    [hydroKey],
  );
  return (
    <div ref={boxRef} className="compare__cards-box">
      <ul
        className="compare__cards"
        aria-label="Pinned scenario charts"
        style={{ gridTemplateColumns: `repeat(${n}, minmax(0, 1fr))` }}
      >
        {pins.map((pin, i) => {
          const frame = frames[i];
          const own = values[i];
          return frame && own ? (
            <PinnedChart
              key={pin.id}
              pin={pin}
              index={i}
              frame={frame}
              units={units}
              values={own}
              hydroScale={hydroScale}
            />
          ) : null;
        })}
      </ul>
    </div>
  );
}

/**
 * The pinned scenarios side by side: small charts on one scale (same time
 * and intensity axes) and a table of totals, each difference from the first
 * pin shown with an arrow, a sign and words as well as a colour. Values are
 * in the units on screen now; every number comes from the core.
 */
export function ComparePanel() {
  const { pins: board } = useServices();
  const { pins, problems } = usePins();
  const units = useScenario((s) => s.units);
  // The pins' hydrographs come from the hydrograph side of the derived values, fetched after the first screen:
  // draw again once it is here.
  const [, setHydrographReady] = useState(false);
  useEffect(() => {
    let live = true;
    whenPinHydrographsReady(() => {
      if (live) setHydrographReady(true);
    });
    return () => {
      live = false;
    };
  }, []);

  if (pins.length === 0 && problems.length === 0) return null;
  const totals = pins.map((p) => pinTotals(p.scenario));
  const first = totals[0];
  const tableRows = totals.some((t) => t.hydrograph !== null) ? rows(units).concat(hydrographRows(units)) : rows(units);

  return (
    <section className="panel compare" aria-labelledby="compare-title">
      <div className="compare__head">
        <h2 id="compare-title">Compare pinned scenarios</h2>
        <p className="compare__intro">
          {pins.length} of {MAX_PINS} pinned. Pins are copies: editing the scenario on screen does not change them.
          Charts share one time and intensity scale; differences are from pin 1.
        </p>
        {pins.length > 1 ? (
          <button
            type="button"
            className="share-button--small"
            onClick={() => pins.forEach((p) => void board.unpin(p.id))}
          >
            Unpin all
          </button>
        ) : null}
      </div>
      {problems.length > 0 ? (
        <div className="compare__problems" role="alert">
          <ul>
            {problems.map((p, i) => (
              <li key={i}>{p.message}</li>
            ))}
          </ul>
        </div>
      ) : null}
      {pins.length > 0 ? (
        <>
          <PinnedCharts pins={pins} values={totals} units={units} />
          <div className="compare__table-box">
            <table className="compare__table">
              <caption>
                Totals of the pinned scenarios, in {units === 'si' ? 'SI' : 'US customary'} units, with the difference
                from pin 1
              </caption>
              <thead>
                <tr>
                  <th scope="col">Total</th>
                  {pins.map((pin, i) => (
                    <th key={pin.id} scope="col">
                      <span className="compare__index">{i + 1}</span> {pin.scenario.name}{' '}
                      <span className="compare__col-method">{methodSpec(pin.scenario.method.kind).label}</span>
                    </th>
                  ))}
                </tr>
              </thead>
              <tbody>
                {tableRows.map((row) => {
                  const base = first ? row.cell(first) : null;
                  return (
                    <tr key={row.id} data-row={row.id}>
                      <th scope="row">{row.label}</th>
                      {totals.map((t, i) => {
                        const cell = row.cell(t);
                        const comparable = i > 0 && first !== undefined && (!row.key || row.key(t) === row.key(first));
                        const unit = row.id === 'fitted' ? fittedUnit(t, units) : row.unit;
                        const diff: Difference | null = comparable
                          ? difference(
                              base?.value ?? null,
                              cell.value,
                              unit,
                              row.percentPoints ? { percentPoints: true } : {},
                            )
                          : null;
                        return (
                          <td
                            key={pins[i]?.id ?? i}
                            className={diff ? `compare__cell compare__cell--${diff.direction}` : 'compare__cell'}
                          >
                            <span className="compare__value">{cell.text}</span>
                            {diff ? <DifferenceNote diff={diff} /> : null}
                            {i > 0 && !comparable && cell.value !== null ? (
                              <span className="compare__diff compare__diff--none">another parameter than pin 1</span>
                            ) : null}
                          </td>
                        );
                      })}
                    </tr>
                  );
                })}
              </tbody>
            </table>
          </div>
        </>
      ) : null}
    </section>
  );
}
