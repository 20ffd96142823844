import { InputError } from '../errors';
import { validateStorm, type Storm } from '../storm';
import { stepCount } from './steps';

export interface UniformStormOptions {
  /** Total rainfall depth, mm. */
  readonly depthMm: number;
  /** Total storm duration, h. */
  readonly durationH: number;
  /** Time step (bar duration), h; must divide the duration. */
  readonly stepH: number;
  readonly startIso?: string;
}

/**
 * A storm of constant intensity: `depthMm` spread evenly over bars of one
 * step. Throws InputError naming `depthMm`, `durationH` or `stepH`.
 */
export function uniformStorm(options: UniformStormOptions): Storm {
  const { depthMm, durationH, stepH } = options;
  if (typeof depthMm !== 'number' || !Number.isFinite(depthMm) || !(depthMm >= 0)) {
    throw new InputError(
      'depthMm',
      `The storm depth must be a finite number of millimetres, 0 or more (got ${String(depthMm)}).`,
    );
  }
  const n = stepCount(durationH, stepH);
  const storm: Storm = {
    durationsH: new Float64Array(n).fill(durationH / n),
    depthsMm: new Float64Array(n).fill(depthMm / n),
    ...(options.startIso !== undefined ? { startIso: options.startIso } : {}),
  };
  validateStorm(storm);
  return storm;
}
