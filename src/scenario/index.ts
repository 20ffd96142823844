// The scenario document layer: schema, versions, share links, files and the
// browser's list of saved scenarios. Pure TypeScript, no React or DOM.
export type { Scenario } from './types';
export type { Problem, ScenarioResult } from './problems';
export { MAX_LISTED_PROBLEMS } from './problems';
export { parseScenario, FIELD_HELP } from './schema';
export {
  CURRENT_SCENARIO_VERSION,
  MIGRATIONS,
  migrate,
  type Migration,
  type MigrationResult,
  type RawDocument,
} from './migrate';
export { encodeScenarioLink, makeShareLink, type ShareLinkResult } from './link-make';
export {
  decodeScenarioLink,
  loadLinkReader,
  isScenarioLink,
  LINK_PREFIX,
  MAX_LINK_CHARS,
  MAX_LINK_JSON_BYTES,
} from './link';
export { scenarioToFileText, scenarioFromFileText, scenarioFileName, FILE_FORMAT_TAG, MAX_FILE_CHARS } from './file';
export { CAUTION_TEXT } from './caution';
export { MAX_NAME_LENGTH, MAX_NOTES_LENGTH, textLengthProblem } from './text-limits';
export { DEMO_SCENARIO, carriesDemoIdentity, withoutDemoIdentity } from './demo';
export { blankScenario } from './blank';
export {
  createScenarioLibrary,
  LIBRARY_KEY,
  LIBRARY_FORMAT_TAG,
  LIBRARY_VERSION,
  MAX_DELETED,
  type ScenarioLibrary,
  type LibraryEntry,
  type LargeLibraryEntry,
  type LargeRef,
  type SavedEntry,
  entryName,
  readLargeRef,
  type DeletedEntry,
  type LibraryListing,
  type LibraryResult,
  type StorageLike,
} from './library';
