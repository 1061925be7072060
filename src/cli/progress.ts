/**
 * Progress of long work (`optimise`, `export`) on one line of standard error, rewritten in place: only when standard
 * error is a terminal, so files and pipes get nothing but the results and the messages.
 */
import { escapeControls } from './terminal-text.ts';

/** A writer of the progress line to `stream`; a step of `undefined` clears the line. Redraws at most every 100 ms. */
export function progressLine(stream: {
  write(text: string): unknown;
}): (step: string | undefined, fraction: number) => void {
  let last = 0;
  let shown = false;
  return (step, fraction) => {
    if (step === undefined) {
      if (shown) stream.write('\r\u001b[K');
      shown = false;
      return;
    }
    const now = Date.now();
    if (shown && now - last < 100 && fraction < 1) return;
    last = now;
    shown = true;
    const pct = Math.max(0, Math.min(100, Math.round(fraction * 100)));
    stream.write(`\r\u001b[K${String(pct).padStart(3)} %  ${escapeControls(step).slice(0, 100)}`);
  };
}
