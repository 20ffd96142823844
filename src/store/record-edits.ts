import {
  InputError,
  defaultBaseflowMethod,
  eventFlowWindow,
  eventStorm,
  hoursBetweenClocks,
  attempt,
  separateBaseflow,
  shiftIso,
  type RecordEvent,
  type Storm,
} from '../core';
import { MAX_EVENTS } from '../scenario/schema';
import type { EventObserved, Scenario, SetEvent, Streamflow } from '../scenario/types';
import { FIRST_BASEFLOW_KIND, type RecordInput } from './streamflow-edits';

/**
 * Events cut from a long gauge record (issue 14), added to the event set in
 * one edit. Pure, like ./event-edits.ts: returns a new Scenario and throws
 * InputError naming the field before changing anything.
 */

/** A streamflow record over the same period as a long rainfall record, and how much of it each event takes. */
export interface RecordFlow {
  readonly record: RecordInput;
  /** How long after each event's last bar its window of the record runs, h. */
  readonly afterH: number;
}

/** One event of the record to add, with its name in the set. */
export interface RecordPick {
  readonly event: RecordEvent;
  readonly name: string;
}

/**
 * Hours from the rainfall record's start to the streamflow record's first
 * sample: from the two clocks when both have one, else 0 (the two records
 * are taken to start together).
 */
export function flowOffsetH(rain: Storm, flow: RecordInput): number {
  if (rain.startIso === undefined || flow.startIso === undefined) return 0;
  return hoursBetweenClocks(rain.startIso, flow.startIso)?.hours ?? 0;
}

/**
 * An event's window of the streamflow record (eventFlowWindow) as the
 * scenario holds a record: times from its first sample, which lies
 * `offsetH` h from the event's start (a little before it, or at it), with
 * the first separation; its direct runoff is the event's observed runoff
 * when the separation can be worked out.
 */
function eventData(
  rain: Storm,
  event: RecordEvent,
  flow: RecordFlow,
  areaM2: number,
): { streamflow: Streamflow; observed: EventObserved | null } {
  const window = eventFlowWindow(rain, event, flow.record, {
    afterH: flow.afterH,
    offsetH: flowOffsetH(rain, flow.record),
  });
  const t0 = window.timesH[0] as number;
  const timesH = Array.from(window.timesH, (t) => t - t0);
  const dischargeM3s = Array.from(window.dischargeM3s);
  const eventStart = eventStorm(rain, event).startIso;
  const baseflow = defaultBaseflowMethod(FIRST_BASEFLOW_KIND);
  const offsetH = t0 === 0 ? 0 : t0;
  // A window the first separation cannot take is kept unlinked: the workbench says why once it is opened.
  const separated = attempt(() => separateBaseflow({ timesH, dischargeM3s }, baseflow, { areaM2 }).directDepthMm);
  const separates = separated.ok;
  const depthMm = separated.ok ? separated.value : undefined;
  const streamflow: Streamflow = {
    timesH,
    dischargeM3s,
    ...(eventStart === undefined || flow.record.startIso === undefined
      ? {}
      : { startIso: shiftIso(eventStart, offsetH) }),
    offsetH,
    baseflow,
    baseflowMemory: {},
    useAsObserved: separates,
  };
  // As withSeparationAsObserved: the link needs an observed runoff, whose value (unread while linked) is the depth shown.
  return { streamflow, observed: separates ? { as: 'depth', value: depthMm ?? 0 } : null };
}

/**
 * Adds the picked events of a long rainfall record to the end of the event
 * set, each with its own storm (eventStorm) and, given a streamflow record,
 * its window of it. The workbench and the event on it stay as they were.
 * Refuses (changing nothing) when the set would hold more than MAX_EVENTS,
 * or when an event's window lies outside the streamflow record.
 */
export function withRecordEvents(
  s: Scenario,
  rain: Storm,
  picks: readonly RecordPick[],
  flow: RecordFlow | null = null,
): Scenario {
  if (picks.length === 0) throw new InputError('events', 'No events are picked to add.');
  const room = MAX_EVENTS - s.eventSet.events.length;
  if (picks.length > room) {
    throw new InputError(
      'events',
      `The event set holds at most ${MAX_EVENTS} events; it has ${s.eventSet.events.length}, so ${picks.length} more do not fit. Pick ${room > 0 ? `at most ${room}` : 'none, or remove some from the set first'}.`,
    );
  }
  const taken = new Set(s.eventSet.events.map((e) => e.id));
  let next = s.eventSet.events.length + 1;
  const added: SetEvent[] = [];
  for (let i = 0; i < picks.length; i++) {
    const { event, name } = picks[i] as RecordPick;
    while (taken.has(`e${next}`)) next++;
    const id = `e${next}`;
    taken.add(id);
    const storm = eventStorm(rain, event);
    let data: { streamflow: Streamflow | null; observed: EventObserved | null } = { streamflow: null, observed: null };
    if (flow !== null) {
      const r = attempt(() => eventData(rain, event, flow, s.catchment.areaM2));
      if (!r.ok) throw new InputError(r.error.field, `${name}: ${r.error.message}`);
      data = r.value;
    }
    added.push({
      id,
      name,
      storm: {
        durationsH: Array.from(storm.durationsH),
        depthsMm: Array.from(storm.depthsMm),
        ...(storm.startIso === undefined ? {} : { startIso: storm.startIso }),
      },
      ...data,
    });
  }
  return { ...s, eventSet: { ...s.eventSet, events: s.eventSet.events.concat(added) } };
}
