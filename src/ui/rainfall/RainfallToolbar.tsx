import { useMemo, type ReactNode } from 'react';
import { totalDepthMm, totalDurationH, type Storm, type UnitSystem } from '../../core';
import { stormBeyondRecords } from '../../io/plausible';
import { useScenario } from '../../store';
import { wallClockMs, formatWallDate, formatWallTime } from '../chart/clock';
import { formatCount, formatValue } from '../format';
import { displayUnit, toDisplay, unitText } from '../units';
import { editingEventText, useActiveEvent } from './active-event';

/** "30 s", "10 min", "1 h", "1 h 30 min" for a bar duration in hours. */
export function formatDuration(hours: number): string {
  // Under a minute in seconds: a 1-s bar in minutes to a thousandth read "0.017 min".
  const seconds = Math.round(hours * 3600 * 1000) / 1000;
  if (seconds < 60) return `${formatValue(seconds)} s`;
  // Round to a thousandth of a minute first, so 18 bars of 10 min read "3 h", not "2 h 60 min".
  const minutes = Math.round(hours * 60 * 1000) / 1000;
  if (minutes < 60) return `${formatValue(minutes)} min`;
  const whole = Math.floor(minutes / 60);
  const rest = Math.round((minutes - whole * 60) * 1000) / 1000;
  return rest === 0 ? `${formatCount(whole)} h` : `${formatCount(whole)} h ${formatValue(rest)} min`;
}

/**
 * A storm holding more rain in some bar than has ever been recorded over
 * that bar's duration is possible to type, never seen in a real storm: said
 * in plain words above the chart (a unit or a step slipped, most likely),
 * without refusing it.
 */
function RecordWarning({ storm, units }: { storm: Storm; units: UnitSystem }) {
  const beyond = useMemo(() => stormBeyondRecords(storm), [storm]);
  const b = beyond.first;
  if (b === null) return null;
  const unit = unitText(displayUnit('depth', units));
  const depth = (mm: number): string => `${formatValue(toDisplay('depth', mm, units))} ${unit}`;
  const others =
    beyond.count > 1 ? ` (and ${formatCount(beyond.count - 1)} other bar${beyond.count > 2 ? 's' : ''})` : '';
  const d = formatDuration(b.durationH);
  return (
    <p className="rainfall__warning" role="note">
      Bar {formatCount(b.bar + 1)}
      {others} holds {depth(b.depthMm)} in {d}, more than the world’s greatest recorded rainfalls (about{' '}
      {depth(b.recordMm)} in {d}; Jennings 1950, from memory). Check the unit and the bar durations.
    </p>
  );
}

/**
 * The "Rainfall" region above the chart: what the storm is, in a sentence,
 * and the slot where the rainfall-input tools (paste, draw, bar table, storm
 * tools; src/ui/storm-input/) mount. They edit the storm through the store's
 * setStorm / setBarDepth / setBarDuration / insertBar / deleteBar actions.
 */
export function RainfallToolbar({ tools }: { tools?: ReactNode }) {
  const storm = useScenario((s) => s.storm);
  const units = useScenario((s) => s.units);
  const event = useActiveEvent();
  const n = storm.depthsMm.length;
  const d = storm.durationsH;
  let uniform = n > 0;
  // Steps worked out from clock times differ in the last bits (10 min = 0.1666… h); to a part in 10⁹ they are one step.
  for (let k = 1; k < n && uniform; k++)
    uniform = Math.abs((d[k] as number) - (d[0] as number)) <= 1e-9 * (d[0] as number);
  const first = d[0];
  const bars =
    n === 0
      ? 'No bars'
      : uniform && first !== undefined
        ? `${formatCount(n)} bar${n === 1 ? '' : 's'} of ${formatDuration(first)}`
        : `${formatCount(n)} bars of mixed durations`;
  const depth = `${formatValue(toDisplay('depth', totalDepthMm(storm), units))} ${unitText(displayUnit('depth', units))}`;
  const start = storm.startIso === undefined ? null : wallClockMs(storm.startIso);
  const when = start === null ? '' : `, from ${formatWallDate(start)} ${formatWallTime(start)}`;
  return (
    <section className="rainfall" aria-labelledby="rainfall-title" data-slot="rainfall-tools">
      <div className="rainfall__what">
        <h2 id="rainfall-title">Rainfall</h2>
        {event ? (
          <p className="rainfall__event" role="status">
            {editingEventText(event)}: {event.name}
          </p>
        ) : null}
        <p className="rainfall__summary" aria-live="polite">
          {bars}, {depth} in {formatDuration(totalDurationH(storm))}
          {when}
        </p>
      </div>
      <RecordWarning storm={storm} units={units} />
      {tools ? <div className="rainfall__tools">{tools}</div> : null}
    </section>
  );
}
