/**
 * `ledger back`: sound power level Lw from a sound pressure level measured at a distance,
 * Lw = Lp + 20·lg r + 10.99 − 10·lg Q (point source).
 */
import type { Command } from '../command.ts';
import { finiteResult, helpText, numberFlag, parseFlags, requiredNumber, type FlagSpecs } from '../flags.ts';
import { FLAG_RULES } from '../flag-rules.ts';
import { soundPowerFromPressureDb } from '../../core/point-source.ts';
import { withFlagNames } from './level.ts';

const specs: FlagSpecs = {
  lp: { type: 'string', value: '<dB>', help: 'sound pressure level measured at the distance (required)' },
  distance: { type: 'string', value: '<m>', help: 'distance from the machine (required)' },
  q: { type: 'string', value: '<1|2|4|8>', help: 'directivity Q: 1 free field, 2 on hard ground (default), 4, 8' },
};

const usage = 'Usage: ledger back --lp <dB> --distance <m> [--q <1|2|4|8>]';
const summary = 'Sound power level from a pressure level at a distance.';

export const backCommand: Command = {
  name: 'back',
  summary,
  help:
    helpText(usage, summary, specs) +
    '\nLw = Lp − 10·lg(Q/(4πr²)). A declared sound power (ISO 3744 family) is better than this estimate.\n',
  async run(argv, io) {
    const { values } = parseFlags(argv, specs);
    const lp = requiredNumber(values, 'lp', FLAG_RULES.pressureLevelDb);
    const distance = requiredNumber(values, 'distance', FLAG_RULES.distanceM);
    const q = numberFlag(values, 'q', FLAG_RULES.q) ?? 2;
    const lw = withFlagNames({ 'sound pressure level': '--lp', distance: '--distance', 'directivity Q': '--q' }, () =>
      soundPowerFromPressureDb(lp, distance, q),
    );
    finiteResult(
      lw,
      'distance',
      String(values.distance),
      `${FLAG_RULES.distanceM.accepted}, large enough for the result to be computed`,
    );
    io.out(`${lw.toFixed(1)} dB re 1 pW (sound power level, Q = ${q})\n`);
    return 0;
  },
};
