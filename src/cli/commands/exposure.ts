/** `ledger exposure`: an operator's daily noise exposure from a level and hours of use. */
import type { Command } from '../command.ts';
import { helpText, parseFlags, requiredNumber, type FlagSpecs } from '../flags.ts';
import { FLAG_RULES } from '../flag-rules.ts';
import { exposureFor, EXPOSURE_CAUTION } from '../../ledger/checks/operator-exposure.ts';

const specs: FlagSpecs = {
  level: { type: 'string', value: '<dB(A)>', help: 'A-weighted level at the operator’s position, LpA' },
  hours: { type: 'string', value: '<h>', help: 'hours of exposure a day' },
  json: { type: 'boolean', help: 'print one JSON object' },
};

const hoursText = (h: number) =>
  h >= 24 ? 'more than 24 h' : h >= 1 ? `${h.toFixed(1)} h` : `${Math.round(h * 60)} min`;

export const exposureCommand: Command = {
  name: 'exposure',
  summary: 'operator daily noise exposure LEX,8h and the Directive 2003/10/EC values',
  help: helpText(
    'Usage: ledger exposure --level <dB(A)> --hours <h> [--json]',
    'Daily noise exposure level LEX,8h (ISO 9612:2009), the Directive 2003/10/EC action or limit value it reaches, and the time a day until LEX,8h reaches 85 dB(A).',
    specs,
  ),
  async run(argv, io) {
    const { values } = parseFlags(argv, specs);
    const level = requiredNumber(values, 'level', FLAG_RULES.operatorLpaDb);
    const hours = requiredNumber(values, 'hours', FLAG_RULES.operatorHours);
    const r = exposureFor(level, hours);
    if (values.json) {
      io.out(
        `${JSON.stringify({ level, hours, lex8h: Number(r.dailyExposureDb.toFixed(2)), reached: r.band, hoursTo85: Number(r.hoursTo85.toFixed(3)), caution: EXPOSURE_CAUTION })}\n`,
      );
    } else {
      io.out(
        `LEX,8h ${r.dailyExposureDb.toFixed(1)} dB(A): ${r.band}\nTime until 85 dB(A) is reached: ${hoursText(r.hoursTo85)} a day\n${EXPOSURE_CAUTION}\n`,
      );
    }
    return 0;
  },
};
