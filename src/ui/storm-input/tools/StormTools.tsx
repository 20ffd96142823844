import { useEffect, useRef, useState, type FormEvent } from 'react';
import { InputError, attempt as attemptInput, scaleStormToDepth, totalDepthMm, type Storm } from '../../../core';
import { firstRainLost, resampleStorm, scaleStormByFactor } from '../../../core/storm-tools';
import { useActions, useScenario } from '../../../store';
import { formatDuration } from '../../rainfall/RainfallToolbar';
import { formatCount, formatForField, formatValue } from '../../format';
import { readTyped, stormDepthRefusal } from '../../fields/read-typed';
import { parseNumber } from '../../parse-number';
import { displayUnit, fromDisplay, toDisplay, unitText } from '../../units';
import { readStartText, startFieldText } from '../bar-times';
import { STORM_TOOLS_ID } from '../context';
import { ToolField } from './ToolField';

type Messages = { readonly [K in 'factor' | 'total' | 'step' | 'start']?: string | undefined };

/**
 * Whole-storm edits, each one undoable step with its own name in the
 * history: scale by a factor, set the total depth, resample to another time
 * step (depth kept, see core/storm-tools.ts), set or clear the clock start,
 * clear the storm. A value that cannot be used stays in its field with the
 * reason beside it, and the storm is left as it was.
 */
export function StormTools() {
  const actions = useActions();
  const storm = useScenario((s) => s.storm);
  const units = useScenario((s) => s.units);
  const n = storm.depthsMm.length;
  const depthUnit = unitText(displayUnit('depth', units));
  const totalText = (s: Storm): string => `${formatValue(toDisplay('depth', totalDepthMm(s), units))} ${depthUnit}`;

  const [factor, setFactor] = useState('1.2');
  const [total, setTotal] = useState(() => formatForField(toDisplay('depth', totalDepthMm(storm), units)));
  const [step, setStep] = useState('5');
  const [start, setStart] = useState(() => startFieldText(storm.startIso));
  const [messages, setMessages] = useState<Messages>({});
  const [status, setStatus] = useState('');

  // A depth typed in one unit must never be applied in another: a switch of units rewrites the field.
  const shownUnits = useRef(units);
  useEffect(() => {
    if (shownUnits.current === units) return;
    shownUnits.current = units;
    setTotal(formatForField(toDisplay('depth', totalDepthMm(storm), units)));
    setMessages((m) => ({ ...m, total: undefined }));
  }, [units, storm]);

  // The total depth field follows the storm while it shows the storm's total: after "Scale bars" (or an edit
  // elsewhere, or Undo) it shows the new total, not the old one, which "Set total" would quietly restore. Text the
  // user typed that differs from the total shown is theirs and stays.
  const shownStorm = useRef(storm);
  useEffect(() => {
    const before = shownStorm.current;
    if (before === storm) return;
    shownStorm.current = storm;
    const wasShown = formatForField(toDisplay('depth', totalDepthMm(before), units));
    const now = formatForField(toDisplay('depth', totalDepthMm(storm), units));
    setTotal((text) => (text === wasShown ? now : text));
  }, [storm, units]);

  const fail = (key: keyof Messages, message: string): void => {
    setMessages((m) => ({ ...m, [key]: message }));
    setStatus('');
  };
  const done = (key: keyof Messages, text: string): void => {
    setMessages((m) => ({ ...m, [key]: undefined }));
    setStatus(text);
  };
  /** Runs a storm edit; an InputError from the core becomes the field's message and changes nothing. */
  const attempt = (key: keyof Messages, run: () => string): void => {
    const r = attemptInput(run);
    if (r.ok) done(key, r.value);
    else fail(key, r.error.message);
  };
  const needBars = (key: keyof Messages): boolean => {
    if (n > 0) return true;
    fail(key, 'The storm has no bars yet.');
    return false;
  };

  /**
   * Why a rescaling that would dry a bar with rain is refused, or null: that
   * bar's share of the pattern could not be scaled back (a later "set total
   * to 50 mm" would find nothing there), so the user is sent to the tools
   * that remove rain or go back instead. `what` names the value typed.
   */
  const patternLost = (next: Storm, what: string, instead: string): string | null => {
    const k = firstRainLost(storm, next);
    if (k < 0) return null;
    return totalDepthMm(next) === 0
      ? `${what} would leave every bar dry, and no later scaling could bring the storm’s pattern back: nothing is changed. To remove the rain, use Clear storm; to go back a step, Undo.`
      : `${what} would leave bar ${formatCount(k + 1)} with too little rain to hold its share of the storm’s pattern, and no later scaling could bring it back: nothing is changed. ${instead}; to go back a step, Undo.`;
  };

  const onScale = (e: FormEvent): void => {
    e.preventDefault();
    const parsed = parseNumber(factor);
    if (!parsed.ok) return fail('factor', parsed.message);
    if (parsed.value < 0) return fail('factor', 'The factor cannot be negative.');
    if (!needBars('factor')) return;
    const next = scaleStormByFactor(storm, parsed.value);
    const tooDeep = stormDepthRefusal(next, units);
    if (tooDeep) return fail('factor', tooDeep);
    const lost = patternLost(next, `A factor of ${formatValue(parsed.value)}`, 'Use a larger factor');
    if (lost) return fail('factor', lost);
    attempt('factor', () => {
      actions.setStorm(next, `Scale storm by ${formatValue(parsed.value)}`);
      return `Every bar multiplied by ${formatValue(parsed.value)}: the storm now holds ${totalText(next)}.`;
    });
  };

  const onTotal = (e: FormEvent): void => {
    e.preventDefault();
    const parsed = readTyped(total, {
      quantity: 'depth',
      toSI: (v) => fromDisplay('depth', v, units),
      fromSI: (mm) => toDisplay('depth', mm, units),
      unit: depthUnit,
    });
    if (!parsed.ok) return fail('total', parsed.message);
    if (!needBars('total')) return;
    attempt('total', () => {
      const next = scaleStormToDepth(storm, fromDisplay('depth', parsed.value, units));
      const lost = patternLost(next, `A total of ${formatValue(parsed.value)} ${depthUnit}`, 'Use a larger total');
      if (lost) throw new InputError('depthMm', lost);
      actions.setStorm(next, `Set total depth to ${formatValue(parsed.value)} ${depthUnit}`);
      return `Bars scaled in proportion: the storm now holds ${totalText(next)}.`;
    });
  };

  const onResample = (e: FormEvent): void => {
    e.preventDefault();
    const parsed = readTyped(step, {
      quantity: 'barDuration',
      toSI: (v) => v / 60,
      fromSI: (h) => h * 60,
      unit: 'min',
    });
    if (!parsed.ok) return fail('step', parsed.message);
    if (!needBars('step')) return;
    attempt('step', () => {
      const next = resampleStorm(storm, parsed.value / 60);
      const m = next.depthsMm.length;
      actions.setStorm(next, `Resample to ${formatValue(parsed.value)}-min bars`);
      const last = next.durationsH[m - 1] as number;
      const shorter =
        m > 1 && Math.abs(last - parsed.value / 60) > 1e-9
          ? `; the last bar is ${formatDuration(last)}, to the end of the storm`
          : '';
      return `Now ${formatCount(m)} bar${m === 1 ? '' : 's'} of ${formatDuration(next.durationsH[0] as number)}${shorter}; ${totalText(next)} kept.`;
    });
  };

  const onStart = (e: FormEvent): void => {
    e.preventDefault();
    const read = readStartText(start);
    if (!read.ok) return fail('start', read.message);
    attempt('start', () => {
      actions.setStartIso(read.iso);
      setStart(startFieldText(read.iso));
      return `The storm starts at ${startFieldText(read.iso)}; bar times and the chart show clock times.`;
    });
  };

  const clearStart = (): void => {
    attempt('start', () => {
      actions.setStartIso(undefined);
      setStart('');
      return 'The storm has no start time now; times are counted from its start.';
    });
  };

  const clearStorm = (): void => {
    if (n === 0) {
      setStatus('The storm has no bars to clear.');
      return;
    }
    actions.setStorm({ durationsH: [], depthsMm: [] }, 'Clear storm');
    setStatus(`All ${formatCount(n)} bars removed. Undo brings them back.`);
  };

  return (
    <section id={STORM_TOOLS_ID} className="panel storm-panel storm-tools" aria-labelledby="storm-tools-title">
      <div className="storm-panel__head">
        <h2 id="storm-tools-title">Storm tools</h2>
        <button
          type="button"
          className="button--danger"
          onClick={clearStorm}
          disabled={n === 0}
          aria-describedby="clear-storm-hint"
        >
          Clear storm
        </button>
      </div>
      <p className="visually-hidden" id="clear-storm-hint">
        Removes every bar; Undo brings them back.
      </p>
      <div className="storm-tools__grid">
        <form className="tool" onSubmit={onScale} aria-label="Scale by a factor">
          <ToolField
            id="tool-factor"
            label="Scale factor"
            text={factor}
            onText={setFactor}
            message={messages.factor ?? null}
          />
          <button type="submit">Scale bars</button>
        </form>
        <form className="tool" onSubmit={onTotal} aria-label="Set the total depth">
          <ToolField
            id="tool-total"
            label="Total depth"
            unit={depthUnit}
            text={total}
            onText={setTotal}
            message={messages.total ?? null}
            hint={`Now ${totalText(storm)}`}
          />
          <button type="submit">Set total depth</button>
        </form>
        <form className="tool" onSubmit={onResample} aria-label="Resample to another step">
          <ToolField
            id="tool-step"
            label="New time step"
            unit="min"
            text={step}
            onText={setStep}
            message={messages.step ?? null}
            hint="Depth kept: each bar's rain is shared by time overlap."
          />
          <button type="submit">Resample</button>
        </form>
        <form className="tool" onSubmit={onStart} aria-label="Storm start time">
          <ToolField
            id="tool-start"
            label="Storm start"
            text={start}
            onText={setStart}
            message={messages.start ?? null}
            placeholder="YYYY-MM-DD HH:MM"
            inputMode="text"
            hint={storm.startIso === undefined ? 'None: times count from the start.' : 'As read on the gauge clock.'}
          />
          <div className="tool__buttons">
            <button type="submit">Set start</button>
            <button type="button" onClick={clearStart} disabled={storm.startIso === undefined}>
              Clear start
            </button>
          </div>
        </form>
      </div>
      <p className="storm-panel__status" role="status">
        {status}
      </p>
    </section>
  );
}
