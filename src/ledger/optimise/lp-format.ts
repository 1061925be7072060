/**
 * Writes a {@link FleetProblem} as CPLEX LP-format text, the text form HiGHS reads.
 *
 * Variables: `x<d>_<k>` binary (duty d takes option k); `s` continuous, the largest
 * energy ratio to a limit, only when minimising it.
 * Rows: `a<d>` one option per duty; `c<i>` one per phase × receiver cell; `h<i>` one per
 * share clause (Σ weight·x ≥ least); `budget`.
 * Long rows are wrapped over several lines (the format allows a row to continue).
 * O(size of the model).
 */
import type { FleetProblem } from './problem.ts';

export interface LpSpec {
  /** `cost`: minimise Σ cost·x. `worst-ratio`: minimise s, the largest cell ratio. */
  objective: 'cost' | 'worst-ratio';
  /**
   * Right-hand side of every cell row, as an energy ratio to the limit (1 = at the limit).
   * Absent: the cells are not constrained (with `cost`), or bounded by s (with `worst-ratio`).
   */
  ratioCap?: number;
  /** Right-hand side of each cell row by cell index, overriding `ratioCap` (with `cost`; the confidence optimiser's tightened cells). */
  cellCaps?: readonly number[];
  /** Include the problem's budget row, when it has one. Default true. */
  useBudget?: boolean;
}

/** Name of the binary variable of duty d, option k. */
export function varName(duty: number, option: number): string {
  return `x${duty}_${option}`;
}

/** Name of the continuous worst-ratio variable. */
export const WORST_RATIO_VAR = 's';

const TERMS_PER_LINE = 8;

/** A coefficient as LP text: finite, full precision, exponent form allowed. */
function num(value: number): string {
  return String(value);
}

/** Joins signed terms `coef name` into wrapped lines. */
function linear(terms: readonly { coef: number; name: string }[]): string {
  if (terms.length === 0) return '0 ' + varName(0, 0);
  const parts = terms.map((t, i) => {
    const sign = t.coef < 0 ? '-' : i === 0 ? '' : '+';
    return `${sign}${sign ? ' ' : ''}${num(Math.abs(t.coef))} ${t.name}`;
  });
  const lines: string[] = [];
  for (let i = 0; i < parts.length; i += TERMS_PER_LINE) lines.push(parts.slice(i, i + TERMS_PER_LINE).join(' '));
  return lines.join('\n   ');
}

/**
 * The LP-format text of the problem under a spec.
 * @example lpText(problem, { objective: 'cost', ratioCap: 1 }) // "Minimize\n obj: 1200 x0_0 + …\nSubject To\n …\nEnd\n"
 */
export function lpText(problem: FleetProblem, spec: LpSpec): string {
  const out: string[] = ['Minimize'];
  if (spec.objective === 'cost') {
    const terms = problem.duties.flatMap((d, i) => d.options.map((o, k) => ({ coef: o.cost, name: varName(i, k) })));
    out.push(` obj: ${linear(terms)}`);
  } else {
    out.push(` obj: ${WORST_RATIO_VAR}`);
  }
  out.push('Subject To');
  problem.duties.forEach((d, i) => {
    out.push(` a${i}: ${linear(d.options.map((_, k) => ({ coef: 1, name: varName(i, k) })))} = 1`);
  });
  const boundByS = spec.objective === 'worst-ratio';
  if (boundByS || spec.ratioCap !== undefined || spec.cellCaps !== undefined) {
    problem.cells.forEach((cell, i) => {
      const terms = cell.terms.map((t) => ({ coef: t.ratio, name: varName(t.duty, t.option) }));
      if (boundByS) {
        out.push(` c${i}: ${linear([...terms, { coef: -1, name: WORST_RATIO_VAR }])} <= 0`);
      } else if (terms.length > 0) {
        const cap = spec.cellCaps?.[i] ?? spec.ratioCap;
        if (cap !== undefined) out.push(` c${i}: ${linear(terms)} <= ${num(cap)}`);
      }
    });
  }
  (problem.shares ?? []).forEach((share, i) => {
    const terms = share.terms
      .filter((t) => t.weight !== 0)
      .map((t) => ({ coef: t.weight, name: varName(t.duty, t.option) }));
    out.push(` h${i}: ${linear(terms)} >= ${num(share.least)}`);
  });
  if ((spec.useBudget ?? true) && problem.budget !== undefined) {
    const terms = problem.duties.flatMap((d, i) => d.options.map((o, k) => ({ coef: o.cost, name: varName(i, k) })));
    out.push(` budget: ${linear(terms)} <= ${num(problem.budget)}`);
  }
  out.push('Bounds');
  if (boundByS) {
    out.push(` 0 <= ${WORST_RATIO_VAR} <= ${spec.ratioCap !== undefined ? num(spec.ratioCap) : '+inf'}`);
  }
  out.push('Binary');
  const names = problem.duties.flatMap((d, i) => d.options.map((_, k) => varName(i, k)));
  for (let i = 0; i < names.length; i += TERMS_PER_LINE * 2)
    out.push(' ' + names.slice(i, i + TERMS_PER_LINE * 2).join(' '));
  out.push('End');
  return out.join('\n') + '\n';
}
