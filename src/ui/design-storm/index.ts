// Design storms: alternating block from an IDF formula or table, uniform storms, scaling; the design loss applied.
import './design-storm.css';

export { DesignStormView } from './DesignStormView';
