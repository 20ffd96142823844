// Whole-scenario tools: share link, scenario file, the browser's saved list,
// and the bar that holds them with the export and compare buttons. Mounted by App.tsx.
import './share.css';

export { ScenarioBar } from './ScenarioBar';
export { LinkNotice } from './LinkNotice';
export { linkLengthText, LONG_LINK_CHARS } from './CopyLink';
// LibraryPanel is not exported here: ScenarioBar loads it when the saved list is first opened.
// The page's services (storage, clipboard, downloads, pins) live in ../services, below this panel.
