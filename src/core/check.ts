/**
 * Input checks shared by every core function. Each returns the value when it is
 * acceptable and throws an {@link InputError} naming the input, the value and what
 * is accepted otherwise.
 */
import { InputError } from './input-error.ts';

/** A finite number. `what` describes the accepted value, e.g. "a level in dB". */
export function finite(input: string, value: number, what = 'a finite number'): number {
  if (typeof value !== 'number' || !Number.isFinite(value)) {
    throw new InputError(input, value, 'is not a finite number', `use ${what}`);
  }
  return value;
}

/** A finite number strictly greater than zero. */
export function positive(input: string, value: number, what = 'a number greater than 0'): number {
  finite(input, value, what);
  if (value <= 0) throw new InputError(input, value, 'is out of range', `use ${what}`);
  return value;
}

/** A finite number at or above zero. */
export function nonNegative(input: string, value: number, what = 'a number of 0 or more'): number {
  finite(input, value, what);
  if (value < 0) throw new InputError(input, value, 'is out of range', `use ${what}`);
  return value;
}

/** A finite number in the closed range [min, max]. */
export function inRange(input: string, value: number, min: number, max: number, what?: string): number {
  const accepted = what ?? `a number from ${min} to ${max}`;
  finite(input, value, accepted);
  if (value < min || value > max) throw new InputError(input, value, 'is out of range', `use ${accepted}`);
  return value;
}

/** A whole number of at least `min`. */
export function wholeNumber(input: string, value: number, min = 1, what?: string): number {
  const accepted = what ?? `a whole number of ${min} or more`;
  finite(input, value, accepted);
  if (!Number.isInteger(value) || value < min) throw new InputError(input, value, 'is not accepted', `use ${accepted}`);
  return value;
}

/** One of a fixed list of values. */
export function oneOf<T>(input: string, value: T, allowed: readonly T[]): T {
  if (!allowed.includes(value)) {
    throw new InputError(input, value, 'is not accepted', `use one of ${allowed.join(', ')}`);
  }
  return value;
}
