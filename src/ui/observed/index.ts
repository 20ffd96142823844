// The observed event: a streamflow record pasted or opened, drawn under the
// hyetograph on the same time axis, baseflow separated by the core, and the
// direct-runoff depth sent to Matching. Mounted by App.tsx.
import './observed.css';

export { HydrographChart, HYDROGRAPH_HEIGHT } from './HydrographChart';
export { SeparationPanel } from './SeparationPanel';
