import type { RecordEvent, Storm, UnitSystem } from '../../core';
import { formatCount, formatValue } from '../format';
import { formatDuration } from '../rainfall/RainfallToolbar';
import { barTimeText, type BarClock } from '../storm-input/bar-times';
import { displayUnit, toDisplay, unitText } from '../units';

/** Rows listed at most: past this the table says how many more there are (they stay picked). */
export const LISTED_EVENTS = 300;

/** Highest bar intensity of an event, mm/h. */
export function eventPeakMmH(storm: Storm, event: RecordEvent): number {
  let peak = 0;
  for (let k = event.firstBar; k <= event.lastBar; k++) {
    const rate = (storm.depthsMm[k] as number) / (storm.durationsH[k] as number);
    if (rate > peak) peak = rate;
  }
  return peak;
}

export interface EventPicksProps {
  readonly storm: Storm;
  readonly startsH: Float64Array;
  readonly clock: BarClock;
  readonly events: readonly RecordEvent[];
  readonly isPicked: (event: RecordEvent) => boolean;
  readonly onPick: (event: RecordEvent, picked: boolean) => void;
  readonly units: UnitSystem;
}

/** The events found, one row each, with a box to pick it. */
export function EventPicks({ storm, startsH, clock, events, isPicked, onPick, units }: EventPicksProps) {
  const depthUnit = unitText(displayUnit('depth', units));
  const rateUnit = unitText(displayUnit('rate', units));
  const listed = Math.min(events.length, LISTED_EVENTS);
  const rows = [];
  for (let i = 0; i < listed; i++) {
    const e = events[i] as RecordEvent;
    const start = barTimeText(clock, startsH[e.firstBar] as number);
    const picked = isPicked(e);
    rows.push(
      <tr key={e.firstBar} className={picked ? undefined : 'record-events__off'}>
        <td>
          <input
            type="checkbox"
            checked={picked}
            aria-label={`Pick event ${i + 1}, from ${start}`}
            onChange={(ev) => onPick(e, ev.currentTarget.checked)}
          />
        </td>
        <td className="num">{formatCount(i + 1)}</td>
        <td>{start}</td>
        <td className="num">{formatDuration(e.durationH)}</td>
        <td className="num">{formatValue(toDisplay('depth', e.depthMm, units))}</td>
        <td className="num">{formatValue(toDisplay('rate', eventPeakMmH(storm, e), units))}</td>
      </tr>,
    );
  }
  return (
    <div className="record-events__scroll">
      <table className="record-events">
        <caption className="visually-hidden">Events found in the record</caption>
        <thead>
          <tr>
            <th scope="col">Pick</th>
            <th scope="col">#</th>
            <th scope="col">Start</th>
            <th scope="col">Duration</th>
            <th scope="col">Depth ({depthUnit})</th>
            <th scope="col">Peak intensity ({rateUnit})</th>
          </tr>
        </thead>
        <tbody>{rows}</tbody>
      </table>
      {events.length > listed ? (
        <p className="record-events__more">
          The first {formatCount(listed)} of {formatCount(events.length)} events are listed; the rest keep their pick.
        </p>
      ) : null}
    </div>
  );
}
