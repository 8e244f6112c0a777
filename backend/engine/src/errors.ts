/**
 * The one error the engine throws for input it cannot compute with. `field` is the dotted path of
 * the offending input (for example `house.widthM`) so the API can answer 422 naming it.
 */
export class EngineInputError extends Error {
  constructor(
    public readonly field: string,
    message: string,
  ) {
    super(message);
    this.name = 'EngineInputError';
  }
}

/** Throws EngineInputError unless `value` is a finite number within [min, max]. */
export function requireInRange(field: string, value: unknown, min: number, max: number): number {
  if (typeof value !== 'number' || !Number.isFinite(value)) {
    throw new EngineInputError(field, `${field} must be a number`);
  }
  if (value < min || value > max) {
    throw new EngineInputError(field, `${field} must be between ${min} and ${max}`);
  }
  return value;
}
