import { useMemo, useRef } from 'react';
import { methodSpec, type UnitSystem } from '../../core';
import { createDerived, useScenario, type Derived } from '../../store';
import type { ChartFrame } from '../chart/frame';
import { useElementWidth } from '../chart/useElementWidth';
import { methodParametersText } from '../export/bar-table-csv';
import { StaticChart } from '../export/StaticChart';
import { formatPercent, formatValue } from '../format';
import { useServices, usePins } from '../services/services';
import { displayUnit, paramToDisplay, paramUnitText, toDisplay, unitText, type Quantity } from '../units';
import { fittedCellText } from '../results/fit-words';
import { commonFrames } from './common-frame';
import { difference, type Difference } from './difference';
import { MAX_PINS, type Pin } from '../services/pins';
import { totalsOf, type Totals } from '../../store/totals';
import './compare.css';

const SMALL_CHART_HEIGHT = 190;
const GAP_PX = 12;

interface Row {
  readonly id: string;
  readonly label: string;
  /** Shown value and the value compared (display units), per pin. */
  readonly cell: (t: Totals) => { text: string; value: number | null };
  readonly unit: string;
  readonly percentPoints?: boolean;
  /** Only pins whose cell key matches the first's are compared (a fitted value of another parameter is not). */
  readonly key?: (t: Totals) => string;
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
  readonly derived: Derived;
}

function PinnedChart({ pin, index, frame, units, derived }: PinnedChartProps) {
  const { pins } = useServices();
  const results = derived.results(pin.scenario);
  const method = derived.effectiveMethod(pin.scenario);
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
          onClick={() => pins.unpin(pin.id)}
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
        lossMm={results.ok ? results.result.lossMm : null}
        lineMmH={null}
        label={`Chart of ${name}`}
        className="compare__chart"
      />
    </li>
  );
}

/** The small charts, each as wide as a share of the panel, on frames with one scale. */
function PinnedCharts({
  pins,
  units,
  derivedOf,
}: {
  pins: readonly Pin[];
  units: UnitSystem;
  derivedOf: (pin: Pin) => Derived;
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
  return (
    <div ref={boxRef} className="compare__cards-box">
      <ul
        className="compare__cards"
        aria-label="Pinned scenario charts"
        style={{ gridTemplateColumns: `repeat(${n}, minmax(0, 1fr))` }}
      >
        {pins.map((pin, i) => {
          const frame = frames[i];
          return frame ? (
            <PinnedChart key={pin.id} pin={pin} index={i} frame={frame} units={units} derived={derivedOf(pin)} />
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
  // One set of memoised selectors per pin, so pins do not evict each other's results.
  const deriveds = useRef(new Map<string, Derived>());
  const derivedOf = (pin: Pin): Derived => {
    let d = deriveds.current.get(pin.id);
    if (!d) {
      d = createDerived();
      deriveds.current.set(pin.id, d);
    }
    return d;
  };

  if (pins.length === 0 && problems.length === 0) return null;
  const totals = pins.map((p) => totalsOf(p.scenario, derivedOf(p)));
  const first = totals[0];

  return (
    <section className="panel compare" aria-labelledby="compare-title">
      <div className="compare__head">
        <h2 id="compare-title">Compare pinned scenarios</h2>
        <p className="compare__intro">
          {pins.length} of {MAX_PINS} pinned. Pins are copies: editing the scenario on screen does not change them.
          Charts share one time and intensity scale; differences are from pin 1.
        </p>
        {pins.length > 1 ? (
          <button type="button" className="share-button--small" onClick={() => pins.forEach((p) => board.unpin(p.id))}>
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
          <PinnedCharts pins={pins} units={units} derivedOf={derivedOf} />
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
                {rows(units).map((row) => {
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
