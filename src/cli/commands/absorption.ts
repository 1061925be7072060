/**
 * `ledger absorption`: atmospheric absorption α (ISO 9613-1:1993) in the eight octave bands,
 * at their exact mid-band frequencies.
 */
import type { Command } from '../command.ts';
import { helpText, numberFlag, parseFlags, requiredNumber, type FlagSpecs } from '../flags.ts';
import { FLAG_RULES } from '../flag-rules.ts';
import { OCTAVE_BANDS_NOMINAL_HZ } from '../../core/octave-bands.ts';
import { octaveBandAbsorptionDbPerKm, REFERENCE_PRESSURE_KPA } from '../../core/standards/iso9613-1-1993.ts';
import { rounded, withFlagNames } from './level.ts';

const specs: FlagSpecs = {
  temperature: { type: 'string', value: '<°C>', help: 'air temperature, -20 to 50 (required)' },
  humidity: { type: 'string', value: '<%>', help: 'relative humidity, 10 to 100 (required)' },
  pressure: {
    type: 'string',
    value: '<kPa>',
    help: `atmospheric pressure, above 0 to 200 (default ${REFERENCE_PRESSURE_KPA})`,
  },
  json: { type: 'boolean', help: 'print one JSON object keyed by nominal band, "63" … "8000", in dB/km' },
};

const usage = 'Usage: ledger absorption --temperature <°C> --humidity <%> [--pressure <kPa>] [--json]';
const summary = 'Atmospheric absorption α in dB/km for the eight octave bands (ISO 9613-1:1993).';

export const absorptionCommand: Command = {
  name: 'absorption',
  summary,
  help:
    helpText(usage, summary, specs) +
    '\nα is evaluated at the exact mid-band frequencies 1000·10^(0.3k) Hz, as ISO 9613-2:1996 Table 2 is.\n',
  async run(argv, io) {
    const { values } = parseFlags(argv, specs);
    const temperature = requiredNumber(values, 'temperature', FLAG_RULES.temperatureC);
    const humidity = requiredNumber(values, 'humidity', FLAG_RULES.humidityPct);
    const pressure = numberFlag(values, 'pressure', FLAG_RULES.pressureKPa) ?? REFERENCE_PRESSURE_KPA;
    const alpha = withFlagNames({ temperature: '--temperature', humidity: '--humidity', pressure: '--pressure' }, () =>
      octaveBandAbsorptionDbPerKm(temperature, humidity, pressure),
    );
    if (values.json) {
      const out: Record<string, number> = {};
      OCTAVE_BANDS_NOMINAL_HZ.forEach((f, i) => (out[String(f)] = rounded(alpha[i] as number, 4)));
      io.out(`${JSON.stringify(out)}\n`);
      return 0;
    }
    const lines = [`Atmospheric absorption at ${temperature} °C, ${humidity} % RH, ${pressure} kPa (ISO 9613-1:1993):`];
    OCTAVE_BANDS_NOMINAL_HZ.forEach((f, i) =>
      lines.push(`  ${String(f).padStart(5)} Hz  ${(alpha[i] as number).toPrecision(3).padStart(7)} dB/km`),
    );
    io.out(`${lines.join('\n')}\n`);
    return 0;
  },
};
