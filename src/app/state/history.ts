/**
 * Undo and redo over immutable snapshots. Every edit pushes the state before it; undo
 * swaps back, redo forward. Snapshots share structure, so a step costs a reference.
 */
export class History<T> {
  #past: T[] = [];
  #future: T[] = [];
  readonly limit: number;

  /** @param limit the most steps kept; the oldest are dropped first. */
  constructor(limit = 200) {
    this.limit = limit;
  }

  /** Records `before` as the state an undo returns to, and forgets what could be redone. */
  push(before: T): void {
    this.#past.push(before);
    if (this.#past.length > this.limit) this.#past.shift();
    this.#future = [];
  }

  /** The state to return to, given the current one; undefined when there is nothing to undo. */
  undo(current: T): T | undefined {
    const before = this.#past.pop();
    if (before === undefined) return undefined;
    this.#future.push(current);
    return before;
  }

  /** The state to go forward to, given the current one; undefined when there is nothing to redo. */
  redo(current: T): T | undefined {
    const after = this.#future.pop();
    if (after === undefined) return undefined;
    this.#past.push(current);
    return after;
  }

  get canUndo(): boolean {
    return this.#past.length > 0;
  }

  get canRedo(): boolean {
    return this.#future.length > 0;
  }

  clear(): void {
    this.#past = [];
    this.#future = [];
  }
}
