// The text-import layer: pasted or opened text → storm or streamflow record,
// with every guess an explicit setting and every bad cell a located problem.
// Pure TypeScript: no React, no DOM.
export { describeProblem, MAX_LISTED_PROBLEMS, type ImportProblem } from './problems';
export {
  parseNumber,
  detectDecimal,
  detectNumberStyle,
  numberStyleOf,
  GROUPINGS,
  type DecimalMark,
  type Grouping,
  type NumberStyle,
} from './numbers';
export {
  NUMBER_FORMATS,
  DEFAULT_NUMBER_FORMAT,
  numberFormat,
  readNumber,
  writeNumber,
  type NumberFormat,
  type NumberFormatId,
} from './number-format';
export {
  detectSeparator,
  readTable,
  normaliseText,
  SEPARATORS,
  type Separator,
  type TableOptions,
  type TextRow,
  type TextTable,
} from './table-text';
export {
  parseClock,
  readTimes,
  isoAt,
  guessElapsedKind,
  guessDateOrder,
  TIME_KINDS,
  DATE_ORDERS,
  type TimeKind,
  type DateOrder,
  type ClockReading,
  type CalendarOrigin,
  type TimeLine,
} from './time-values';
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
  type RainImportPreview,
  type RainImportResult,
  type RainValueKind,
  type RainUnit,
  type TimeMarks,
  type CumulativeFrom,
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
  type FlowImportPreview,
  type FlowImportResult,
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
