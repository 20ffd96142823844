import { splitEvents, type RecordEvent, type Storm } from '../core';
import { memoLast } from './memo';

/**
 * The events of a long gauge record (core `splitEvents`) for the record view,
 * derived here and remembered while the record and the two settings are the
 * same: a re-render for a pick or a typed field does not split 10⁶ bars again.
 */
export const recordEvents: (storm: Storm | null, minDryH: number, minDepthMm: number) => readonly RecordEvent[] =
  memoLast((storm: Storm | null, minDryH: number, minDepthMm: number) =>
    storm ? splitEvents(storm, { minDryH, minDepthMm }) : [],
  );
