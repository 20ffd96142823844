// Pinned scenarios compared side by side.
import './compare.css';

export { ComparePanel } from './ComparePanel';
export { difference } from './difference';
