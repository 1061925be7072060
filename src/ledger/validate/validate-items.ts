/**
 * Validation of duties and candidates (see ./validate.ts for the rest of a project).
 */
import { prop, checkIds, itemWords, type ProblemList } from './field-checks.ts';
import { RULES } from './validate-rules.ts';
import { checkMachineNoise } from './machine-checks.ts';
import { checkAreaLocation } from './validate-plan.ts';
import {
  candidateIsClean,
  candidatesWithUnreadCells,
  checkIdsQuickly,
  dutyIsClean,
  idsWithUnreadCells,
} from './validate-clean.ts';
import { validateOnTimeRange } from '../uncertainty/validate-uncertainty.ts';

type Obj = Record<string, unknown>;
const asObj = (x: unknown): Obj => (typeof x === 'object' && x !== null && !Array.isArray(x) ? (x as Obj) : {});

export interface Lists {
  /** Text kept for unread cells, by "<list>/<id>/<field>". */
  unread: Readonly<Record<string, string>>;
  phaseIds: Set<string>;
  receiverIds: Set<string>;
  receivers: Obj[];
  duties: Obj[];
  candidates: Obj[];
}

const quoteList = (ids: Iterable<string>) => [...ids].map((x) => JSON.stringify(x)).join(', ');

/** Duties: ids, phase, numbers, location, baseline (which must be a candidate of the duty). */
export function validateDuties(p: ProblemList, lists: Lists): void {
  checkIds(p, '$.duties', 'Duty', lists.duties);
  const byDuty = new Map<unknown, Obj[]>();
  for (const c of lists.candidates) {
    const group = byDuty.get(c.dutyId);
    if (group) group.push(c);
    else byDuty.set(c.dutyId, [c]);
  }
  const unreadIds = idsWithUnreadCells(lists.unread, 'duties');
  lists.duties.forEach((d, i) => {
    // A duty with nothing to report passes without writing its paths and messages (./validate-clean.ts).
    if (dutyIsClean(d, lists.phaseIds, unreadIds) && candidatesAreClean(d, byDuty.get(d.id))) return;
    checkDuty(p, lists, d, i, byDuty.get(d.id) ?? []);
  });
}

/** Every check of one duty (the list's id check aside), each problem with its path and message; `mine` its candidates. O(candidates of the duty). */
export function checkDuty(p: ProblemList, lists: Lists, d: Obj, i: number, mine: readonly Obj[]): void {
  const path = `$.duties[${i}]`;
  const where = itemWords('Duty', d, i);
  const cell = (f: string) => `duties/${String(d.id)}/${f}`;
  p.text(`${path}.name`, `${where}, name`, d.name, true, 'a name, e.g. "Break out the yard slab"');
  if (!lists.phaseIds.has(d.phaseId as string))
    p.add(
      `${path}.phaseId`,
      `${where}, phase`,
      d.phaseId,
      'is not a phase of this project',
      `use one of ${quoteList(lists.phaseIds) || 'the phases’ ids (add a phase first)'}`,
    );
  p.number(`${path}.count`, `${where}, units`, d.count, RULES.count, cell('count'));
  p.number(`${path}.onTimePct`, `${where}, on-time`, d.onTimePct, RULES.onTimePct, cell('onTimePct'));
  p.number(`${path}.durationDays`, `${where}, duration`, d.durationDays, RULES.durationDays, cell('durationDays'));
  p.optionalNumber(
    `${path}.sourceHeightM`,
    `${where}, source height`,
    d.sourceHeightM,
    RULES.heightM,
    cell('sourceHeightM'),
  );
  validateOnTimeRange(p, `${path}.onTimeRangePct`, where, d, cell);
  const loc = asObj(d.location);
  if (
    p.object(`${path}.location`, `${where}, location`, d.location) &&
    p.oneOf(`${path}.location.kind`, `${where}, location kind`, loc.kind, ['point', 'distances', 'line', 'polygon'])
  ) {
    if (loc.kind === 'line' || loc.kind === 'polygon') {
      checkAreaLocation(p, `${path}.location`, where, loc, String(d.id));
    } else if (loc.kind === 'point') {
      p.number(`${path}.location.x`, `${where}, x`, loc.x, RULES.coordinateM, cell('location.x'));
      p.number(`${path}.location.y`, `${where}, y`, loc.y, RULES.coordinateM, cell('location.y'));
    } else if (p.object(`${path}.location.distancesM`, `${where}, distances`, loc.distancesM)) {
      const table = loc.distancesM as Obj;
      for (const [rid, dist] of Object.entries(table)) {
        const dp = prop(`${path}.location.distancesM`, rid);
        if (!lists.receiverIds.has(rid))
          p.add(
            dp,
            `${where}, distance`,
            rid,
            'is not a receiver of this project',
            `use a receiver id as the key: ${quoteList(lists.receiverIds)}`,
          );
        else p.number(dp, `${where}, distance to ${rid}`, dist, RULES.distanceM, cell(`location.distancesM.${rid}`));
      }
      for (const rid of lists.receiverIds) {
        if (!(rid in table))
          p.add(
            prop(`${path}.location.distancesM`, rid),
            `${where}, distance to receiver ${JSON.stringify(rid)}`,
            undefined,
            'is missing',
            `use ${RULES.distanceM.accepted}`,
          );
      }
    }
  }
  if (mine.length === 0) {
    p.add(`${path}.id`, where, d.id, 'has no candidates', 'add at least one candidate whose dutyId names this duty');
  } else if (!mine.some((c) => c.id === d.baselineCandidateId)) {
    const other = lists.candidates.find((c) => c.id === d.baselineCandidateId);
    p.add(
      `${path}.baselineCandidateId`,
      `${where}, baseline`,
      d.baselineCandidateId,
      other ? 'is a candidate of another duty' : 'is not a candidate',
      `use one of this duty’s candidates: ${quoteList(mine.map((c) => String(c.id)))}`,
    );
  }
  const pinned = mine.filter((c) => c.pinned === true);
  if (pinned.length > 1)
    p.add(
      `${path}.id`,
      `${where}, pinned candidates`,
      pinned.map((c) => c.id),
      'are more than one',
      'pin at most one candidate per duty',
    );
}

/** True when a duty's candidates give nothing to report: at least one, the baseline among them, at most one pinned. O(candidates of the duty). */
export function candidatesAreClean(d: Obj, mine: readonly Obj[] | undefined): boolean {
  if (mine === undefined || mine.length === 0) return false;
  let baseline = false;
  let pinned = 0;
  for (const c of mine) {
    if (c.id === d.baselineCandidateId) baseline = true;
    if (c.pinned === true) pinned++;
  }
  return baseline && pinned <= 1;
}

const ENERGIES = ['diesel', 'petrol', 'electric', 'battery', 'hybrid', 'other'] as const;

/**
 * Candidates: ids, duty, levels, bands, declaration, costs, flags. A candidate with
 * nothing to report is passed by a quick test (./validate-clean.ts) without writing its
 * messages; the others are checked field by field. O(candidates).
 */
export function validateCandidates(p: ProblemList, lists: Lists): void {
  checkIdsQuickly(p, '$.candidates', 'Candidate', lists.candidates, 'label');
  const dutyIds = new Set(lists.duties.map((d) => d.id).filter((x): x is string => typeof x === 'string'));
  const unreadIds = candidatesWithUnreadCells(lists.unread);
  lists.candidates.forEach((c, i) => {
    if (!candidateIsClean(c, dutyIds, unreadIds)) checkCandidate(p, c, i, dutyIds);
  });
}

/** Every field check of one candidate (the list's id check aside), each problem with its path and message. O(1). */
export function checkCandidate(p: ProblemList, c: Obj, i: number, dutyIds: ReadonlySet<string>): void {
  const path = `$.candidates[${i}]`;
  const where = itemWords('Candidate', c, i, 'label');
  const cell = (f: string) => `candidates/${String(c.id)}/${f}`;
  if (!dutyIds.has(c.dutyId as string))
    p.add(
      `${path}.dutyId`,
      `${where}, duty`,
      c.dutyId,
      'is not a duty of this project',
      `use one of ${quoteList(dutyIds) || 'the duties’ ids'}`,
    );
  p.text(
    `${path}.label`,
    `${where}, label`,
    c.label,
    true,
    'a name for the machine, e.g. "Mini excavator 1.9 t, electric"',
  );
  p.text(`${path}.category`, `${where}, category`, c.category, false, 'text, e.g. "excavator 20 t"');
  if (c.directiveCategory !== undefined)
    p.text(
      `${path}.directiveCategory`,
      `${where}, directive category`,
      c.directiveCategory,
      true,
      'a category word, e.g. "excavator"',
    );
  checkMachineNoise(p, path, where, c, cell);
  if (
    c.lwaDb === undefined &&
    c.bandsDb === undefined &&
    c.lwaOrigin !== 'permissible-stand-in' &&
    !p.isUnread(cell('lwaDb'))
  ) {
    p.add(
      `${path}.lwaDb`,
      `${where}, LWA`,
      undefined,
      'is missing',
      'give the declared LWA in dB, e.g. 104.5, or octave bands, or mark the origin "permissible-stand-in" with a directive category',
    );
  }
  p.optionalNumber(
    `${path}.operatorLpaDb`,
    `${where}, operator LpA`,
    c.operatorLpaDb,
    RULES.operatorLpaDb,
    cell('operatorLpaDb'),
  );
  p.optionalNumber(
    `${path}.operatorHoursPerDay`,
    `${where}, operator hours a day`,
    c.operatorHoursPerDay,
    RULES.operatorHours,
    cell('operatorHoursPerDay'),
  );
  p.oneOf(`${path}.character`, `${where}, character`, c.character, ['none', 'tonal', 'impulsive']);
  p.oneOf(`${path}.energy`, `${where}, energy`, c.energy, ENERGIES);
  p.text(
    `${path}.source`,
    `${where}, data source`,
    c.source,
    false,
    'text naming where the data came from, e.g. "supplier data sheet 2024"',
  );
  const cost = asObj(c.cost);
  if (
    p.object(`${path}.cost`, `${where}, cost`, c.cost) &&
    p.oneOf(`${path}.cost.kind`, `${where}, cost kind`, cost.kind, ['hire', 'purchase'])
  ) {
    const money = (f: string, words: string, optional: boolean) =>
      (optional ? p.optionalNumber : p.number).call(
        p,
        `${path}.cost.${f}`,
        `${where}, ${words}`,
        cost[f],
        RULES.money,
        cell(`cost.${f}`),
      );
    if (cost.kind === 'hire') {
      money('dayRate', 'day rate', false);
      money('weekRate', 'week rate', true);
      money('monthRate', 'month rate', true);
    } else {
      const priceOk = money('price', 'price', false);
      const resaleOk = money('resaleValue', 'resale value', false);
      p.number(`${path}.cost.lifeDays`, `${where}, working life`, cost.lifeDays, RULES.lifeDays, cell('cost.lifeDays'));
      if (priceOk && resaleOk && (cost.resaleValue as number) > (cost.price as number)) {
        p.add(
          `${path}.cost.resaleValue`,
          `${where}, resale value`,
          cost.resaleValue,
          `is above the price ${String(cost.price)}`,
          'use a resale value from 0 up to the price',
        );
      }
    }
  }
  if (c.setAsideCost !== undefined) {
    // The other basis's figures as last typed (version 9): never used in a cost, so only their kinds are checked.
    const aside = asObj(c.setAsideCost);
    if (
      p.object(`${path}.setAsideCost`, `${where}, set-aside cost`, c.setAsideCost) &&
      p.oneOf(`${path}.setAsideCost.kind`, `${where}, set-aside cost basis`, aside.kind, ['hire', 'purchase'])
    ) {
      for (const [field, value] of Object.entries(aside)) {
        if (field !== 'kind' && value !== null && typeof value !== 'number')
          p.add(
            `${path}.setAsideCost.${field}`,
            `${where}, set-aside ${field}`,
            value,
            'is not a number',
            'use an amount of 0 or more',
          );
      }
    }
  }
  p.number(
    `${path}.runningPerDay`,
    `${where}, running cost per day`,
    c.runningPerDay,
    RULES.money,
    cell('runningPerDay'),
  );
  p.number(`${path}.fixedCharges`, `${where}, fixed charges`, c.fixedCharges, RULES.money, cell('fixedCharges'));
  p.bool(`${path}.pinned`, `${where}, pinned`, c.pinned, true);
  p.bool(`${path}.excluded`, `${where}, excluded`, c.excluded, true);
  if (c.pinned === true && c.excluded === true)
    p.add(
      `${path}.excluded`,
      `${where}, excluded`,
      true,
      'contradicts pinned',
      'a candidate is either pinned or excluded, not both',
    );
  if (c.registerLink !== undefined) {
    const link = asObj(c.registerLink);
    if (p.object(`${path}.registerLink`, `${where}, register link`, c.registerLink)) {
      p.text(
        `${path}.registerLink.machineId`,
        `${where}, register machine`,
        link.machineId,
        true,
        'the id of a machine in the register, e.g. "m3"',
      );
      p.oneOf(`${path}.registerLink.basis`, `${where}, register cost basis`, link.basis, ['hire', 'purchase']);
    }
  }
}
