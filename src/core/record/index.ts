// Long gauge records: splitting into events, and each event's storm and
// streamflow window (issue 14). Pure functions; no React, no DOM.
export { splitEvents, type RecordEvent, type SplitOptions } from './split';
export { eventSpanH, eventStorm, eventFlowWindow, type FlowWindow, type FlowWindowOptions } from './window';
export { shiftIso } from './clock';
