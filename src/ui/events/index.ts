// The catchment's event set: the list of events, fit all, the spread of the fits and the design value.

export { EventsView } from './EventsView';
export { EventList } from './EventList';
export { FitAll } from './FitTable';
export { FitChart } from './FitChart';
export { ViewTabs, type View } from './ViewTabs';
export { useEventFits } from './use-event-fits';
export {
  designMethod,
  designOutcome,
  eventTarget,
  fitAllEvents,
  fittedParameter,
  type EventFits,
  type FitRow,
} from './event-fits';
