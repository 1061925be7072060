/**
 * Validation of a project's tender clauses: every problem with its JSON path
 * ("$.clauses[2].maxDb"), the value and what is accepted. Only the parameters a clause's
 * kind reads are required; the others may hold anything the user typed for another kind.
 * Never throws. O(clauses × (points + names)).
 */
import { ProblemList, checkIds } from '../validate/field-checks.ts';
import { RULES, CLOCK_ACCEPTED } from '../validate/validate-rules.ts';
import { minutesOfDay } from '../prediction/clock.ts';
import { CLAUSE_KINDS } from './clause.ts';
import { CLAUSE_RULES } from './clause-rules.ts';

type Obj = Record<string, unknown>;
const asObj = (x: unknown): Obj => (typeof x === 'object' && x !== null && !Array.isArray(x) ? (x as Obj) : {});

const ENERGIES = ['diesel', 'petrol', 'electric', 'battery', 'hybrid', 'other'];

/** Known ids of the lists clauses refer to. */
export interface ClauseRefs {
  receiverIds: ReadonlySet<string>;
  dutyIds: ReadonlySet<string>;
  periodIds: ReadonlySet<string>;
}

/** Where a clause is, in words: `Clause "7.3.2"` or `Clause 3`. */
export function clauseWords(clause: Obj, index: number): string {
  const ref = clause.ref;
  return typeof ref === 'string' && ref.trim() !== '' ? `Clause ${JSON.stringify(ref)}` : `Clause ${index + 1}`;
}

function idList(
  p: ProblemList,
  path: string,
  where: string,
  value: unknown,
  known: ReadonlySet<string>,
  what: string,
): void {
  if (value === undefined) return;
  if (!p.list(path, where, value)) return;
  value.forEach((id, k) => {
    if (typeof id !== 'string' || !known.has(id)) {
      p.add(
        `${path}[${k}]`,
        where,
        id,
        `is not ${what} of this project`,
        `use one of ${[...known].map((x) => JSON.stringify(x)).join(', ') || `the ids of the project’s ${what}s`}`,
      );
    }
  });
}

/** Adds every problem of `root.clauses` (absent is fine: no clauses) to `p`. */
export function validateClauses(p: ProblemList, clausesValue: unknown, refs: ClauseRefs): void {
  if (clausesValue === undefined) return;
  if (!p.list('$.clauses', 'Clauses', clausesValue)) return;
  const clauses = clausesValue.map(asObj);
  checkIds(p, '$.clauses', 'Clause', clauses, 'ref');
  clauses.forEach((c, i) => {
    const path = `$.clauses[${i}]`;
    const where = clauseWords(c, i);
    const cell = (f: string) => `clauses/${String(c.id)}/${f}`;
    p.text(`${path}.ref`, `${where}, number`, c.ref, false, 'the tender’s clause number, e.g. "7.3.2"');
    p.text(`${path}.text`, `${where}, text`, c.text, false, 'the clause as the tender words it');
    if (c.statement !== undefined) p.text(`${path}.statement`, `${where}, statement`, c.statement, false, 'text');
    if (!p.oneOf(`${path}.kind`, `${where}, kind`, c.kind, CLAUSE_KINDS)) return;
    const dutiesOk = () => idList(p, `${path}.dutyIds`, `${where}, duties`, c.dutyIds, refs.dutyIds, 'a duty');
    switch (c.kind) {
      case 'limit': {
        if (c.area !== undefined) p.oneOf(`${path}.area`, `${where}, applies at`, c.area, ['receivers', 'boundary']);
        if (c.metric !== undefined) p.oneOf(`${path}.metric`, `${where}, quantity`, c.metric, ['laeq', 'rating']);
        if (typeof c.periodId !== 'string' || !refs.periodIds.has(c.periodId)) {
          p.add(
            `${path}.periodId`,
            `${where}, period`,
            c.periodId,
            c.periodId === undefined ? 'is missing' : 'is not a period of this project',
            `use one of ${[...refs.periodIds].map((x) => JSON.stringify(x)).join(', ') || 'the periods’ ids (add a period first)'}`,
          );
        }
        p.number(`${path}.limitDb`, `${where}, limit`, c.limitDb, RULES.limitDb, cell('limitDb'));
        if (c.area === 'boundary') {
          p.optionalNumber(
            `${path}.spacingM`,
            `${where}, spacing`,
            c.spacingM,
            CLAUSE_RULES.spacingM,
            cell('spacingM'),
          );
          p.optionalNumber(`${path}.heightM`, `${where}, height`, c.heightM, RULES.heightM, cell('heightM'));
          if (p.isUnread(cell('boundary'))) {
            p.add(
              `${path}.boundary`,
              `${where}, boundary`,
              'as typed',
              'could not be read',
              CLAUSE_RULES.boundaryAccepted,
            );
          } else if (p.list(`${path}.boundary`, `${where}, boundary`, c.boundary)) {
            if (c.boundary.length === 0)
              p.add(`${path}.boundary`, `${where}, boundary`, [], 'has no point', CLAUSE_RULES.boundaryAccepted);
            c.boundary.forEach((pt, k) => {
              const o = asObj(pt);
              p.number(`${path}.boundary[${k}].x`, `${where}, boundary point ${k + 1}, x`, o.x, RULES.coordinateM);
              p.number(`${path}.boundary[${k}].y`, `${where}, boundary point ${k + 1}, y`, o.y, RULES.coordinateM);
            });
          }
        } else {
          idList(p, `${path}.receiverIds`, `${where}, receivers`, c.receiverIds, refs.receiverIds, 'a receiver');
        }
        break;
      }
      case 'lwa-cap':
        p.number(`${path}.maxDb`, `${where}, cap`, c.maxDb, CLAUSE_RULES.capDb, cell('maxDb'));
        dutiesOk();
        break;
      case 'lp-cap':
        p.number(`${path}.maxDb`, `${where}, cap`, c.maxDb, CLAUSE_RULES.capDb, cell('maxDb'));
        p.optionalNumber(`${path}.distanceM`, `${where}, distance`, c.distanceM, RULES.distanceM, cell('distanceM'));
        dutiesOk();
        break;
      case 'hours': {
        if (c.character !== undefined)
          p.oneOf(`${path}.character`, `${where}, character`, c.character, ['impulsive', 'tonal', 'any']);
        const s = minutesOfDay(c.start);
        const e = minutesOfDay(c.end);
        if (Number.isNaN(s) || c.start === '24:00')
          p.add(
            `${path}.start`,
            `${where}, allowed from`,
            c.start,
            c.start === undefined ? 'is missing' : 'is not a time of day',
            CLOCK_ACCEPTED,
          );
        if (Number.isNaN(e))
          p.add(
            `${path}.end`,
            `${where}, allowed until`,
            c.end,
            c.end === undefined ? 'is missing' : 'is not a time of day',
            CLOCK_ACCEPTED,
          );
        if (!Number.isNaN(s) && !Number.isNaN(e) && s === e)
          p.add(
            `${path}.end`,
            `${where}, allowed until`,
            c.end,
            'is the same as the start',
            'use an end other than the start (an end before the start runs past midnight)',
          );
        dutiesOk();
        break;
      }
      case 'share':
        if (c.basis !== undefined) p.oneOf(`${path}.basis`, `${where}, counted by`, c.basis, ['count', 'hours']);
        p.number(`${path}.minPct`, `${where}, least share`, c.minPct, CLAUSE_RULES.sharePct, cell('minPct'));
        if (c.energies !== undefined && p.list(`${path}.energies`, `${where}, energies`, c.energies)) {
          if (c.energies.length === 0)
            p.add(
              `${path}.energies`,
              `${where}, energies`,
              [],
              'names no energy',
              `use one or more of ${ENERGIES.join(', ')}`,
            );
          c.energies.forEach((e, k) => p.oneOf(`${path}.energies[${k}]`, `${where}, energies`, e, ENERGIES));
        }
        dutiesOk();
        break;
      case 'statement':
        break;
    }
  });
}
