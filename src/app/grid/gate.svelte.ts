/**
 * A gate: a value worked out from reactive reads and held in a state of its own, written only
 * when it changes. What reads the gate depends on that one state, not on everything the value
 * was worked out from, so a change upstream that leaves the value as it was stops at the gate.
 *
 * Why: a `$derived` passes every upstream change on to whatever reads it before it knows the
 * value is unchanged, visiting each reader once per path. A grid row's cells reach the open
 * project by several paths each, so an edit among thousands of rows used to visit some
 * 70,000 links (about 5 ms) to find that most cells show what they showed before. Behind
 * gates, an edit visits each row on screen once and only the cells whose text, message or
 * selection changed.
 *
 * Call during component set-up (it makes an `$effect.pre`, which runs at once, so the value is
 * there before the markup reads it, and again before each update when what it read changed).
 */
import { untrack } from 'svelte';

export interface Gate<T> {
  readonly value: T;
}

/**
 * @param read works the value out; what it reads reactively is what the gate listens to
 * @param same when the new value counts as unchanged (default `Object.is`); an unchanged value is not written
 * @example const texts = gate(() => keep(rowTexts(columns, row))); // cells read texts.value
 */
export function gate<T>(read: () => T, same: (a: T, b: T) => boolean = Object.is): Gate<T> {
  let value = $state.raw<T>(undefined as T);
  let written = false;
  $effect.pre(() => {
    const next = read();
    if (written && untrack(() => same(value, next))) return;
    written = true;
    value = next;
  });
  return {
    get value() {
      return value;
    },
  };
}
