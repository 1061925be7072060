/**
 * View model of the trade-off chart: the curve's points and the three marked fleets
 * (baseline, best-buy-first fleet, chosen), read from the optimiser's result. Formatting and
 * look-ups only; the worst-case levels come from the ledger (the optimiser's figures, or
 * the ledger's evaluation of a marked fleet when the result does not carry its level).
 */
import type { Fleet, Project } from '../../ledger/model/model.ts';
import type { FleetOutcome, MatrixCell, OptimiseResult } from '../../ledger/model/results.ts';
import { evaluateProject } from '../../ledger/prediction/evaluate.ts';

export type MarkKind = 'baseline' | 'hand' | 'best';

export interface TradeOffPointView {
  cost: number;
  /** Level at the cell with the least margin, dB; NaN when not known. */
  levelDb: number;
  /** Least margin (limit − level), dB. */
  marginDb: number;
  /** How far the worst-case level lies above its limit, dB: the margin with its sign turned (negative = headroom). */
  excessDb: number;
  compliant: boolean;
}

export interface TradeOffMarkView extends TradeOffPointView {
  kinds: MarkKind[];
  label: string;
}

/** The fleets a chart marks, and the curve whose points may give their worst-case levels. */
export type MarkedFleets = Pick<OptimiseResult, 'best' | 'hand' | 'baseline' | 'tradeOff'>;

const MARK_LABEL: Record<MarkKind, string> = {
  baseline: 'Baseline',
  hand: 'Best-buy-first fleet',
  best: 'Chosen fleet',
};

function sameFleet(a: Fleet, b: Fleet): boolean {
  const ka = Object.keys(a);
  if (ka.length !== Object.keys(b).length) return false;
  return ka.every((k) => a[k] === b[k]);
}

/**
 * The level at the cell with the least margin for a fleet, read from the ledger's
 * evaluation of that fleet (the same definition as the optimiser's worst-case level).
 * NaN when no cell has a limit or a level is not computed. O(evaluation).
 */
export function worstLevelOfFleet(project: Project, fleet: Fleet): number {
  const evaluation = evaluateProject(project, fleet, { skipValidation: true });
  let worst: MatrixCell | undefined;
  for (const cell of evaluation.matrix) {
    if (cell.marginDb === undefined) continue;
    if (Number.isNaN(cell.marginDb)) return NaN;
    if (worst === undefined || cell.marginDb < (worst.marginDb as number)) worst = cell;
  }
  return worst ? worst.levelDb : NaN;
}

/**
 * The worst-case level of a marked fleet: its own figure when the ledger gives one, else
 * the matching curve point's, else (with the project) the ledger's evaluation of the fleet.
 */
function levelOf(outcome: FleetOutcome, result: MarkedFleets, project: Project | undefined): number {
  const own = (outcome as FleetOutcome & { worstLevelDb?: number }).worstLevelDb;
  if (typeof own === 'number' && !Number.isNaN(own)) return own;
  const match = result.tradeOff.find((p) => sameFleet(p.fleet, outcome.fleet));
  if (match) return match.worstLevelDb;
  return project ? worstLevelOfFleet(project, outcome.fleet) : NaN;
}

/** Points of the trade-off curve, in order of cost, with a finite cost and margin only. O(n log n). */
export function tradeOffCurvePoints(result: OptimiseResult): TradeOffPointView[] {
  return result.tradeOff
    .filter((p) => Number.isFinite(p.cost) && Number.isFinite(p.worstMarginDb))
    .map((p) => ({
      cost: p.cost,
      levelDb: p.worstLevelDb,
      marginDb: p.worstMarginDb,
      excessDb: -p.worstMarginDb,
      compliant: p.worstMarginDb >= 0,
    }))
    .sort((a, b) => a.cost - b.cost || a.marginDb - b.marginDb);
}

/**
 * The marked fleets; fleets that coincide (same fleet) share one mark with a joined label,
 * e.g. "Chosen fleet = Best-buy-first fleet". Marks without a finite cost and margin are left out.
 */
export function tradeOffMarks(result: MarkedFleets, project?: Project): TradeOffMarkView[] {
  const entries: [MarkKind, FleetOutcome & { compliant?: boolean }][] = [
    ['best', result.best],
    ['hand', result.hand],
    ['baseline', result.baseline],
  ];
  const marks: (TradeOffMarkView & { fleet: Fleet })[] = [];
  for (const [kind, outcome] of entries) {
    const levelDb = levelOf(outcome, result, project);
    if (!Number.isFinite(outcome.cost) || !Number.isFinite(outcome.worstMarginDb)) continue;
    const same = marks.find((m) => sameFleet(m.fleet, outcome.fleet));
    if (same) {
      same.kinds.push(kind);
      same.label = same.kinds.map((k) => MARK_LABEL[k]).join(' = ');
      continue;
    }
    marks.push({
      kinds: [kind],
      label: MARK_LABEL[kind],
      cost: outcome.cost,
      levelDb,
      marginDb: outcome.worstMarginDb,
      excessDb: -outcome.worstMarginDb,
      compliant: outcome.over.length === 0 && outcome.worstMarginDb >= 0,
      fleet: outcome.fleet,
    });
  }
  return marks.map((m) => ({
    kinds: m.kinds,
    label: m.label,
    cost: m.cost,
    levelDb: m.levelDb,
    marginDb: m.marginDb,
    excessDb: m.excessDb,
    compliant: m.compliant,
  }));
}
