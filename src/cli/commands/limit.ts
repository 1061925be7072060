/** `ledger limit`: the Directive 2000/14/EC Stage II permissible sound power level of a machine type. */
import type { Command } from '../command.ts';
import { helpText, numberFlag, parseFlags, UsageError, type FlagSpecs } from '../flags.ts';
import { FLAG_RULES } from '../flag-rules.ts';
import {
  ARTICLE_12_TYPES,
  ARTICLE_13_TYPES,
  DIRECTIVE_TEXT,
  QUANTITY_WORDS,
  article12Type,
  outsideScope,
  permissibleSoundPower,
} from '../../core/standards/directive-2000-14-ec/index.ts';

const specs: FlagSpecs = {
  type: { type: 'string', value: '<category>', help: 'equipment type (see --list)' },
  power: { type: 'string', value: '<kW>', help: 'net installed power P (electric power Pel for generators)' },
  mass: { type: 'string', value: '<kg>', help: 'mass m of a hand-held breaker' },
  width: { type: 'string', value: '<cm>', help: 'cutting width L of a mower' },
  list: { type: 'boolean', help: 'list the equipment types' },
  json: { type: 'boolean', help: 'print one JSON object' },
};

function listing(): string {
  const rows = ARTICLE_12_TYPES.map(
    (t) =>
      `  ${t.category.padEnd(32)} --${QUANTITY_WORDS[t.quantity].flag.padEnd(6)} Annex I ${t.annexI.join(', ').padEnd(16)} ${t.directiveName}`,
  );
  const marking = ARTICLE_13_TYPES.map(
    (t) => `  ${t.category.padEnd(32)} Annex I ${String(t.annexI).padEnd(16)} ${t.directiveName}`,
  );
  return [
    `Article 12 types (permissible level: Stage II, or Stage I where Stage II is indicative only; ${DIRECTIVE_TEXT}):`,
    ...rows,
    '',
    'Article 13 types (guaranteed level marked, no limit):',
    ...marking,
    '',
    'Each row’s source: ledger limit --list --json. Figures of the Article 12 table and the list of indicative types are from memory of the text; check them against the directive.',
    '',
  ].join('\n');
}

export const limitCommand: Command = {
  name: 'limit',
  summary: 'Directive 2000/14/EC permissible sound power level (Stage II)',
  help: helpText(
    'Usage: ledger limit --type <category> (--power <kW> | --mass <kg> | --width <cm>) [--json]\n       ledger limit --list',
    'The permissible guaranteed sound power level LWA of Directive 2000/14/EC (as amended by 2005/88/EC), rounded to the nearest whole dB: Stage II, or Stage I for the types whose Stage II figures are indicative only. Above a type’s Article 12 power limit (e.g. excavators < 500 kW) there is none.',
    specs,
  ),
  async run(argv, io) {
    const { values } = parseFlags(argv, specs);
    if (values.list) {
      io.out(
        values.json
          ? `${JSON.stringify({ text: DIRECTIVE_TEXT, article12: ARTICLE_12_TYPES.map((t) => ({ category: t.category, quantity: t.quantity, directiveName: t.directiveName, annexI: t.annexI, tableLine: t.tableLine, stageIIIndicative: t.stageIIIndicative === true || t.bands.some((b) => b.stageIIIndicative === true), ...(t.scope ? { scope: t.scope } : {}), source: t.source })), article13: ARTICLE_13_TYPES }, null, 2)}\n`
          : listing(),
      );
      return 0;
    }
    const category = values.type;
    if (typeof category !== 'string')
      throw new UsageError('--type: missing (give an equipment type; ledger limit --list shows them)');
    const type = article12Type(category);
    if (!type) permissibleSoundPower(category, 1); // throws the message naming the accepted types
    const words = QUANTITY_WORDS[type!.quantity];
    const given = (['power', 'mass', 'width'] as const).filter((f) => values[f] !== undefined);
    const wrong = given.find((f) => f !== words.flag);
    if (wrong)
      throw new UsageError(
        `--${wrong}: not used for ${category} (give --${words.flag} <${words.unit}>, the ${words.words})`,
      );
    const quantity = numberFlag(values, words.flag, {
      ...FLAG_RULES.directiveQuantity,
      accepted: `the ${words.words} in ${words.unit}, above 0 and up to ${FLAG_RULES.directiveQuantity.max}`,
    });
    if (quantity === undefined)
      throw new UsageError(`--${words.flag}: missing (give the ${words.words} of the ${category} in ${words.unit})`);
    // Above the type's Article 12 power limit the directive sets no permissible level: that is the
    // answer to the question asked, so it is printed and the command succeeds.
    const outside = outsideScope(type!, quantity);
    if (outside) {
      io.out(
        values.json
          ? `${JSON.stringify({ type: category, quantity: type!.quantity, value: quantity, permissibleLwaDb: null, reason: outside, source: type!.source })}\n`
          : `no permissible level\n  ${type!.directiveName} (Annex I item ${type!.annexI.join(', ')})\n  ${words.words} ${quantity} ${words.unit} ${outside}\n  Source: ${type!.source}\n`,
      );
      return 0;
    }
    const result = permissibleSoundPower(category, quantity);
    if (values.json) {
      io.out(
        `${JSON.stringify({ type: category, quantity: type!.quantity, value: quantity, permissibleLwaDb: result.levelDb, unroundedDb: Number(result.unroundedDb.toFixed(3)), stage: result.stage, working: result.working, source: result.source })}\n`,
      );
    } else {
      io.out(
        `${result.levelDb} dB\n  ${type!.directiveName} (Annex I item ${type!.annexI.join(', ')})\n  ${result.working}\n  Stage ${result.stage}\n  Source: ${result.source}\n`,
      );
    }
    return 0;
  },
};
