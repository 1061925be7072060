/**
 * A quick test that a candidate has nothing to report, so that validating a large
 * project spends its time only on the rows with problems.
 *
 * `candidateIsClean` answers true only when the field checks of ./validate-items.ts would
 * add no problem for the candidate (its id is checked with the list, elsewhere): the same
 * rules (./validate-rules.ts), tested without writing a single path or message. When it
 * answers false, the full checks run and write every message as before, so the problems
 * listed never change. O(1) per candidate (O(8) with octave bands), no allocation.
 */
import { checkIds, type NumberRule, type ProblemList } from './field-checks.ts';
import { RULES } from './validate-rules.ts';

type Obj = Record<string, unknown>;

/** True when a value passes `ProblemList.number` with this rule and no unread text. */
function numberOk(value: unknown, rule: NumberRule): boolean {
  if (typeof value !== 'number' || !Number.isFinite(value)) return false;
  if (rule.min !== undefined && (rule.aboveMin ? value <= rule.min : value < rule.min)) return false;
  if (rule.max !== undefined && value > rule.max) return false;
  return !rule.integer || Number.isInteger(value);
}

/** True when a value passes `ProblemList.optionalNumber` with no unread text. */
const optionalOk = (value: unknown, rule: NumberRule) => value === undefined || numberOk(value, rule);
const nonEmptyText = (value: unknown) => typeof value === 'string' && value.trim() !== '';
const optionalBool = (value: unknown) => value === undefined || typeof value === 'boolean';

/**
 * The ids of candidates that have text kept in an unread cell: keys
 * "candidates/<id>/<field>", the field never holding a "/". O(unread cells).
 */
export function candidatesWithUnreadCells(unread: Readonly<Record<string, string>>): Set<string> {
  const ids = new Set<string>();
  const prefix = 'candidates/';
  for (const key of Object.keys(unread)) {
    if (key.startsWith(prefix)) ids.add(key.slice(prefix.length, key.lastIndexOf('/')));
  }
  return ids;
}

/**
 * Every id (or a longer prefix of it) of a list's items that have text kept in an unread cell: for each key
 * "<list>/<rest>", every part of <rest> before a "/" — a superset of the ids, since a field may itself hold a "/"
 * (a distance's receiver id). An item whose id is in it takes the full check. O(unread cells × key length).
 */
export function idsWithUnreadCells(unread: Readonly<Record<string, string>>, list: string): Set<string> {
  const ids = new Set<string>();
  const prefix = `${list}/`;
  for (const key of Object.keys(unread)) {
    if (!key.startsWith(prefix)) continue;
    for (let i = key.indexOf('/', prefix.length); i >= 0; i = key.indexOf('/', i + 1))
      ids.add(key.slice(prefix.length, i));
  }
  return ids;
}

/**
 * True when the field checks of one duty in ./validate-items.ts (name, phase, units, on-time, duration, source
 * height, a point location on the grid) would find nothing; duties with an on-time range, a line, area or distances
 * location, or an unread cell take the full check. The checks of its candidates (none, baseline, pins) are made by
 * the caller. O(1), no allocation.
 */
export function dutyIsClean(d: Obj, phaseIds: ReadonlySet<string>, unreadIds: ReadonlySet<string>): boolean {
  if (unreadIds.size > 0 && unreadIds.has(String(d.id))) return false;
  if (d.onTimeRangePct !== undefined) return false;
  const loc = d.location;
  if (typeof loc !== 'object' || loc === null || Array.isArray(loc)) return false;
  const l = loc as Obj;
  return (
    nonEmptyText(d.name) &&
    phaseIds.has(d.phaseId as string) &&
    numberOk(d.count, RULES.count) &&
    numberOk(d.onTimePct, RULES.onTimePct) &&
    numberOk(d.durationDays, RULES.durationDays) &&
    optionalOk(d.sourceHeightM, RULES.heightM) &&
    l.kind === 'point' &&
    numberOk(l.x, RULES.coordinateM) &&
    numberOk(l.y, RULES.coordinateM)
  );
}

function costIsClean(cost: unknown): boolean {
  if (typeof cost !== 'object' || cost === null || Array.isArray(cost)) return false;
  const c = cost as Obj;
  if (c.kind === 'hire')
    return (
      numberOk(c.dayRate, RULES.money) && optionalOk(c.weekRate, RULES.money) && optionalOk(c.monthRate, RULES.money)
    );
  if (c.kind !== 'purchase') return false;
  return (
    numberOk(c.price, RULES.money) &&
    numberOk(c.resaleValue, RULES.money) &&
    numberOk(c.lifeDays, RULES.lifeDays) &&
    (c.resaleValue as number) <= (c.price as number)
  );
}

function bandsAreClean(bands: unknown): boolean {
  if (bands === undefined) return true;
  if (!Array.isArray(bands) || bands.length !== 8) return false;
  for (let k = 0; k < 8; k++) if (!numberOk(bands[k], RULES.bandDb)) return false;
  return true;
}

/**
 * True when the checks of one candidate (duty, label, category, levels, bands,
 * declaration, origin, operator figures, character, energy, source, cost, flags) would
 * find nothing. Candidates with unread cells are never clean (their typed text must be
 * reported). O(1).
 * @example candidateIsClean({ dutyId: 'd1', label: 'Mini excavator', lwaDb: 93, … }, new Set(['d1']), new Set()) // true
 */
export function candidateIsClean(c: Obj, dutyIds: ReadonlySet<string>, unreadIds: ReadonlySet<string>): boolean {
  if (unreadIds.size > 0 && unreadIds.has(String(c.id))) return false;
  // Set-aside cost figures (version 9) are few: such a candidate takes the full check.
  if (c.setAsideCost !== undefined) return false;
  return (
    dutyIds.has(c.dutyId as string) &&
    nonEmptyText(c.label) &&
    typeof c.category === 'string' &&
    (c.directiveCategory === undefined || nonEmptyText(c.directiveCategory)) &&
    optionalOk(c.netPowerKw, RULES.netPowerKw) &&
    optionalOk(c.directiveQuantity, RULES.directiveQuantity) &&
    optionalOk(c.lwaDb, RULES.lwaDb) &&
    (c.declaration === 'guaranteed' || c.declaration === 'measured') &&
    optionalOk(c.uncertaintyDb, RULES.uncertaintyDb) &&
    (c.lwaOrigin === 'declared' ||
      c.lwaOrigin === 'from-watts' ||
      c.lwaOrigin === 'from-pressure' ||
      c.lwaOrigin === 'permissible-stand-in') &&
    bandsAreClean(c.bandsDb) &&
    !(c.lwaDb === undefined && c.bandsDb === undefined && c.lwaOrigin !== 'permissible-stand-in') &&
    optionalOk(c.operatorLpaDb, RULES.operatorLpaDb) &&
    optionalOk(c.operatorHoursPerDay, RULES.operatorHours) &&
    (c.character === 'none' || c.character === 'tonal' || c.character === 'impulsive') &&
    (c.energy === 'diesel' ||
      c.energy === 'petrol' ||
      c.energy === 'electric' ||
      c.energy === 'battery' ||
      c.energy === 'hybrid' ||
      c.energy === 'other') &&
    typeof c.source === 'string' &&
    costIsClean(c.cost) &&
    numberOk(c.runningPerDay, RULES.money) &&
    numberOk(c.fixedCharges, RULES.money) &&
    optionalBool(c.pinned) &&
    optionalBool(c.excluded) &&
    !(c.pinned === true && c.excluded === true) &&
    registerLinkIsClean(c.registerLink)
  );
}

/** No link, or a link naming a machine id and a cost basis. */
function registerLinkIsClean(link: unknown): boolean {
  if (link === undefined) return true;
  if (typeof link !== 'object' || link === null || Array.isArray(link)) return false;
  const l = link as Obj;
  return typeof l.machineId === 'string' && l.machineId.trim() !== '' && (l.basis === 'hire' || l.basis === 'purchase');
}

/**
 * `checkIds` of ./field-checks.ts for a long list, quickly when every id is a non-blank
 * text used once (nothing to report): the set of ids without writing a message per item.
 * Otherwise the full check runs and reports as before. O(items).
 */
export function checkIdsQuickly(
  p: ProblemList,
  listPath: string,
  kind: string,
  items: Obj[],
  nameKey = 'name',
): Set<string> {
  const ids = new Set<string>();
  for (const item of items) {
    const id = item.id;
    if (typeof id !== 'string' || id.trim() === '' || id === '__proto__' || ids.has(id))
      return checkIds(p, listPath, kind, items, nameKey);
    ids.add(id);
  }
  return ids;
}
