// Design storms: alternating block from an IDF formula or table, uniform storms, scaling; the design loss applied.
import './design-storm.css';
// The view's layout and its summary list are styled with the event set's.
import '../events/events.css';

export { DesignStormView } from './DesignStormView';
