import { EventList } from './EventList';
import { FitAll } from './FitTable';
import './events.css';

/** The event set view: the catchment's events, and the fit of all of them with the design value. */
export function EventsView() {
  return (
    <div className="events-view">
      <EventList />
      <FitAll />
    </div>
  );
}
