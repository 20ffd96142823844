// Pinned scenarios compared side by side.

export { ComparePanel } from './ComparePanel';
export { PinButton } from './PinButton';
export { createPinBoard, MAX_PINS, PINS_KEY, type Pin, type PinBoard, type PinState } from './pins';
export { commonFrames } from './common-frame';
export { difference, type Difference } from './difference';
export { totalsOf, type Totals } from './totals';
