import { memo, useMemo } from 'react';
import type { Storm } from '../../core';
import { rainPath, type ChartFrame } from './frame';

/**
 * Every bar at its full rainfall intensity, in the excess colour; the loss
 * layer is drawn over it. Depends on the storm and the frame only: memoised
 * apart from the moving line, so a drag never rebuilds it.
 */
export const RainLayer = memo(function RainLayer({ frame, storm }: { frame: ChartFrame; storm: Storm }) {
  const d = useMemo(() => rainPath(frame, storm), [frame, storm]);
  return <path className="layer layer--excess" d={d} data-layer="rain" />;
});
