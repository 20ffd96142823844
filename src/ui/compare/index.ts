// Pinned scenarios compared side by side.

export { ComparePanel } from './ComparePanel';
export { difference } from './difference';
