// What the rainfall and streamflow imports share: the controls that correct
// their guesses and the preview sketch. The screens that import keep their
// own words and settings.
export { PreviewSketch, LISTED, SKETCH_HEIGHT, SKETCH_PAD, SKETCH_WIDTH, type PreviewSketchProps } from './PreviewSketch';
export type { SettingsPanelProps } from './settings-panel';
export { Select } from './Select';
export { DateField } from './DateField';
export { ColumnOptions } from './ColumnOptions';
export { SplitSettings } from './SplitSettings';
export { TimeSettings, type TimeSettingsProps, type TimeWords } from './TimeSettings';
export { columnLabel, columnNumbers, dateNeeds } from './columns';
