/**
 * The one error type the core throws for bad input. It always names where the
 * problem is: a field (`depthsMm`, `rateMmH`, …) and, for per-bar data, the bar
 * index (0-based in code, shown 1-based to people by `message`).
 */
export class InputError extends Error {
  override readonly name = 'InputError';
  readonly field: string;
  readonly index: number | undefined;

  constructor(field: string, message: string, index?: number) {
    super(message);
    this.field = field;
    this.index = index;
  }
}

export function isInputError(error: unknown): error is InputError {
  return error instanceof InputError;
}

/** What `attempt` gives back: the value, or the InputError the work threw. */
export type Attempt<T> = { readonly ok: true; readonly value: T } | { readonly ok: false; readonly error: InputError };

/**
 * Runs `work` and hands back its value or the InputError it threw, as a value:
 * the one place a refusal of bad input is caught. Any other error is a defect
 * and is thrown on.
 */
export function attempt<T>(work: () => T): Attempt<T> {
  try {
    return { ok: true, value: work() };
  } catch (error) {
    if (isInputError(error)) return { ok: false, error };
    throw error;
  }
}
