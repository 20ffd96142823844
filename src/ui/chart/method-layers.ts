import { methodNumber, methodSpec, numericParam, withSpec, type LossMethod, type NumericParam } from '../../core';

/**
 * What the chart draws for a method beyond rain, loss and excess, read from
 * the method's own spec (src/core/loss/methods.ts), so a new method brings
 * its line and shade with its entry there (its capacity curve: capacity.ts).
 */

/** The loss-rate line a method draws (its spec's rateParam) and the rate it holds now; null for methods with none. */
export function rateLine(
  method: LossMethod,
): { readonly param: NumericParam; readonly valueMmH: number | undefined } | null {
  const key = methodSpec(method.kind).rateParam;
  const param = key === undefined ? undefined : numericParam(method.kind, key);
  return param ? { param, valueMmH: methodNumber(method, param.key) } : null;
}

/** The part of the loss drawn in its own shade (its spec's lossPart): the label, and the variant that computes it alone. */
export function lossPartOf(method: LossMethod): { readonly label: string; readonly method: LossMethod } | null {
  return withSpec(method, (spec, m) =>
    spec.lossPart ? { label: spec.lossPart.label, method: spec.lossPart.variant(m) } : null,
  );
}
