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
