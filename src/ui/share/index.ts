// Whole-scenario tools: share link, scenario file, the browser's saved list,
// and the bar that holds them with the export and compare buttons. Mounted by App.tsx.

export { ScenarioBar, LIBRARY_PANEL_ID } from './ScenarioBar';
export { LinkNotice } from './LinkNotice';
export { CopyLink, linkLengthText, LONG_LINK_CHARS } from './CopyLink';
export { ScenarioFile } from './ScenarioFile';
// LibraryPanel is not exported here: ScenarioBar loads it when the saved list is first opened.
export {
  ScenarioServicesProvider,
  browserServices,
  browserStorage,
  useServices,
  type ScenarioServices,
} from './services';
