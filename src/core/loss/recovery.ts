import type { ChoiceParam, DrySpellRecovery, NumericParam } from './types';

/**
 * Capacity recovery in dry spells. Both Horton and Green–Ampt turn it on with
 * the same switch ("Capacity recovers in dry spells"); each has its own
 * published model:
 *
 * - Horton, at a recovery rate k_r (1/h) over each dry bar: the capacity
 *   regains its initial value f₀ as
 *     f₀ − f(t) = (f₀ − f_w)·e^(−k_r (t − t_w))
 *   from the capacity f_w where the rain stopped at t_w (the regeneration of
 *   Horton capacity during drying given by Bedient, Huber & Vieux,
 *   Hydrology and Floodplain Analysis, chapter on infiltration; equation
 *   recalled from memory). When rain returns, the capacity falls again from
 *   the point of the decay curve where f equals the recovered value.
 *   Splitting a dry bar into two multiplies two exponentials into one, so the
 *   result does not depend on how a dry spell is cut.
 * - Green–Ampt, with no rate of its own: the wetted zone redistributes by the
 *   equation of Smith, Corradini & Melone (1993) and the next rain starts a
 *   new wetting front, as in the Green–Ampt infiltration with redistribution
 *   of Ogden & Saghafian (1997); see green-ampt.ts and redistribution.ts.
 */

/** The loss methods whose capacity can recover in dry spells. */
export type RecoveringKind = 'horton' | 'green-ampt';

/** Recovery rate used when a method object leaves it out, 1/h (a rule of thumb, no source: see the help). */
export const DEFAULT_RECOVERY_PER_H = 0.05;

/** Highest recovery rate a calibration tries, 1/h: full recovery within seconds. */
export const RECOVERY_CEILING_PER_H = 1000;

/** The recovery rate in force, 1/h: 0 when the option is off. */
export function recoveryRatePerH(method: DrySpellRecovery): number {
  return method.recovers === true ? (method.recoveryPerH ?? DEFAULT_RECOVERY_PER_H) : 0;
}

/** The switch that turns recovery on, with its plain-words label (one entry per method that has it). */
export function recoverySwitch<K extends RecoveringKind>(help: string): ChoiceParam<K> {
  return {
    key: 'recovers' as ChoiceParam<K>['key'],
    label: 'Capacity recovers in dry spells',
    display: 'switch',
    choices: [
      { value: true, label: 'yes' },
      { value: false, label: 'no' },
    ],
    omitted: false,
    help,
  };
}

/** Horton's recovery rate parameter, taking part only while the switch is on. */
export function recoveryRateParam<K extends RecoveringKind>(help: string): NumericParam<K> {
  return {
    key: 'recoveryPerH' as NumericParam<K>['key'],
    label: 'Recovery rate k_r',
    unit: '1/h',
    min: 0,
    max: Infinity,
    step: 0.01,
    searchMax: () => RECOVERY_CEILING_PER_H,
    omitted: DEFAULT_RECOVERY_PER_H,
    activeWhen: (method) => (method as DrySpellRecovery).recovers === true,
    help,
  };
}

/**
 * Hours to win back half of what was lost at rate k_r: 1 − e^(−k_r t) = ½,
 * t = ln 2 / k_r; in words for the help text ("in 14 h"), empty at k_r = 0.
 */
export function halfRecoveryText(method: DrySpellRecovery): string {
  const rate = method.recoveryPerH ?? DEFAULT_RECOVERY_PER_H;
  if (!(rate > 0)) return '';
  const hours = Math.LN2 / rate;
  return `in ${hours < 10 ? Number(hours.toPrecision(2)) : Math.round(hours)} h`;
}
