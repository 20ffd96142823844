// Cutting a long gauge record into events for the event set (issue 14). Loaded when its tab is first opened.
import './record.css';

export { RecordView } from './RecordView';
