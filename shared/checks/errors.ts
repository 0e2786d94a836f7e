/**
 * The one error the check kit throws for bad figures. It names the input (or kit-function argument)
 * at fault, so the API can answer 400 with that field and a screen can mark it.
 */
export class CheckRangeError extends Error {
  /** The input name (CheckInputSpec.name) or kit-function argument name that is out of range. */
  readonly field: string;

  constructor(field: string, message: string) {
    super(message);
    this.name = 'CheckRangeError';
    this.field = field;
    // Keeps `instanceof` working when a transpiler lowers classes (extending Error loses the prototype).
    Object.setPrototypeOf(this, new.target.prototype);
  }
}

export function isCheckRangeError(e: unknown): e is CheckRangeError {
  return e instanceof CheckRangeError || (e instanceof Error && e.name === 'CheckRangeError' && 'field' in e);
}
