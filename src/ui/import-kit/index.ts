// What the rainfall and streamflow imports share: the paste-and-check dialog,
// the controls that correct its guesses, the preview sketch, and opening a
// text file. The screens that import keep their own words and settings.
export {
  ImportDialog,
  type ImportDialogProps,
  type ImportDraft,
  type ImportKind,
  type ImportPreview,
  type ImportWords,
} from './ImportDialog';
export type { SettingsPanelProps } from './settings-panel';
export { OpenFileButton, TEXT_FILE_TYPES, type OpenFileButtonProps } from './OpenFileButton';
export { useTextFile, type TextFileOpener } from './use-text-file';
export { useImportLauncher, type ImportLauncher, type ImportLauncherOptions } from './use-import-launcher';
export { readAsText, readTextFile, MAX_FILE_BYTES, type FileText } from './read-file';
export { ProblemTable } from './ProblemTable';
export {
  PreviewSketch,
  LISTED,
  SKETCH_HEIGHT,
  SKETCH_PAD,
  SKETCH_WIDTH,
  type PreviewSketchProps,
} from './PreviewSketch';
export { Select } from './Select';
export { DateField } from './DateField';
export { ColumnOptions } from './ColumnOptions';
export { SplitSettings } from './SplitSettings';
export { TimeSettings, type TimeSettingsProps, type TimeWords } from './TimeSettings';
export { MAX_COLUMN_CHOICES, columnCapHint, columnLabel, columnNumbers, dateNeeds } from './columns';
