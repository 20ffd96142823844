export {
  NUMBER_FORMAT_KEY,
  chooseNumberFormat,
  currentNumberFormat,
  formatForLanguage,
  startNumberFormat,
  useNumberFormat,
} from './preference';
export { NumberFormatPicker } from './NumberFormatPicker';
