/**
 * Input errors raised by the acoustic core and the ledger.
 *
 * Every check in the core throws an {@link InputError} whose message follows one
 * pattern: what was wrong, where, and what is accepted —
 * `distance: -3 is out of range (use a distance in metres greater than 0)`.
 * The command line prints the message alone (no stack trace) and exits with code 2;
 * the app shows it beside the cell that holds the value.
 */
export class InputError extends Error {
  /** The input's name as the user knows it (a flag, a column, a JSON path). */
  readonly input: string;
  /** The offending value, kept exactly as given. */
  readonly value: unknown;
  /** What would have been accepted, in words. */
  readonly accepted: string;

  constructor(input: string, value: unknown, problem: string, accepted: string) {
    super(`${input}: ${describeValue(value)} ${problem} (${accepted})`);
    this.name = 'InputError';
    this.input = input;
    this.value = value;
    this.accepted = accepted;
  }
}

/** Shows a value the way a user typed it: strings quoted, numbers as written. */
export function describeValue(value: unknown): string {
  if (typeof value === 'string') return JSON.stringify(value);
  if (typeof value === 'number') return Number.isNaN(value) ? 'NaN' : String(value);
  if (value === undefined) return 'nothing';
  if (value === null) return 'null';
  try {
    return JSON.stringify(value) ?? String(value);
  } catch {
    return String(value);
  }
}

/**
 * The same error with the input named as the caller knows it (a flag, a column, a cell),
 * e.g. "distance" becomes "--distance" or "Row 14, distance". Value, problem and accepted
 * values are kept.
 */
export function renameInput(error: InputError, input: string): InputError {
  const head = `${error.input}: ${describeValue(error.value)} `;
  const tail = ` (${error.accepted})`;
  const problem =
    error.message.startsWith(head) && error.message.endsWith(tail)
      ? error.message.slice(head.length, error.message.length - tail.length)
      : 'is not accepted';
  return new InputError(input, error.value, problem, error.accepted);
}
