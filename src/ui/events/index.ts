// The catchment's event set: the list of events, fit all, the spread of the fits and the design value.

export { EventsView } from './EventsView';
