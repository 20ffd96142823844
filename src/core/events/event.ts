import { InputError } from '../errors';
import type { Storm } from '../storm';

/** One observed event on a catchment: its storm and the runoff depth it produced. */
export interface CatchmentEvent {
  /** Stable key (survives rename and reorder). Unique within a set. */
  readonly id: string;
  readonly name: string;
  readonly storm: Storm;
  /** Observed direct runoff, mm over the catchment. */
  readonly observedExcessMm: number;
}

/**
 * Checks the shape of an event list: an array of events with unique,
 * non-empty string ids and string names. Throws InputError naming `events`,
 * `id` or `name` with the event's index. Storms and observed depths are left
 * to each event's own calculation, so one bad event does not hide the others.
 */
export function validateEventList(events: readonly CatchmentEvent[]): void {
  if (!Array.isArray(events)) throw new InputError('events', 'The events must be given as a list.');
  const seen = new Map<string, number>();
  events.forEach((event, k) => {
    if (!event || typeof event !== 'object') throw new InputError('events', `Event ${k + 1} is missing.`, k);
    if (typeof event.id !== 'string' || event.id === '') {
      throw new InputError('id', `Event ${k + 1} has no id.`, k);
    }
    const earlier = seen.get(event.id);
    if (earlier !== undefined) {
      throw new InputError(
        'id',
        `Events ${earlier + 1} and ${k + 1} share the id "${event.id}"; ids must be unique.`,
        k,
      );
    }
    seen.set(event.id, k);
    if (typeof event.name !== 'string') throw new InputError('name', `Event ${k + 1} has no name.`, k);
  });
}
