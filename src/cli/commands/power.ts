/**
 * `ledger power`: sound power in watts ↔ sound power level in dB re 1 pW.
 */
import type { Command } from '../command.ts';
import { helpText, numberFlag, parseFlags, UsageError, type FlagSpecs } from '../flags.ts';
import { FLAG_RULES } from '../flag-rules.ts';
import { lwFromWatts, wattsFromLw } from '../../core/power.ts';
import { withFlagNames } from './level.ts';

const specs: FlagSpecs = {
  watts: { type: 'string', value: '<W>', help: 'sound power in watts: prints the level in dB re 1 pW' },
  lw: { type: 'string', value: '<dB>', help: 'sound power level in dB re 1 pW: prints watts' },
};

/** Watts with four significant figures; scientific notation outside 0.001 … 1 000 000. */
export function formatWatts(watts: number): string {
  return watts >= 1e-3 && watts < 1e6 ? String(Number(watts.toPrecision(4))) : watts.toExponential(3);
}

const usage = 'Usage: ledger power (--watts <W> | --lw <dB>)';
const summary = 'Sound power in watts to its level in dB re 1 pW, or back.';

export const powerCommand: Command = {
  name: 'power',
  summary,
  help: helpText(usage, summary, specs) + '\nLw = 10·lg(W / 1 pW); 1 W is 120 dB.\n',
  async run(argv, io) {
    const { values } = parseFlags(argv, specs);
    const watts = numberFlag(values, 'watts', FLAG_RULES.watts);
    const lw = numberFlag(values, 'lw', FLAG_RULES.powerLevelDb);
    if (watts === undefined && lw === undefined)
      throw new UsageError('--watts: missing (give --watts <W> or --lw <dB>)');
    if (watts !== undefined && lw !== undefined)
      throw new UsageError('--lw: given together with --watts (give one of them)');
    if (watts !== undefined) {
      const level = withFlagNames({ 'sound power': '--watts' }, () => lwFromWatts(watts));
      io.out(`${level.toFixed(1)} dB re 1 pW\n`);
    } else {
      const w = withFlagNames({ 'sound power level': '--lw' }, () => wattsFromLw(lw as number));
      io.out(`${formatWatts(w)} W\n`);
    }
    return 0;
  },
};
