// Getting rainfall in: paste or open text (with a preview to correct), draw on
// the chart, edit the bar table, and whole-storm tools. Mounted by App.tsx.

export { StormInputProvider } from './context';
export { RainfallTools } from './RainfallTools';
export { StormPanels } from './StormPanels';
export { DrawableChart } from './draw/DrawableChart';
// BarTable (table/BarTable.tsx) is not exported here: App.tsx loads it just after the first screen.
