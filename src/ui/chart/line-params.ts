import type { LossKind, LossMethod } from '../../core';

/**
 * Methods whose loss is (partly) a constant rate draw that rate as a
 * horizontal line the user can drag: which parameter the line is.
 */
export const LINE_PARAM: Partial<Record<LossKind, string>> = {
  constant: 'rateMmH',
  'initial-continuing': 'rateMmH',
};

/**
 * A part of the loss drawn in its own shade, as the core computes it for a
 * variant of the method. For initial–continuing loss, the same method with a
 * zero continuing rate loses exactly the initial loss, bar by bar: the bars
 * (and part-bar) the initial loss removes.
 */
export interface LossPart {
  readonly label: string;
  readonly variant: (method: LossMethod) => LossMethod;
}

export const LOSS_PARTS: Partial<Record<LossKind, LossPart>> = {
  'initial-continuing': {
    label: 'Initial loss',
    variant: (m) => ({ ...m, rateMmH: 0 }) as LossMethod,
  },
};
