export {
  NUMBER_FORMAT_KEY,
  chooseNumberFormat,
  currentNumberFormat,
  formatForLanguage,
  startNumberFormat,
  useNumberFormat,
  type PreferenceStorage,
} from './preference';
export { NumberFormatPicker } from './NumberFormatPicker';
