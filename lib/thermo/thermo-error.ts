/**
 * Typed errors of the thermodynamic property functions. They name the offending field and the limit,
 * so a caller at a boundary (CLI, service) can turn them into a `{ ok: false, error }` value without
 * showing a stack trace.
 */
export type ThermoErrorCode = "not-finite" | "below-minimum" | "above-maximum" | "missing-field";

export class ThermoInputError extends Error {
  readonly code: ThermoErrorCode;
  readonly field: string;
  readonly value: number | undefined;
  readonly limit: number | undefined;

  constructor(code: ThermoErrorCode, field: string, value: number | undefined, limit: number | undefined, message: string) {
    super(message);
    this.name = "ThermoInputError";
    this.code = code;
    this.field = field;
    this.value = value;
    this.limit = limit;
  }
}

/** Throws a ThermoInputError unless `value` is finite and within [minimum, maximum]. */
export function requireInRange(field: string, value: number, minimum: number, maximum: number, unit: string): void {
  if (!Number.isFinite(value)) {
    throw new ThermoInputError("not-finite", field, value, undefined, `${field} must be a finite number (got ${value})`);
  }
  if (value < minimum) {
    throw new ThermoInputError("below-minimum", field, value, minimum, `${field} = ${value} ${unit} is below the minimum ${minimum} ${unit}`);
  }
  if (value > maximum) {
    throw new ThermoInputError("above-maximum", field, value, maximum, `${field} = ${value} ${unit} is above the maximum ${maximum} ${unit}`);
  }
}
