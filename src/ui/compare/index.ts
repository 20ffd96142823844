// Pinned scenarios compared side by side.
import './compare.css';

export { ComparePanel } from './ComparePanel';
export { createPinBoard, MAX_PINS, PINS_KEY } from './pins';
export { difference } from './difference';
