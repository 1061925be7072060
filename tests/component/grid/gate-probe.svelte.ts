/** A gate between a counter and a reader that counts how often it runs (for gate.test.ts). */
import { gate } from '../../../src/app/grid/gate.svelte.ts';

export function gateProbe(): { set(n: number): void; readonly shown: string; readonly runs: number; stop(): void } {
  let n = $state(0);
  let runs = 0;
  let shown = '';
  const stop = $effect.root(() => {
    const parity = gate(() => (n % 2 === 0 ? 'even' : 'odd'));
    $effect.pre(() => {
      runs++;
      shown = parity.value;
    });
  });
  return {
    set: (value) => (n = value),
    get shown() {
      return shown;
    },
    get runs() {
      return runs;
    },
    stop,
  };
}
