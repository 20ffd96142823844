// The text-import layer: pasted or opened text → storm or streamflow record,
// with every guess an explicit setting and every bad cell a located problem.
// Pure TypeScript: no React, no DOM.
export { describeProblem, MAX_LISTED_PROBLEMS, type ImportProblem } from './problems';
export { parseNumber, type Grouping } from './numbers';
export { DEFAULT_NUMBER_FORMAT, numberFormat } from './number-format';
export { readTable, type Separator, type TextRow } from './table-text';
export { plainArray } from './plain-columns';
export { parseClock, isoAt } from './time-values';
export type { SeriesSettings, ImportHints } from './series';
export {
  guessRainImport,
  guessRainSettings,
  previewRainImport,
  readRainImport,
  findGaps,
  type GapChoice,
  type RecordGaps,
  applyRainImport,
  rainHintsFromName,
  type RainImportSettings,
  type RainValueKind,
  type RainUnit,
  type TimeMarks,
  type ImportedStorm,
} from './rain-import';
export {
  guessFlowImport,
  guessFlowSettings,
  previewFlowImport,
  readFlowImport,
  applyFlowImport,
  flowUnitFromName,
  type FlowImportSettings,
  type FlowRecord,
} from './flow-import';
export { guessForScreen } from './screen-guess';
export {
  READERS,
  RAIN_READER,
  FLOW_READER,
  PREVIEW_ROWS,
  type Reader,
  type ReaderName,
  type ReaderContext,
  type ReadOutcome,
} from './readers';
