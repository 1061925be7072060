/**
 * `ledger level`: predicted level at a receiver for one machine, with every term.
 * Calls the core's singleMachineLevel, the same function the app's quick calculation uses.
 */
import type { Command } from '../command.ts';
import {
  finiteResult,
  flagReadRule,
  helpText,
  numberFlag,
  parseFlags,
  requiredNumber,
  separatorOf,
  UsageError,
  type FlagSpecs,
  type ParsedFlags,
} from '../flags.ts';
import { FLAG_RULES } from '../flag-rules.ts';
import { readNumberCell, type DecimalSeparator } from '../../ledger/catalogue/index.ts';
import { InputError, renameInput } from '../../core/input-error.ts';
import {
  PREDICTION_CAUTION,
  singleMachineLevel,
  type MachineScreening,
  type SingleMachineInput,
  type SingleMachineLevel,
} from '../../core/single-machine-level.ts';
import { ISO_ASSEMBLY } from '../../core/iso9613-machine-terms.ts';

/**
 * Runs a core computation and names the flag, not the core's input, in any InputError.
 * `flagOf` maps the core's input names (e.g. "distance") to flags (e.g. "--distance").
 */
export function withFlagNames<T>(flagOf: Record<string, string>, compute: () => T): T {
  try {
    return compute();
  } catch (e) {
    if (e instanceof InputError) {
      const flag = flagOf[e.input] ?? Object.entries(flagOf).find(([input]) => e.input.startsWith(`${input} `))?.[1];
      if (flag) throw renameInput(e, flag);
    }
    throw e;
  }
}

/** A number rounded for JSON output (0.01 dB). */
export function rounded(x: number, digits = 2): number {
  return Number(x.toFixed(digits));
}

const ISO_DEFAULTS = { hs: 1.5, hr: 4, ground: 0, temperature: 10, humidity: 70 } as const;

const specs: FlagSpecs = {
  lw: { type: 'string', value: '<dB>', help: 'A-weighted sound power level L_WA' },
  bands: {
    type: 'string',
    value: '<8 dB values>',
    help: 'octave-band Lw 63 Hz … 8 kHz, comma-separated: the level, or with --lw the spectrum’s shape only',
  },
  distance: { type: 'string', value: '<m>', help: 'source–receiver distance (required)' },
  method: {
    type: 'string',
    value: '<simple|iso9613-2>',
    help: 'simple: point source with Q (default); iso9613-2: ISO 9613-2:1996',
  },
  q: { type: 'string', value: '<1|2|4|8>', help: 'directivity Q for the simple method (default 2, on hard ground)' },
  'on-time': {
    type: 'string',
    value: '<percent>',
    help: 'share of the period at full power, above 0 to 100 (default 100)',
  },
  count: { type: 'string', value: '<n>', help: 'number of identical units (default 1)' },
  screening: {
    type: 'string',
    value: '<dB|word>',
    help: 'screening reduction in dB, or none, top-visible (5 dB: only the machine’s top in sight), hidden (10 dB: out of sight) (default 0)',
  },
  facade: { type: 'boolean', help: 'receiver 1 m in front of a façade: +3 dB' },
  'hours-worked': {
    type: 'string',
    value: '<h>',
    help: 'hours worked inside the assessment period, with --period-hours: 10·lg(worked / period)',
  },
  'period-hours': { type: 'string', value: '<h>', help: 'length of the assessment period, with --hours-worked' },
  penalty: { type: 'string', value: '<dB>', help: 'character penalty for tonal or impulsive noise (default 0)' },
  hs: { type: 'string', value: '<m>', help: `iso9613-2: source height (default ${ISO_DEFAULTS.hs})` },
  hr: { type: 'string', value: '<m>', help: `iso9613-2: receiver height (default ${ISO_DEFAULTS.hr})` },
  ground: {
    type: 'string',
    value: '<G>',
    help: `iso9613-2: ground factor, 0 hard … 1 porous (default ${ISO_DEFAULTS.ground})`,
  },
  temperature: {
    type: 'string',
    value: '<°C>',
    help: `iso9613-2: air temperature, -20 to 50 (default ${ISO_DEFAULTS.temperature})`,
  },
  humidity: {
    type: 'string',
    value: '<%>',
    help: `iso9613-2: relative humidity, 10 to 100 (default ${ISO_DEFAULTS.humidity})`,
  },
  'barrier-path-difference': {
    type: 'string',
    value: '<m>',
    help: 'iso9613-2: path difference z over a barrier’s top edge (not with --screening)',
  },
  'ground-method': {
    type: 'string',
    value: '<general|alternative>',
    help: 'iso9613-2: general (clause 7.3.1, default) or alternative (clause 7.3.2, A-weighted, mostly porous ground)',
  },
  c0: {
    type: 'string',
    value: '<dB>',
    help: 'iso9613-2: C0 of the meteorological correction, 0 to 5 (default 0, downwind): C_met per eqs 21, 22',
  },
  json: { type: 'boolean', help: 'print one JSON object: level and each term used' },
};

const ISO_ONLY = [
  'hs',
  'hr',
  'ground',
  'temperature',
  'humidity',
  'barrier-path-difference',
  'ground-method',
  'c0',
] as const;

const FLAG_OF: Record<string, string> = {
  'sound power level': '--lw',
  'octave-band levels': '--bands',
  distance: '--distance',
  method: '--method',
  'directivity Q': '--q',
  'on-time': '--on-time',
  count: '--count',
  screening: '--screening',
  'working hours': '--hours-worked',
  'assessment period': '--period-hours',
  'character penalty': '--penalty',
  'source height': '--hs',
  'receiver height': '--hr',
  'ground factor': '--ground',
  'source ground factor': '--ground',
  'middle ground factor': '--ground',
  'receiver ground factor': '--ground',
  temperature: '--temperature',
  humidity: '--humidity',
  'barrier path difference': '--barrier-path-difference',
  'ground method': '--ground-method',
  C0: '--c0',
};

const BANDS_ACCEPTED =
  'eight octave-band levels in dB from 0 to 170, 63 Hz to 8 kHz, separated by commas or semicolons (semicolons with --decimal-comma), e.g. 95,98,101,102,100,97,93,88';
const SCREENING_ACCEPTED = `${FLAG_RULES.screeningDb.accepted}, or none, top-visible (5 dB), hidden (10 dB)`;

/**
 * Eight band levels separated by commas or semicolons (semicolons only with a decimal comma),
 * each read as the grid reads a band ("98 dB" too).
 */
function parseBands(raw: string | boolean | undefined, separator: DecimalSeparator): number[] | undefined {
  if (raw === undefined) return undefined;
  const parts = String(raw).split(separator === ',' ? ';' : /[;,]/);
  const rule = flagReadRule(FLAG_RULES.bandDb);
  const readings = parts.map((p) => readNumberCell(p, separator, rule));
  if (readings.length !== 8 || readings.some((r) => !r.ok)) {
    const bad = readings.find((r) => !r.ok);
    const problem =
      readings.length === 8 && bad && !bad.ok && bad.problem === 'is out of range'
        ? 'has a band out of range'
        : 'is not eight numbers separated by commas';
    throw new UsageError(`--bands: ${JSON.stringify(raw)} ${problem} (give ${BANDS_ACCEPTED})`);
  }
  return readings.map((r) => (r.ok ? r.value : NaN));
}

/** A screening: the words, or a reduction read as the grid reads one ("7.5 dB" too). */
function parseScreening(raw: string | boolean | undefined, separator: DecimalSeparator): MachineScreening {
  if (raw === undefined) return { kind: 'none' };
  const text = String(raw).trim();
  if (text === 'none') return { kind: 'none' };
  if (text === 'top-visible') return { kind: 'top-visible' };
  if (text === 'hidden') return { kind: 'hidden' };
  const reading = readNumberCell(text, separator, flagReadRule(FLAG_RULES.screeningDb));
  if (!reading.ok) {
    const problem = reading.problem === 'is out of range' ? reading.problem : 'is not accepted';
    throw new UsageError(`--screening: ${JSON.stringify(raw)} ${problem} (give ${SCREENING_ACCEPTED})`);
  }
  return reading.value === 0 ? { kind: 'none' } : { kind: 'explicit', db: reading.value };
}

/** Turns the parsed flags into the core's input. */
export function levelInput(values: ParsedFlags['values']): SingleMachineInput {
  const method = values.method === undefined ? 'simple' : String(values.method);
  if (method !== 'simple' && method !== 'iso9613-2') {
    throw new UsageError(`--method: ${JSON.stringify(method)} is not accepted (give simple or iso9613-2)`);
  }
  const lw = numberFlag(values, 'lw', FLAG_RULES.lwaDb);
  const bands = parseBands(values.bands, separatorOf(values));
  if (lw === undefined && bands === undefined)
    throw new UsageError('--lw: missing (give an A-weighted sound power level in dB, e.g. 104.5, or --bands)');
  const input: SingleMachineInput = {
    distanceM: requiredNumber(values, 'distance', FLAG_RULES.distanceM),
    method,
    onTimePct: numberFlag(values, 'on-time', FLAG_RULES.onTimePct) ?? 100,
    count: numberFlag(values, 'count', FLAG_RULES.count) ?? 1,
    screening: parseScreening(values.screening, separatorOf(values)),
    facade: values.facade === true,
  };
  if (lw !== undefined) input.lwDb = lw;
  if (bands !== undefined) input.bandsDb = bands;
  const worked = numberFlag(values, 'hours-worked', FLAG_RULES.periodHours);
  const period = numberFlag(values, 'period-hours', FLAG_RULES.periodHours);
  if ((worked === undefined) !== (period === undefined))
    throw new UsageError(
      `${worked === undefined ? '--hours-worked' : '--period-hours'}: missing (give --hours-worked and --period-hours together, e.g. --hours-worked 10 --period-hours 12)`,
    );
  if (worked !== undefined && period !== undefined) {
    input.hoursWorked = worked;
    input.periodHours = period;
  }
  const penalty = numberFlag(values, 'penalty', FLAG_RULES.penaltyDb);
  if (penalty !== undefined) input.penaltyDb = penalty;
  if (method === 'simple') {
    const misplaced = ISO_ONLY.find((k) => values[k] !== undefined);
    if (misplaced)
      throw new UsageError(
        `--${misplaced}: applies to --method iso9613-2 only (add --method iso9613-2 or leave it out)`,
      );
    input.q = numberFlag(values, 'q', FLAG_RULES.q) ?? 2;
  } else {
    if (values.q !== undefined)
      throw new UsageError(
        '--q: applies to --method simple only (ISO 9613-2 takes the ground from --ground, --hs and --hr)',
      );
    const z = numberFlag(values, 'barrier-path-difference', FLAG_RULES.pathDifferenceM);
    if (z !== undefined && input.screening && input.screening.kind !== 'none') {
      throw new UsageError(
        `--screening: ${JSON.stringify(String(values.screening))} given together with --barrier-path-difference (ISO 9613-2:1996 counts a path's screening once, as D_z: give one of them)`,
      );
    }
    const groundMethod = values['ground-method'] === undefined ? 'general' : String(values['ground-method']);
    if (groundMethod !== 'general' && groundMethod !== 'alternative') {
      throw new UsageError(
        `--ground-method: ${JSON.stringify(groundMethod)} is not accepted (give general or alternative)`,
      );
    }
    const c0 = numberFlag(values, 'c0', FLAG_RULES.c0Db);
    input.propagation = {
      groundMethod,
      ...(c0 === undefined ? {} : { cmet: { c0Db: c0 } }),
      sourceHeightM: numberFlag(values, 'hs', FLAG_RULES.heightM) ?? ISO_DEFAULTS.hs,
      receiverHeightM: numberFlag(values, 'hr', FLAG_RULES.heightM) ?? ISO_DEFAULTS.hr,
      groundFactor: numberFlag(values, 'ground', FLAG_RULES.groundFactor) ?? ISO_DEFAULTS.ground,
      temperatureC: numberFlag(values, 'temperature', FLAG_RULES.temperatureC) ?? ISO_DEFAULTS.temperature,
      humidityPct: numberFlag(values, 'humidity', FLAG_RULES.humidityPct) ?? ISO_DEFAULTS.humidity,
      ...(z === undefined ? {} : { barrier: { pathDifferenceM: z } }),
    };
  }
  return input;
}

function signed(x: number): string {
  const s = x.toFixed(1);
  return x >= 0 && !s.startsWith('-') ? `+${s}` : s;
}

/**
 * The JSON object of a result: the level; each term by key — ISO 9613-2:1996 terms with the
 * standard's sign (A terms and C_met positive and subtracted, D_c and D_Ω added), the other
 * terms as the signed dB they add; in octave-band mode a `bands` array in place of the
 * A-weighted term keys; the accuracy and notes.
 */
export function levelJson(result: SingleMachineLevel): Record<string, unknown> {
  const out: Record<string, unknown> = { level: rounded(result.levelDb), method: result.basis };
  const iso = result.iso;
  for (const term of result.terms) {
    if (term.key === 'octavePath') continue; // not a term of the standard: the bands array carries the terms
    out[term.key] = rounded(term.standard ? term.standard.value : term.db);
  }
  if (iso) {
    out.assembly = ISO_ASSEMBLY;
    out.groundMethod = iso.groundMethod;
    if (iso.aWeighted) {
      out.dOmega = rounded(iso.aWeighted.dOmega);
      if (iso.aWeighted.dz !== undefined) {
        out.dz = rounded(iso.aWeighted.dz);
        out.abar = rounded(iso.aWeighted.abar);
      }
    }
    if (!('cmet' in out)) out.cmet = 0;
    if (iso.bands) {
      out.lpA = rounded(iso.bandsLevelDb as number);
      out.bands = iso.bands.map((b) => ({
        hz: b.nominalHz,
        lw: rounded(b.lw),
        dc: rounded(b.dc),
        adiv: rounded(b.adiv),
        aatm: rounded(b.aatm),
        agr: rounded(b.agr),
        abar: rounded(b.abar),
        ...(b.dz === undefined ? {} : { dz: rounded(b.dz) }),
        a: rounded(b.a),
        lp: rounded(b.lp),
        aWeighting: b.aWeighting,
        lpA: rounded(b.lpA),
      }));
    }
    out.accuracyDb = iso.accuracy.statedDb ?? null;
    out.notes = [...iso.warnings, ...iso.accuracy.notes];
  }
  return out;
}

/** The text output: the level, the terms (ISO terms with the standard's value), the band table, notes and caution. */
export function levelText(result: SingleMachineLevel): string {
  const iso = result.iso;
  const lines = [`${result.levelDb.toFixed(1)} dB(A) predicted at the receiver`, ''];
  if (iso) lines.push(`  ${ISO_ASSEMBLY}`, '');
  const width = Math.max(...result.terms.map((t) => t.label.length));
  for (const t of result.terms) {
    const effect = t.key === 'lw' ? t.db.toFixed(1).padStart(6) : signed(t.db).padStart(6);
    const standard = t.standard
      ? `   ${t.standard.symbol} = ${t.standard.value.toFixed(1)} dB, ${t.standard.applied}`
      : '';
    lines.push(`  ${t.label.padEnd(width)}  ${effect} dB${standard}`);
  }
  if (iso?.bands) {
    const cols = ['Hz', 'Lw', 'D_c', 'A_div', 'A_atm', 'A_gr', 'A_bar', 'A', 'Lp', 'A-wt', 'LpA'];
    lines.push(
      '',
      '  Octave bands, dB (ISO 9613-2:1996; A terms subtracted, D_c added: Lp = Lw + D_c − A):',
      `  ${cols.map((c) => c.padStart(7)).join('')}`,
    );
    for (const b of iso.bands) {
      const cells = [
        String(b.nominalHz),
        ...[b.lw, b.dc, b.adiv, b.aatm, b.agr, b.abar, b.a, b.lp, b.aWeighting, b.lpA].map((x) => x.toFixed(1)),
      ];
      lines.push(`  ${cells.map((c) => c.padStart(7)).join('')}`);
    }
    lines.push(`  A-weighted sum of LpA: ${(iso.bandsLevelDb as number).toFixed(1)} dB(A)`);
  }
  if (iso) {
    lines.push('');
    for (const w of iso.warnings) lines.push(`  Warning: ${w}`);
    for (const n of iso.accuracy.notes) lines.push(`  ${n}`);
  }
  lines.push('', PREDICTION_CAUTION, '');
  return lines.join('\n');
}

const usage = 'Usage: ledger level (--lw <dB> | --bands <8 values>) --distance <m> [flags]';
const summary = 'Predicted level at a receiver for one machine, with every term.';

export const levelCommand: Command = {
  name: 'level',
  summary,
  help:
    helpText(usage, summary, specs) +
    `\nISO 9613-2:1996 (--method iso9613-2): ${ISO_ASSEMBLY}\n` +
    'With --bands and the general ground method each band is propagated (per-band table), A-weighted and summed;\n' +
    'with --lw alone the general method’s terms at 500 Hz are used (--ground-method alternative: eq. 10 with D_Ω).\n' +
    'Screening (--screening or --barrier-path-difference, one of them) is D_z in A_bar = D_z − A_gr, not below 0 (eq. 12).\n' +
    'In --json the keys adiv, aatm, agr, abar, dc, dOmega and cmet hold the standard’s values (A terms and C_met subtracted, D_c added);\n' +
    'lw, onTime, count and facade hold the dB they add. Octave bands: a "bands" array, no single A-weighted A terms.\n' +
    `${PREDICTION_CAUTION}\n`,
  async run(argv, io) {
    const { values } = parseFlags(argv, specs);
    const input = levelInput(values);
    const result = withFlagNames(FLAG_OF, () => singleMachineLevel(input));
    if (!Number.isFinite(result.levelDb)) {
      const term = result.terms.find((t) => !Number.isFinite(t.db));
      const flag =
        term?.key === 'lw'
          ? values.bands !== undefined
            ? 'bands'
            : 'lw'
          : term?.key === 'abar'
            ? 'barrier-path-difference'
            : 'distance';
      const rule =
        flag === 'distance'
          ? FLAG_RULES.distanceM
          : flag === 'barrier-path-difference'
            ? FLAG_RULES.pathDifferenceM
            : FLAG_RULES.lwaDb;
      finiteResult(
        result.levelDb,
        flag,
        String(values[flag]),
        `${rule.accepted}, large enough for the result to be computed`,
      );
    }
    io.out(values.json ? `${JSON.stringify(levelJson(result))}\n` : levelText(result));
    return 0;
  },
};
