/**
 * `ledger compare <register-or-project> --type <t> --criterion <dB> --on-time <%>
 * --days-per-year <n> [--json]`: the buyer's comparison without a site — whole-life cost per
 * working year (owned and hired), directive margin, noise footprint, operator L_EX,8h, and
 * each machine against a reference; machines no other beats on cost and LWA marked (*).
 * Without --type, machines are compared type by type (a compressor is not measured against
 * an excavator), one table per type.
 */
import type { Command } from '../command.ts';
import { helpText, numberFlag, parseFlags, UsageError, type FlagSpecs } from '../flags.ts';
import { compareMachines, type Comparison, type CompareOptions } from '../../ledger/register/compare.ts';
import { machineType } from '../../ledger/register/fleet-view.ts';
import { FOOTPRINT_METHOD } from '../../ledger/register/footprint.ts';
import type { Register } from '../../ledger/register/model.ts';
import { formatMoney } from '../../ledger/costs/money.ts';
import { loadRegisterOrProject } from '../register-files.ts';
import { FLAG_RULES } from '../flag-rules.ts';

const specs: FlagSpecs = {
  type: {
    type: 'string',
    value: '<directive type>',
    help: 'compare machines of this Directive 2000/14/EC type (or category); default: every type, one table each',
  },
  machines: {
    type: 'string',
    value: '<id,id,…>',
    help: 'compare exactly these machines (any types), in this order, in one table',
  },
  criterion: { type: 'string', value: '<dB>', help: 'footprint criterion L_Aeq over the working day (default 65)' },
  'on-time': { type: 'string', value: '<%>', help: 'share of the day the machine works at full power (default 100)' },
  'days-per-year': { type: 'string', value: '<n>', help: 'working days a year (default: the register’s, else 200)' },
  hours: { type: 'string', value: '<h>', help: 'operator hours a day for L_EX,8h (default: the register’s, else 8)' },
  reference: {
    type: 'string',
    value: '<id>',
    help: 'the machine the others are measured against (default: the loudest of its type)',
  },
  cost: {
    type: 'string',
    value: '<owned|hired>',
    help: 'which whole-life cost the marks and the reference comparison use (default owned)',
  },
  json: { type: 'boolean', help: 'print one JSON object' },
};
const summary =
  'compare machines without a site: whole-life cost, directive margin, noise footprint, operator exposure';

const f1 = (x: number | undefined) => (x === undefined || !Number.isFinite(x) ? '—' : x.toFixed(1));
const finiteOrNull = (_k: string, v: unknown) => (typeof v === 'number' && !Number.isFinite(v) ? null : v);

/** The types present in the register, in order of first appearance. */
function typesOf(register: Register): string[] {
  return [...new Set(register.machines.map(machineType))];
}

function table(c: Comparison, heading: string): string[] {
  const money = (x: number) => (Number.isFinite(x) ? formatMoney(Math.round(x), c.currency) : '—');
  const lines = [
    heading,
    `  ${'id'.padEnd(6)}${'machine'.padEnd(42)}${'LWA'.padStart(6)}${'margin'.padStart(8)}${'r, m'.padStart(7)}${'area, m²'.padStart(10)}${'owned/yr'.padStart(11)}${'hired/yr'.padStart(11)}${'dB less'.padStart(8)}${'dB/1000'.padStart(8)}${'L_EX,8h'.padStart(8)}`,
  ];
  for (const r of c.rows) {
    const a = r.againstReference;
    const label = r.label.length > 40 ? `${r.label.slice(0, 39)}…` : r.label;
    const area = Number.isFinite(r.footprint.areaM2) ? Math.round(r.footprint.areaM2).toLocaleString('en-GB') : '—';
    lines.push(
      `${r.nonDominated ? '*' : ' '} ${r.machineId.padEnd(6)}${label.padEnd(42)}${(f1(r.lwaDb) + (r.standIn ? '!' : '')).padStart(6)}${f1(r.directiveMarginDb).padStart(8)}` +
        `${f1(r.footprint.radiusM).padStart(7)}${area.padStart(10)}${money(r.cost.ownedPerYear).padStart(11)}${money(r.cost.hiredPerYear).padStart(11)}` +
        `${(r.isReference ? 'ref' : f1(a?.dbReduction)).padStart(8)}${(a?.freeWin ? 'free' : f1(a?.dbPerThousand)).padStart(8)}${f1(r.exposure?.dailyExposureDb).padStart(8)}`,
    );
  }
  return lines;
}

export const compareCommand: Command = {
  name: 'compare',
  summary,
  help:
    helpText(
      'Usage: ledger compare <register.json|project.json> [--type <directive type> | --machines <id,…>] --criterion <dB> --on-time <%> --days-per-year <n> [--json]',
      summary,
      specs,
    ) + `\n${FOOTPRINT_METHOD}\n`,
  async run(argv, io) {
    const { values, positionals } = parseFlags(argv, specs, 1);
    const file = positionals[0];
    if (file === undefined) throw new UsageError('missing the register or project file (give its path)');
    const cost = values.cost ?? 'owned';
    if (cost !== 'owned' && cost !== 'hired')
      throw new UsageError(`--cost: ${JSON.stringify(cost)} is not accepted (use owned or hired)`);
    const days = numberFlag(values, 'days-per-year', FLAG_RULES.daysPerYear);
    const hours = numberFlag(values, 'hours', FLAG_RULES.operatorHours);
    const criterionDb = numberFlag(values, 'criterion', FLAG_RULES.criterionDb) ?? 65;
    const onTimePct = numberFlag(values, 'on-time', FLAG_RULES.onTimePct) ?? 100;
    const register = await loadRegisterOrProject(file, io, 'compare');
    if (!register) return 2;
    const type = typeof values.type === 'string' ? values.type : undefined;
    const reference = typeof values.reference === 'string' ? values.reference : undefined;
    if (reference !== undefined && !register.machines.some((m) => m.id === reference)) {
      throw new UsageError(
        `--reference: ${JSON.stringify(reference)} is not a machine of the file (use one of ${register.machines.map((m) => m.id).join(', ')})`,
      );
    }
    const base: CompareOptions = {
      criterionDb,
      onTimePct,
      ...(days !== undefined ? { workingDaysPerYear: days } : {}),
      ...(hours !== undefined ? { operatorHoursPerDay: hours } : {}),
      costBasis: cost,
    };
    const compareType = (t: string) => {
      const machineIds = register.machines.filter((m) => machineType(m) === t).map((m) => m.id);
      const refHere = reference !== undefined && machineIds.includes(reference);
      return compareMachines(register, { ...base, machineIds, ...(refHere ? { referenceId: reference } : {}) });
    };
    const ids =
      typeof values.machines === 'string'
        ? values.machines
            .split(',')
            .map((x) => x.trim())
            .filter((x) => x !== '')
        : undefined;
    if (ids !== undefined) {
      if (type !== undefined) throw new UsageError('--machines: give either --machines or --type, not both');
      const unknown = ids.filter((id) => !register.machines.some((m) => m.id === id));
      if (ids.length === 0 || unknown.length)
        throw new UsageError(
          `--machines: ${ids.length === 0 ? 'no id given' : `${unknown.map((u) => JSON.stringify(u)).join(', ')} not in the file`} (use ids of the file separated by commas, e.g. ${register.machines
            .slice(0, 2)
            .map((m) => m.id)
            .join(',')})`,
        );
      if (reference !== undefined && !ids.includes(reference))
        throw new UsageError(
          `--reference: ${JSON.stringify(reference)} is not among the machines compared (use one of ${ids.join(', ')})`,
        );
      const c = compareMachines(register, {
        ...base,
        machineIds: ids,
        ...(reference !== undefined ? { referenceId: reference } : {}),
      });
      if (values.json) {
        io.out(`${JSON.stringify({ ...c, method: FOOTPRINT_METHOD }, finiteOrNull, 2)}\n`);
        return 0;
      }
      io.out([...head(c), ...table(c, 'the machines asked for:'), ...foot()].join('\n'));
      return 0;
    }
    if (type !== undefined) {
      const c = compareMachines(register, {
        ...base,
        type,
        ...(reference !== undefined ? { referenceId: reference } : {}),
      });
      if (c.rows.length === 0)
        throw new UsageError(
          `--type: ${JSON.stringify(type)} matches no machine (use one of ${typesOf(register).join(', ')})`,
        );
      if (reference !== undefined && c.referenceId !== reference)
        throw new UsageError(
          `--reference: ${JSON.stringify(reference)} is not among the machines compared (use one of ${c.rows.map((r) => r.machineId).join(', ')})`,
        );
      if (values.json) {
        io.out(`${JSON.stringify({ ...c, method: FOOTPRINT_METHOD }, finiteOrNull, 2)}\n`);
        return 0;
      }
      io.out([...head(c), ...table(c, `${type}:`), ...foot()].join('\n'));
      return 0;
    }
    const types = typesOf(register);
    if (types.length === 0) {
      io.err(
        `ledger compare: ${file} holds no machines; nothing to compare (add machines, e.g. with ledger register import).\n`,
      );
      return 2;
    }
    const byType = types.map((t) => ({ type: t, comparison: compareType(t) }));
    if (values.json) {
      io.out(
        `${JSON.stringify({ byType: byType.map((g) => ({ type: g.type, ...g.comparison })), method: FOOTPRINT_METHOD }, finiteOrNull, 2)}\n`,
      );
      return 0;
    }
    const first = byType[0]!.comparison;
    const lines = [...head(first, register.machines.length)];
    for (const g of byType) lines.push(...table(g.comparison, `${g.type} (${g.comparison.rows.length}):`), '');
    io.out([...lines.slice(0, -1), ...foot()].join('\n'));
    return 0;
  },
};

function head(c: Comparison, count = c.rows.length): string[] {
  return [
    `Comparison of ${count} machine${count === 1 ? '' : 's'}: criterion ${c.criterionDb} dB L_Aeq at ${c.onTimePct} % on-time, ${c.workingDaysPerYear} working days a year, operator ${c.operatorHoursPerDay} h a day; cost compared: ${c.costBasis}.`,
  ];
}

function foot(): string[] {
  return [
    '',
    '* no other machine of its table is both cheaper (or as cheap) and quieter (or as quiet). ! the permissible level stands in for a missing LWA.',
    'ref = the machine the others are measured against; margin = permissible level (Directive 2000/14/EC) − guaranteed LWA; dB/1000 = dB quieter than the reference per 1,000 of extra whole-life cost a year; free = quieter and costs no more.',
    FOOTPRINT_METHOD,
    '',
  ];
}
