// Whole-scenario tools: share link, scenario file, the browser's saved list,
// and the bar that holds them with the export and compare buttons. Mounted by App.tsx.

export { ScenarioBar } from './ScenarioBar';
// LibraryPanel and LinkNotice are not exported here: ScenarioBar and App.tsx load them when first needed.
// The page's services (storage, clipboard, downloads, pins) live in ../services, below this panel.
