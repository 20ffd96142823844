/**
 * The caution shown once in the app and carried by every saved or exported
 * scenario, so that a file passed on still says what the numbers are for.
 */
export const CAUTION_TEXT =
  'Estimates are for screening and calibration support. Loss parameters vary between storms and catchments. ' +
  'Designs that affect safety or property must follow the local drainage criteria and be reviewed by a licensed professional.';
