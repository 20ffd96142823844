import { memo, useMemo } from 'react';
import type { Scenario } from '../../scenario/types';
import { intensityPath, type ChartFrame } from './frame';

/**
 * The lost part of each bar (from the core's per-bar loss), drawn over the
 * rainfall so what shows above it is the excess. `partMm`, when given, is a
 * part of the loss drawn in its own shade at the bottom (the initial loss).
 */
export const LossLayer = memo(function LossLayer({
  frame,
  storm,
  lossMm,
  partMm,
}: {
  frame: ChartFrame;
  storm: Scenario['storm'];
  lossMm: Float64Array;
  partMm: Float64Array | null;
}) {
  const loss = useMemo(() => intensityPath(frame, lossMm, storm.durationsH), [frame, storm, lossMm]);
  const part = useMemo(() => (partMm ? intensityPath(frame, partMm, storm.durationsH) : null), [frame, storm, partMm]);
  return (
    <g>
      <path className="layer layer--loss" d={loss} data-layer="loss" />
      {part !== null ? <path className="layer layer--part" d={part} data-layer="loss-part" /> : null}
    </g>
  );
});
