import { InputError, methodSpec } from '../core';
import { MAX_NAME_LENGTH, textLengthProblem } from '../scenario/text-limits';
import type { DesignPickDoc, Scenario, SetEvent } from '../scenario/types';

/**
 * Pure edits of the event set (scenario version 3). Like ./edits.ts, each
 * returns a new Scenario (or the same one when nothing changes) and throws
 * InputError naming the field before changing anything.
 */

/** The workbench's storm, observed runoff and record as an event's data. */
function workbenchData(s: Scenario): Pick<SetEvent, 'storm' | 'observed' | 'streamflow'> {
  return {
    storm: s.storm,
    observed: s.observed === null ? null : { as: s.observed.as, value: s.observed.value },
    streamflow: s.streamflow,
  };
}

/**
 * Keeps the event on the workbench equal to the workbench: called by the
 * store after every edit, so a workbench change (a bar, the observed
 * runoff, the record) is the active event's change too. Shares every part
 * that did not change.
 */
export function withActiveEventSynced(s: Scenario): Scenario {
  const id = s.eventSet.activeId;
  if (id === null) return s;
  const k = s.eventSet.events.findIndex((e) => e.id === id);
  const event = s.eventSet.events[k];
  if (!event) return s;
  const data = workbenchData(s);
  const sameObserved =
    event.observed === data.observed ||
    (event.observed !== null &&
      data.observed !== null &&
      event.observed.as === data.observed.as &&
      event.observed.value === data.observed.value);
  if (event.storm === data.storm && sameObserved && event.streamflow === data.streamflow) return s;
  const events = s.eventSet.events.slice();
  events[k] = {
    ...event,
    storm: data.storm,
    observed: sameObserved ? event.observed : data.observed,
    streamflow: data.streamflow,
  };
  return { ...s, eventSet: { ...s.eventSet, events } };
}

function nextId(s: Scenario): string {
  let n = s.eventSet.events.length + 1;
  const taken = new Set(s.eventSet.events.map((e) => e.id));
  while (taken.has(`e${n}`)) n++;
  return `e${n}`;
}

function indexOf(s: Scenario, id: string): number {
  const k = s.eventSet.events.findIndex((e) => e.id === id);
  if (k < 0) throw new InputError('eventSet.activeId', `There is no event with id "${id}" in the set.`);
  return k;
}

/**
 * Adds the workbench's storm, observed runoff and record as a new event
 * (named `name`, or "Event n") and makes it the one on the workbench.
 */
export function withEventAdded(s: Scenario, name?: string): Scenario {
  const id = nextId(s);
  const event: SetEvent = { id, name: name ?? `Event ${s.eventSet.events.length + 1}`, ...workbenchData(s) };
  return { ...s, eventSet: { ...s.eventSet, events: [...s.eventSet.events, event], activeId: id } };
}

export function withEventRenamed(s: Scenario, id: string, name: string): Scenario {
  if (typeof name !== 'string') throw new InputError('name', 'An event name must be text.');
  const k = indexOf(s, id);
  const event = s.eventSet.events[k] as SetEvent;
  if (event.name === name) return s;
  const tooLong = textLengthProblem(`The name of event ${k + 1}`, name, MAX_NAME_LENGTH);
  if (tooLong !== null) throw new InputError('name', tooLong);
  const events = s.eventSet.events.slice();
  events[k] = { ...event, name };
  return { ...s, eventSet: { ...s.eventSet, events } };
}

/** Removes an event; removing the one on the workbench leaves its storm there, belonging to no event. */
export function withEventRemoved(s: Scenario, id: string): Scenario {
  indexOf(s, id);
  const events = s.eventSet.events.filter((e) => e.id !== id);
  const activeId = s.eventSet.activeId === id ? null : s.eventSet.activeId;
  return { ...s, eventSet: { ...s.eventSet, events, activeId } };
}

/** Moves an event up (−1) or down (+1) the list; at an end it stays. */
export function withEventMoved(s: Scenario, id: string, by: -1 | 1): Scenario {
  const k = indexOf(s, id);
  const to = k + by;
  if (to < 0 || to >= s.eventSet.events.length) return s;
  const events = s.eventSet.events.slice();
  const [moved] = events.splice(k, 1);
  events.splice(to, 0, moved as SetEvent);
  return { ...s, eventSet: { ...s.eventSet, events } };
}

/**
 * Puts an event on the workbench: its storm, observed runoff and record
 * replace the workbench's (which, when it belonged to another event, is
 * already kept in that event). The parameter to fit and "keep matched" stay.
 */
export function withEventOnWorkbench(s: Scenario, id: string): Scenario {
  const event = s.eventSet.events[indexOf(s, id)] as SetEvent;
  if (s.eventSet.activeId === id) return s;
  const parameter = s.observed?.parameter ?? methodSpec(s.method.kind).params[0]?.key ?? '';
  return {
    ...s,
    storm: event.storm,
    observed: event.observed === null ? null : { ...event.observed, parameter, locked: s.observed?.locked ?? false },
    streamflow: event.streamflow,
    eventSet: { ...s.eventSet, activeId: id },
  };
}

/** The parameter fitted for every event (null: the workbench's). */
export function withEventParameter(s: Scenario, parameter: string | null): Scenario {
  if (parameter !== null && !methodSpec(s.method.kind).params.some((p) => p.key === parameter)) {
    throw new InputError(
      'eventSet.parameter',
      `${methodSpec(s.method.kind).label} has no parameter "${parameter}" to fit.`,
    );
  }
  return parameter === s.eventSet.parameter ? s : { ...s, eventSet: { ...s.eventSet, parameter } };
}

export function withDesignPick(s: Scenario, pick: DesignPickDoc): Scenario {
  if (typeof pick === 'object') {
    if (typeof pick.value !== 'number' || !Number.isFinite(pick.value)) {
      throw new InputError('designValue', `The design value must be a finite number (got ${String(pick.value)}).`);
    }
    const old = s.eventSet.designPick;
    if (typeof old === 'object' && old.value === pick.value) return s;
  } else if (pick === s.eventSet.designPick) return s;
  return { ...s, eventSet: { ...s.eventSet, designPick: pick } };
}

/**
 * Puts a storm that belongs to no event on the workbench (a design storm),
 * with the given loss method: the event on the workbench, if any, is kept
 * as it was in the set; the workbench has no observed runoff or record.
 */
export function withDesignStormOnWorkbench(
  s: Scenario,
  storm: Scenario['storm'],
  method: Scenario['method'],
): Scenario {
  return {
    ...s,
    storm,
    method,
    observed: null,
    streamflow: null,
    eventSet: { ...s.eventSet, activeId: null },
  };
}
