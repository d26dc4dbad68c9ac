/**
 * Error classes of Loomline's public entry points (STYLE.md §6): numerical kernels do not check
 * their arguments; entry points validate once and throw these, with a short message naming the
 * field, the value given and the allowed range.
 */

/** A numeric input outside its allowed range, or not a finite number. */
export class InputRangeError extends RangeError {
  readonly field: string;
  readonly allowed: string;
  constructor(field: string, value: unknown, allowed: string) {
    super(`${field} = ${formatValue(value)} is out of range: allowed ${allowed}`);
    this.name = 'InputRangeError';
    this.field = field;
    this.allowed = allowed;
  }
}

/** An input that is malformed in a way other than range (wrong type, unknown key, bad structure). */
export class InputError extends Error {
  readonly field: string;
  constructor(field: string, message: string) {
    super(field ? `${field}: ${message}` : message);
    this.name = 'InputError';
    this.field = field;
  }
}

function formatValue(value: unknown): string {
  if (typeof value === 'number') return Number.isNaN(value) ? 'NaN' : String(value);
  if (typeof value === 'string') return JSON.stringify(value);
  try {
    return JSON.stringify(value) ?? String(value);
  } catch {
    return String(value);
  }
}

/** Throws InputRangeError unless value is a finite number within [min, max]. */
export function requireInRange(field: string, value: number, min: number, max: number, unit = ''): number {
  if (typeof value !== 'number' || !Number.isFinite(value) || value < min || value > max) {
    throw new InputRangeError(field, value, `${min}..${max}${unit ? ' ' + unit : ''}`);
  }
  return value;
}
