import { scaleLinear } from 'd3-scale';
import { useMemo } from 'react';
import { methodSpec, type NumericParam, type RunoffCurve, type UnitSystem } from '../../core';
import { useActions, useDerived, useScenario } from '../../store';
import { withObservedUncertainty } from '../../store/hydrograph-edits';
import { NumberField } from '../fields/NumberField';
import { formatValue } from '../format';
import { displayUnit, paramToDisplay, paramUnitText, toDisplay, unitText } from '../units';
import { labelInSentence, paramAmount } from '../results/fit-words';
import './fit-uncertainty.css';

const W = 300;
const H = 170;
const M = { top: 10, right: 10, bottom: 34, left: 44 };

/**
 * The curve a calibration sits on: runoff depth against the parameter being
 * fitted (the others held), with the observed runoff and its ± band marked and
 * the fitted value and its interval on the parameter axis. Drawn from the
 * core's runoffCurve and calibrationInterval only.
 */
export function CalibrationChart({
  curve,
  param,
  observedMm,
  pct,
  fitted,
  range,
  units,
}: {
  curve: RunoffCurve;
  param: NumericParam;
  observedMm: number;
  pct: number;
  fitted: number | null;
  range: { min: number; max: number } | null;
  units: UnitSystem;
}) {
  const { x, y, line } = useMemo(() => {
    const n = curve.values.length;
    const show = (v: number) => paramToDisplay(param.unit, v, units);
    const depth = (mm: number) => toDisplay('depth', mm, units);
    let top = observedMm * (1 + pct / 100);
    for (let i = 0; i < n; i++) top = Math.max(top, curve.runoffMm[i] as number);
    const xs = scaleLinear()
      .domain([show(curve.values[0] as number), show(curve.values[n - 1] as number)])
      .range([M.left, W - M.right]);
    const ys = scaleLinear()
      .domain([0, depth(top > 0 ? top : 1)])
      .range([H - M.bottom, M.top])
      .nice(4);
    let d = '';
    for (let i = 0; i < n; i++) {
      d += `${i === 0 ? 'M' : 'L'}${xs(show(curve.values[i] as number)).toFixed(1)},${ys(depth(curve.runoffMm[i] as number)).toFixed(1)}`;
    }
    return { x: (v: number) => xs(show(v)), y: (mm: number) => ys(depth(mm)), line: d };
  }, [curve, param, observedMm, pct, units]);
  const lowMm = observedMm * (1 - pct / 100);
  const highMm = observedMm * (1 + pct / 100);
  const left = M.left;
  const right = W - M.right;
  const depthUnit = unitText(displayUnit('depth', units));
  const summary =
    `Runoff depth against ${labelInSentence(param.label)}: the observed ${formatValue(toDisplay('depth', observedMm, units))} ${depthUnit}` +
    (pct > 0 ? ` ± ${formatValue(pct)} %` : '') +
    (fitted === null ? '.' : `, met at ${paramAmount(param, fitted, units)}.`);
  return (
    <svg className="calib-chart" width={W} height={H} role="img" aria-label={summary}>
      {pct > 0 ? (
        <rect
          className="calib-chart__band"
          x={left}
          width={right - left}
          y={y(highMm)}
          height={Math.max(0, y(lowMm) - y(highMm))}
          data-layer="observed-band"
        />
      ) : null}
      {range ? (
        <rect
          className="calib-chart__range"
          x={Math.min(x(range.min), x(range.max))}
          width={Math.abs(x(range.max) - x(range.min))}
          y={M.top}
          height={H - M.bottom - M.top}
          data-layer="fitted-range"
        />
      ) : null}
      <line className="calib-chart__observed" x1={left} x2={right} y1={y(observedMm)} y2={y(observedMm)} />
      <path className="calib-chart__curve" d={line} data-layer="runoff-curve" />
      {fitted !== null ? (
        <circle className="calib-chart__fit" cx={x(fitted)} cy={y(observedMm)} r={4} data-mark="fitted" />
      ) : null}
      <line className="calib-chart__axis" x1={left} x2={right} y1={H - M.bottom} y2={H - M.bottom} />
      <line className="calib-chart__axis" x1={left} x2={left} y1={M.top} y2={H - M.bottom} />
      <text className="calib-chart__label" x={(left + right) / 2} y={H - 6} textAnchor="middle">
        {param.label}
        {paramUnitText(param.unit, units) ? ` (${paramUnitText(param.unit, units)})` : ''}
      </text>
      <text
        className="calib-chart__label"
        x={12}
        y={(M.top + H - M.bottom) / 2}
        textAnchor="middle"
        transform={`rotate(-90 12 ${(M.top + H - M.bottom) / 2})`}
      >
        Runoff ({depthUnit})
      </text>
      <text className="calib-chart__tick" x={left} y={H - M.bottom + 12} textAnchor="start">
        {formatValue(paramToDisplay(param.unit, Number(curve.values[0]), units))}
      </text>
      <text className="calib-chart__tick" x={right} y={H - M.bottom + 12} textAnchor="end">
        {formatValue(paramToDisplay(param.unit, Number(curve.values[curve.values.length - 1]), units))}
      </text>
    </svg>
  );
}

/**
 * How sure the loss fit is: an uncertainty (± %, 0 for none) on the observed
 * runoff from gauge and rating errors, the fitted parameter with the fits at
 * the two ends (calibrationInterval), and the calibration chart. None of it
 * changes the fit itself.
 */
export function FitUncertainty() {
  const actions = useActions();
  const units = useScenario((s) => s.units);
  const pct = useScenario((s) => s.observedUncertaintyPct);
  const kind = useScenario((s) => s.method.kind);
  const parameter = useScenario((s) => s.observed?.parameter ?? null);
  const target = useDerived((d, s) => d.target(s));
  const fit = useDerived((d, s) => d.fit(s));
  const interval = useDerived((d, s) => d.lossInterval(s));
  const curve = useDerived((d, s) => d.lossCurve(s));
  const param = methodSpec(kind).params.find((p) => p.key === parameter);
  const observedMm = target?.ok ? target.mm : null;
  let text: string | null = null;
  if (interval && !interval.ok) text = interval.message;
  else if (interval?.ok && param) {
    const { value } = interval;
    if (value.range) {
      // "Fitted" is kept for a value in use (see fit-words.ts): this states what the fits would be.
      text =
        `${value.fit.ok ? `${param.label} for the observed runoff: ${paramAmount(param, value.fit.value, units)}; ` : ''}` +
        `for it ± ${formatValue(pct)} %: from ${paramAmount(param, value.range.min, units)} to ${paramAmount(param, value.range.max, units)}.`;
    } else {
      const end = !value.lowRunoff.result.ok ? value.lowRunoff : value.highRunoff;
      text = `At ${formatValue(toDisplay('depth', end.runoffMm, units))} ${unitText(displayUnit('depth', units))}: ${end.result.ok ? '' : end.result.message}`;
    }
  }
  return (
    <div className="fit-uncertainty" role="group" aria-labelledby="fit-uncertainty-title">
      <h3 id="fit-uncertainty-title">How sure is the fit</h3>
      <NumberField
        id="observed-uncertainty"
        label="Uncertainty of the observed runoff"
        unit="± %"
        value={pct}
        plausible="uncertainty"
        check={(v) => (v >= 0 && v < 100 ? null : 'The uncertainty must be from 0 to below 100 %.')}
        onCommit={(v, edit) =>
          actions.edit('Set the uncertainty of the observed runoff', (s) => withObservedUncertainty(s, v), edit)
        }
        history={actions}
        hint="Gauge and rating errors of the observed volume; 0 for none. The fit itself does not change."
      />
      {text ? (
        <p className="fit-uncertainty__range" data-answer="fit-interval" aria-live="polite">
          {text}
        </p>
      ) : null}
      {curve?.ok && param && observedMm !== null ? (
        <CalibrationChart
          curve={curve.value}
          param={param}
          observedMm={observedMm}
          pct={pct}
          fitted={fit?.ok ? fit.value : null}
          range={interval?.ok ? interval.value.range : null}
          units={units}
        />
      ) : null}
    </div>
  );
}
