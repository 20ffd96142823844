import { InputError } from '../errors';
import { totalDepthMm, validateStorm, type Storm } from '../storm';
import { fmt } from './format';

/**
 * The same storm shape with every bar multiplied by one factor, so that the
 * total is `depthMm`: the usual way to carry an observed or design pattern
 * to another depth (common practice). Durations and start are kept; the
 * input is not changed. Throws InputError naming `depthMm`, or the storm's
 * own field, and for a dry storm asked to hold rain (it has no shape to
 * scale).
 */
export function scaleStormToDepth(storm: Storm, depthMm: number): Storm {
  validateStorm(storm);
  if (typeof depthMm !== 'number' || !Number.isFinite(depthMm) || !(depthMm >= 0)) {
    throw new InputError(
      'depthMm',
      `The new total depth must be a finite number of millimetres, 0 or more (got ${String(depthMm)}).`,
    );
  }
  const total = totalDepthMm(storm);
  if (total === 0 && depthMm > 0) {
    throw new InputError(
      'depthMm',
      `The storm has no rain, so it has no pattern to scale to ${fmt(depthMm)} mm; use a uniform or design storm instead.`,
    );
  }
  const n = storm.depthsMm.length;
  const depths = new Float64Array(n);
  // Each bar's share of the total (≤ 1) times the new depth: a single factor
  // depthMm / total would overflow for a storm of vanishing total depth.
  if (total > 0) for (let k = 0; k < n; k++) depths[k] = ((storm.depthsMm[k] as number) / total) * depthMm;
  return {
    durationsH: Float64Array.from(storm.durationsH),
    depthsMm: depths,
    ...(storm.startIso !== undefined ? { startIso: storm.startIso } : {}),
  };
}
