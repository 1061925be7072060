/**
 * Validation of a project: EVERY problem in one pass, each with its JSON path
 * ("$.candidates[3].lwaDb"), the value and what is accepted — ids unique, references that
 * exist, numbers in range, times of day readable (an end earlier than the start runs past midnight), currency
 * codes, octave bands of exactly eight numbers. Text typed into a numeric cell that could
 * not be read (`unreadCells`) is reported as typed.
 * Never throws, whatever the input's shape. O(size of the project).
 */
import type { Project } from '../model/model.ts';
import { validateBarriers, validateSitePlan } from './validate-plan.ts';
import { PROJECT_FORMAT, PROJECT_VERSION, REFERENCE_RECEIVER_ID, RECEIVER_KINDS } from '../model/model.ts';
import type { DataProblem } from '../model/results.ts';
import { ProblemList, prop, checkIds, itemWords } from './field-checks.ts';
import { RULES, CLOCK_ACCEPTED, CURRENCY_ACCEPTED, ID_ACCEPTED } from './validate-rules.ts';
import { CURRENCY_CODE } from '../catalogue/index.ts';
import { minutesOfDay, overlapHours, spanMinutes } from '../prediction/clock.ts';
import { validateDuties, validateCandidates, type Lists } from './validate-items.ts';
import { validateClauses } from '../clauses/validate-clauses.ts';
import { validateUncertainty } from '../uncertainty/validate-uncertainty.ts';

type Obj = Record<string, unknown>;
const asObj = (x: unknown): Obj => (typeof x === 'object' && x !== null && !Array.isArray(x) ? (x as Obj) : {});
const asList = (x: unknown): Obj[] => (Array.isArray(x) ? x.map(asObj) : []);

function checkSpan(p: ProblemList, path: string, where: string, item: Obj): boolean {
  const okStart = !Number.isNaN(minutesOfDay(item.start)) && item.start !== '24:00';
  const okEnd = !Number.isNaN(minutesOfDay(item.end));
  if (!okStart) p.add(`${path}.start`, `${where}, start`, item.start, 'is not a time of day', CLOCK_ACCEPTED);
  if (!okEnd) p.add(`${path}.end`, `${where}, end`, item.end, 'is not a time of day', CLOCK_ACCEPTED);
  if (okStart && okEnd && spanMinutes(item.start, item.end) === 0) {
    p.add(
      `${path}.end`,
      `${where}, end`,
      item.end,
      `is the same as the start ${String(item.start)}`,
      'use a different end; an end earlier than the start runs past midnight (e.g. 23:00–07:00); a whole day is 00:00–24:00',
    );
    return false;
  }
  return okStart && okEnd;
}

/**
 * Every problem in a project, in file order.
 * @example validateProject({ …, currency: 'gbp' }) // [{ path: '$.currency', message: 'Currency: "gbp" is not accepted (use an ISO 4217 …)' }]
 */
export function validateProject(project: Project): DataProblem[] {
  const root = asObj(project);
  const unread = asObj(root.unreadCells) as Record<string, string>;
  const p = new ProblemList(unread);

  if (root.format !== PROJECT_FORMAT)
    p.add(
      '$.format',
      'Format',
      root.format,
      'is not a project file of this program',
      `use ${JSON.stringify(PROJECT_FORMAT)}`,
    );
  if (root.version !== PROJECT_VERSION)
    p.add(
      '$.version',
      'Version',
      root.version,
      'is not the version this program works on',
      `use ${PROJECT_VERSION} (older files are upgraded on reading)`,
    );
  p.text('$.name', 'Project name', root.name, false, 'text, e.g. "Quay Street works"');
  if (typeof root.currency !== 'string' || !CURRENCY_CODE.pattern.test(root.currency))
    p.add('$.currency', 'Currency', root.currency, 'is not accepted', CURRENCY_ACCEPTED);
  if (root.notes !== undefined) p.text('$.notes', 'Notes', root.notes, false, 'text');
  if (root.unreadCells !== undefined && p.object('$.unreadCells', 'Unread cells', root.unreadCells)) {
    for (const [k, v] of Object.entries(unread))
      if (typeof v !== 'string')
        p.add(prop('$.unreadCells', k), `Unread cell ${k}`, v, 'is not text', 'the text as typed');
  }
  validateFleets(p, root);
  validateBarriers(p, root);
  validateSitePlan(p, root);

  // Propagation
  const prop0 = asObj(root.propagation);
  if (
    p.object('$.propagation', 'Propagation', root.propagation) &&
    p.oneOf('$.propagation.method', 'Propagation method', prop0.method, ['simple', 'iso9613-2:1996'])
  ) {
    if (prop0.method === 'simple') {
      p.oneOf('$.propagation.q', 'Directivity Q', prop0.q, [1, 2, 4, 8]);
    } else {
      const n = (key: keyof typeof RULES & string, words: string) =>
        p.number(`$.propagation.${key}`, words, prop0[key], RULES[key], `propagation/-/${key}`);
      n('temperatureC', 'Temperature');
      n('humidityPct', 'Relative humidity');
      n('pressureKPa', 'Atmospheric pressure');
      n('groundFactor', 'Ground factor G');
      n('c0Db', 'Meteorological factor C0');
      p.number(
        '$.propagation.sourceHeightM',
        'Source height',
        prop0.sourceHeightM,
        RULES.defaultSourceHeightM,
        'propagation/-/sourceHeightM',
      );
      p.oneOf('$.propagation.groundMethod', 'Ground method', prop0.groundMethod, ['general', 'alternative']);
    }
  }
  const simple = prop0.method === 'simple';

  // Settings
  const settings = asObj(root.settings);
  if (p.object('$.settings', 'Settings', root.settings)) {
    p.number(
      '$.settings.referenceDistanceM',
      'Reference receiver distance',
      settings.referenceDistanceM,
      RULES.referenceDistanceM,
      'settings/-/referenceDistanceM',
    );
    p.oneOf('$.settings.characterPenaltyDb', 'Character penalty', settings.characterPenaltyDb, [0, 3, 6]);
    p.oneOf('$.settings.levelBasis', 'Level basis', settings.levelBasis, ['guaranteed', 'measured']);
    p.oneOf('$.settings.decimalSeparator', 'Decimal separator', settings.decimalSeparator, ['.', ',']);
  }

  validateUncertainty(p, root);

  // Periods and phases
  const periods = p.list('$.periods', 'Assessment periods', root.periods) ? asList(root.periods) : [];
  const periodIds = checkIds(p, '$.periods', 'Period', periods);
  periods.forEach((period, i) => {
    p.text(
      `$.periods[${i}].name`,
      `${itemWords('Period', period, i)}, name`,
      period.name,
      true,
      'a name, e.g. "Weekday daytime"',
    );
    checkSpan(p, `$.periods[${i}]`, itemWords('Period', period, i), period);
  });
  const phases = p.list('$.phases', 'Phases', root.phases) ? asList(root.phases) : [];
  const phaseIds = checkIds(p, '$.phases', 'Phase', phases);
  phases.forEach((phase, i) => {
    const where = itemWords('Phase', phase, i);
    p.text(`$.phases[${i}].name`, `${where}, name`, phase.name, true, 'a name, e.g. "Demolition"');
    const spanOk = checkSpan(p, `$.phases[${i}]`, `${where}, working hours`, phase);
    const period = periods.find((x) => x.id === phase.periodId);
    if (!period) {
      p.add(
        `$.phases[${i}].periodId`,
        `${where}, period`,
        phase.periodId,
        'is not a period of this project',
        `use one of ${[...periodIds].map((x) => JSON.stringify(x)).join(', ') || 'the periods’ ids (add a period first)'}`,
      );
    } else if (
      spanOk &&
      overlapHours(String(phase.start), String(phase.end), String(period.start), String(period.end)) === 0
    ) {
      p.add(
        `$.phases[${i}].start`,
        `${where}, working hours`,
        `${phase.start}–${phase.end}`,
        `fall outside its own period ${String(period.start)}–${String(period.end)}`,
        'use working hours that overlap the period, or choose as its own period one its hours fall in',
      );
    }
  });

  // Receivers
  const receivers = p.list('$.receivers', 'Receivers', root.receivers) ? asList(root.receivers) : [];
  const receiverIds = checkIds(p, '$.receivers', 'Receiver', receivers);
  const duties = Array.isArray(root.duties) ? asList(root.duties) : [];
  const dutyIds = new Set(duties.map((d) => d.id).filter((x): x is string => typeof x === 'string'));
  receivers.forEach((r, i) => {
    const path = `$.receivers[${i}]`;
    const where = itemWords('Receiver', r, i);
    const cell = (f: string) => `receivers/${String(r.id)}/${f}`;
    if (r.id === REFERENCE_RECEIVER_ID)
      p.add(`${path}.id`, `${where}, id`, r.id, 'is reserved for the reference receiver', ID_ACCEPTED);
    p.text(`${path}.name`, `${where}, name`, r.name, true, 'a name, e.g. "14 Wren Terrace"');
    p.oneOf(`${path}.kind`, `${where}, kind`, r.kind, RECEIVER_KINDS);
    p.number(`${path}.x`, `${where}, x`, r.x, RULES.coordinateM, cell('x'));
    p.number(`${path}.y`, `${where}, y`, r.y, RULES.coordinateM, cell('y'));
    p.number(`${path}.heightM`, `${where}, height`, r.heightM, RULES.heightM, cell('heightM'));
    p.bool(`${path}.facade`, `${where}, façade`, r.facade, false);
    p.optionalNumber(`${path}.ambientDb`, `${where}, ambient level`, r.ambientDb, RULES.ambientDb, cell('ambientDb'));
    if (p.object(`${path}.limitsDb`, `${where}, limits`, r.limitsDb)) {
      for (const [periodId, limit] of Object.entries(r.limitsDb as Obj)) {
        const lp = prop(`${path}.limitsDb`, periodId);
        if (!periodIds.has(periodId))
          p.add(
            lp,
            `${where}, limit`,
            periodId,
            'is not a period of this project',
            `use a period id: ${[...periodIds].join(', ')}`,
          );
        p.number(lp, `${where}, limit for ${periodId}`, limit, RULES.limitDb, cell(`limitsDb.${periodId}`));
      }
    }
    if (p.object(`${path}.screening`, `${where}, screening`, r.screening)) {
      for (const [dutyId, s0] of Object.entries(r.screening as Obj)) {
        const sp = prop(`${path}.screening`, dutyId);
        const sw = `${where}, screening from duty ${JSON.stringify(dutyId)}`;
        if (!dutyIds.has(dutyId))
          p.add(sp, `${where}, screening`, dutyId, 'is not a duty of this project', 'use a duty id as the key');
        if (typeof s0 === 'string') {
          // The bare words "none", "top-visible" and "hidden" are read as objects on opening; any other word is refused here.
          p.add(
            sp,
            sw,
            s0,
            'is not a screening',
            'use "none", "top-visible", "hidden", or an object such as {"kind": "explicit", "db": 7}',
          );
          continue;
        }
        const s = asObj(s0);
        if (!p.oneOf(`${sp}.kind`, sw, s.kind, ['none', 'top-visible', 'hidden', 'explicit', 'barrier'])) continue;
        if (s.kind === 'explicit') p.number(`${sp}.db`, sw, s.db, RULES.screeningDb, cell(`screening.${dutyId}.db`));
        if (s.kind === 'barrier') {
          p.number(
            `${sp}.pathDifferenceM`,
            sw,
            s.pathDifferenceM,
            RULES.pathDifferenceM,
            cell(`screening.${dutyId}.pathDifferenceM`),
          );
          if (simple)
            p.add(
              `${sp}.kind`,
              sw,
              s.kind,
              'needs the ISO 9613-2:1996 propagation method',
              'with the simple method use "top-visible" (5 dB), "hidden" (10 dB) or "explicit"',
            );
        }
      }
    }
  });

  const lists: Lists = { unread, phaseIds, receiverIds, receivers, duties, candidates: [] };
  const candidates = p.list('$.candidates', 'Candidates', root.candidates) ? asList(root.candidates) : [];
  lists.candidates = candidates;
  if (p.list('$.duties', 'Duties', root.duties)) validateDuties(p, lists);
  validateCandidates(p, lists);
  validateClauses(p, root.clauses, { receiverIds, dutyIds, periodIds });
  return p.problems;
}

/** Named fleets (version 2): a list of { name, choice, origin }, names unique and not reserved; the assessed fleet's name is text. */
function validateFleets(p: ProblemList, root: Record<string, unknown>): void {
  if (root.assessedFleet !== undefined)
    p.text(
      '$.assessedFleet',
      'Assessed fleet',
      root.assessedFleet,
      true,
      'the name of a fleet, or leave it out for the baseline',
    );
  if (root.fleets === undefined || !p.list('$.fleets', 'Fleets', root.fleets)) return;
  const seen = new Set<string>();
  root.fleets.forEach((f, i) => {
    const path = `$.fleets[${i}]`;
    const fleet = asObj(f);
    const where = itemWords('Fleet', fleet, i);
    if (!p.object(path, where, f)) return;
    if (p.text(`${path}.name`, `${where}, name`, fleet.name, true, 'a name, e.g. "Quiet option A"')) {
      const key = (fleet.name as string).trim().toLowerCase();
      if (key === 'baseline' || key === 'best')
        p.add(`${path}.name`, `${where}, name`, fleet.name, 'is reserved', 'use another name, e.g. "Quiet option A"');
      else if (seen.has(key))
        p.add(`${path}.name`, `${where}, name`, fleet.name, 'is used twice', 'give each fleet its own name');
      seen.add(key);
    }
    p.oneOf(`${path}.origin`, `${where}, origin`, fleet.origin, ['optimiser', 'user']);
    if (p.object(`${path}.choice`, `${where}, choice`, fleet.choice)) {
      for (const [duty, pick] of Object.entries(fleet.choice as Record<string, unknown>)) {
        if (typeof pick !== 'string')
          p.add(
            prop(`${path}.choice`, duty),
            `${where}, choice for duty ${JSON.stringify(duty)}`,
            pick,
            'is not text',
            'use a candidate id',
          );
      }
    }
  });
}
