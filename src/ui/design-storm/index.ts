// Design storms: alternating block from an IDF formula or table, uniform storms, scaling; the design loss applied.
// The view's layout and its summary list are styled with the event set's.

export { DesignStormView } from './DesignStormView';
