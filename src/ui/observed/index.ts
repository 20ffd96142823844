// The observed event: a streamflow record pasted or opened, drawn under the
// hyetograph on the same time axis, baseflow separated by the core, and the
// direct-runoff depth sent to Matching. Mounted by App.tsx.

export { HydrographChart, HYDROGRAPH_HEIGHT } from './HydrographChart';
// SeparationPanel is not exported here: App.tsx loads it once there is a streamflow record.
// The paste dialog (paste/FlowPasteDialog.tsx) is not exported here: StreamflowButtons loads it when first opened.
