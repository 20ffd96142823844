// What the rainfall and streamflow imports share: the controls that correct
// their guesses. The screens that import keep their own words and settings.
export type { SettingsPanelProps } from './settings-panel';
export { Select } from './Select';
export { DateField } from './DateField';
export { ColumnOptions } from './ColumnOptions';
export { SplitSettings } from './SplitSettings';
export { TimeSettings, type TimeSettingsProps, type TimeWords } from './TimeSettings';
export { columnLabel, columnNumbers, dateNeeds } from './columns';
