import { carriesDemoIdentity } from '../../scenario/demo';
import { useScenario } from '../../store';
import { formatCount } from '../format';

export interface ActiveEvent {
  /** 1-based place in the event set. */
  readonly number: number;
  readonly count: number;
  readonly name: string;
}

/** The event of the event set on the workbench, or null when the workbench holds a storm of its own. */
export function useActiveEvent(): ActiveEvent | null {
  const set = useScenario((s) => s.eventSet);
  if (set.activeId === null) return null;
  const k = set.events.findIndex((e) => e.id === set.activeId);
  const event = set.events[k];
  return event ? { number: k + 1, count: set.events.length, name: event.name } : null;
}

/** "Editing event 2 of 5", the words the workbench and the import dialogs use for the event on it. */
export function editingEventText(event: ActiveEvent): string {
  return `Editing event ${formatCount(event.number)} of ${formatCount(event.count)}`;
}

/**
 * What replacing the storm by an import does besides, in a sentence (or ''): it changes the event on the
 * workbench, and over the invented demo it clears the demo's name, catchment, notes and observed runoff.
 */
export function useReplaceConsequences(): string {
  const event = useActiveEvent();
  const demo = useScenario(carriesDemoIdentity);
  const parts: string[] = [];
  if (event) {
    parts.push(
      `The new storm becomes event ${formatCount(event.number)} of ${formatCount(event.count)} (“${event.name}”) in the event set.`,
    );
  }
  if (demo) {
    parts.push(
      'The invented demo’s name, catchment, notes and observed runoff are cleared with it; they are not your storm’s (its area stays, to change).',
    );
  }
  return parts.join(' ');
}
