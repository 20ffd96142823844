// What the rainfall and streamflow imports share: the paste-and-check dialog,
// the controls that correct its guesses, the preview sketch, and opening a
// text file. The screens that import keep their own words and settings.
export { ImportDialog, type ImportDraft, type ImportKind, type ImportWords } from './ImportDialog';
export type { SettingsPanelProps } from './settings-panel';
export { OpenFileButton } from './OpenFileButton';
export { useImportLauncher } from './use-import-launcher';
export { readAsText } from './read-file';
export { PreviewSketch, LISTED, SKETCH_HEIGHT, SKETCH_PAD, SKETCH_WIDTH } from './PreviewSketch';
export { Select } from './Select';
export { ColumnOptions } from './ColumnOptions';
export { SplitSettings } from './SplitSettings';
export { TimeSettings, type TimeWords } from './TimeSettings';
export { MAX_COLUMN_CHOICES, columnCapHint, columnNumbers } from './columns';
