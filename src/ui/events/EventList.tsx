import {
  useActions,
  useScenario,
  withEventAdded,
  withEventMoved,
  withEventOnWorkbench,
  withEventRemoved,
  withEventRenamed,
} from '../../store';
import { TextInput } from '../fields/TextInput';

/**
 * The catchment's events: add the workbench's storm as an event, rename,
 * reorder, remove, and choose which one is on the workbench. Every change is
 * one undoable edit.
 */
export function EventList() {
  const events = useScenario((s) => s.eventSet.events);
  const activeId = useScenario((s) => s.eventSet.activeId);
  const actions = useActions();
  const last = events.length - 1;
  return (
    <section className="panel events-list" aria-labelledby="events-list-title">
      <h2 id="events-list-title">Events of this catchment</h2>
      <p className="panel__intro">
        Each event is a storm with the runoff it produced. Put an event on the workbench to change its bars, observed
        runoff or streamflow record there; the event follows every change.
      </p>
      {events.length === 0 ? <p className="events-list__empty">No events yet.</p> : null}
      <ol className="events-list__items">
        {events.map((event, k) => {
          const label = event.name.trim() === '' ? `Event ${k + 1}` : event.name;
          const onBench = event.id === activeId;
          return (
            <li
              key={event.id}
              className={onBench ? 'events-list__item events-list__item--active' : 'events-list__item'}
            >
              <label className="visually-hidden" htmlFor={`event-name-${event.id}`}>
                Name of event {k + 1}
              </label>
              <TextInput
                id={`event-name-${event.id}`}
                value={event.name}
                messageClassName="events-list__msg"
                onCommit={(text) =>
                  actions.edit(`Rename event ${k + 1}`, (s) => withEventRenamed(s, event.id, text), {
                    coalesceKey: `event-name-${event.id}`,
                  })
                }
              />
              {onBench ? (
                <span className="events-list__badge">on the workbench</span>
              ) : (
                <button
                  type="button"
                  aria-label={`Put ${label} on the workbench`}
                  onClick={() =>
                    actions.edit(`Put ${label} on the workbench`, (s) => withEventOnWorkbench(s, event.id))
                  }
                >
                  To workbench
                </button>
              )}
              <button
                type="button"
                aria-label={`Move ${label} up`}
                disabled={k === 0}
                onClick={() => actions.edit(`Move ${label} up`, (s) => withEventMoved(s, event.id, -1))}
              >
                ↑
              </button>
              <button
                type="button"
                aria-label={`Move ${label} down`}
                disabled={k === last}
                onClick={() => actions.edit(`Move ${label} down`, (s) => withEventMoved(s, event.id, 1))}
              >
                ↓
              </button>
              <button
                type="button"
                aria-label={`Remove ${label}`}
                onClick={() => actions.edit(`Remove ${label}`, (s) => withEventRemoved(s, event.id))}
              >
                Remove
              </button>
            </li>
          );
        })}
      </ol>
      <button
        type="button"
        className="button--primary"
        onClick={() => actions.edit('Add event', (s) => withEventAdded(s))}
      >
        Add the workbench storm as an event
      </button>
    </section>
  );
}
