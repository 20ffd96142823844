import { useState, type FormEvent } from 'react';
import { attempt } from '../../../core';
import { emptyStorm } from '../../../core/storm-tools';
import { useActions, useScenario } from '../../../store';
import { fineStep } from '../../chart/drag-math';
import { chartFrame } from '../../chart/frame';
import { CHART_HEIGHT } from '../../chart/chart-height';
import { formatCount, formatForField, formatValue } from '../../format';
import { readTyped } from '../../fields/read-typed';
import { displayUnit, unitText } from '../../units';
import { DRAW_PANEL_ID, useStormInput } from '../context';
import { ToolField } from '../tools/ToolField';

/**
 * Shown while the chart is in drawing mode: how drawing works, and a fresh
 * storm of dry bars to draw on (its bar duration and number of bars chosen here).
 */
export function DrawPanel() {
  const { setDrawing } = useStormInput();
  const actions = useActions();
  const storm = useScenario((s) => s.storm);
  const units = useScenario((s) => s.units);
  const n = storm.depthsMm.length;
  const [stepText, setStepText] = useState(() => formatForField((storm.durationsH[0] ?? 10 / 60) * 60));
  const [countText, setCountText] = useState(() => formatCount(n > 0 ? n : 18));
  const [stepMessage, setStepMessage] = useState<string | null>(null);
  const [countMessage, setCountMessage] = useState<string | null>(null);
  const [status, setStatus] = useState('');

  // The width does not change the rate axis, so any width gives the snap step on screen.
  const topDisplay = chartFrame(storm, 880, CHART_HEIGHT, units).topDisplay;
  const snap = `${formatValue(fineStep(topDisplay))} ${unitText(displayUnit('rate', units))}`;

  const create = (e: FormEvent): void => {
    e.preventDefault();
    const step = readTyped(stepText, {
      quantity: 'barDuration',
      toSI: (v) => v / 60,
      fromSI: (h) => h * 60,
      unit: 'min',
    });
    const count = readTyped(countText, { quantity: 'barCount' });
    const stepBad = step.ok ? null : step.message;
    const countBad = !count.ok
      ? count.message
      : Number.isInteger(count.value)
        ? null
        : 'The number of bars must be a whole number, 1 or more.';
    setStepMessage(stepBad);
    setCountMessage(countBad);
    if (stepBad || countBad || !step.ok || !count.ok) return;
    const r = attempt(() =>
      actions.setStorm(emptyStorm(step.value / 60, count.value, storm.startIso), 'New empty storm'),
    );
    if (r.ok) {
      setStatus(
        `${formatCount(count.value)} dry bars of ${formatValue(step.value)} min, ready to draw on. Undo brings back the storm before.`,
      );
    } else if (r.error.field === 'count') setCountMessage(r.error.message);
    else setStepMessage(r.error.message);
  };

  return (
    <section id={DRAW_PANEL_ID} className="panel storm-panel draw-panel" aria-labelledby="draw-panel-title">
      <div className="storm-panel__head">
        <h2 id="draw-panel-title">Drawing bars</h2>
        <p className="draw-panel__hint">
          Press and sweep across the chart to set bar heights; each stroke is one step to undo. Heights snap to {snap}.
          Esc drops a stroke.{n === 0 ? ' There are no bars yet: start a new empty storm.' : ''}
        </p>
        <button type="button" onClick={() => setDrawing(false)}>
          Stop drawing
        </button>
      </div>
      <form className="tool tool--wide" onSubmit={create} aria-labelledby="new-storm-title">
        <div className="tool__fields">
          <h3 id="new-storm-title" className="draw-panel__form-title">
            New empty storm
          </h3>
          <ToolField
            id="new-storm-step"
            label="Bar duration"
            unit="min"
            text={stepText}
            onText={setStepText}
            message={stepMessage}
          />
          <ToolField
            id="new-storm-count"
            label="Number of bars"
            text={countText}
            onText={setCountText}
            message={countMessage}
            inputMode="numeric"
          />
          <button type="submit">Start a new empty storm</button>
        </div>
      </form>
      <p className="storm-panel__status" role="status">
        {status}
      </p>
    </section>
  );
}
