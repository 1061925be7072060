/**
 * Boundary lines: the points along a line at which a limit clause is assessed, and a copy
 * of the project in which each point is a receiver, so the ledger's own propagation gives
 * every machine's level there.
 */
import type { Project, Receiver } from '../model/model.ts';
import type { Clause, SitePoint } from './clause.ts';
import { CLAUSE_DEFAULTS } from './clause.ts';

/** An assessment point of a boundary: where it is and how far along the line. */
export interface BoundaryPoint extends SitePoint {
  /** Distance from the line's first point, along the line, m. */
  chainageM: number;
}

/**
 * Points along a polyline no further apart than `spacingM`: every vertex, and each
 * segment divided into ceil(length / spacing) equal parts. One point gives itself.
 * O(length / spacing + vertices).
 * @example boundaryPoints([{ x: 0, y: 0 }, { x: 10, y: 0 }], 5) // (0,0), (5,0), (10,0)
 */
export function boundaryPoints(line: readonly SitePoint[], spacingM: number): BoundaryPoint[] {
  const first = line[0];
  if (!first) return [];
  const out: BoundaryPoint[] = [{ x: first.x, y: first.y, chainageM: 0 }];
  let chainage = 0;
  for (let i = 1; i < line.length; i++) {
    const a = line[i - 1] as SitePoint;
    const b = line[i] as SitePoint;
    const length = Math.hypot(b.x - a.x, b.y - a.y);
    if (length === 0) continue;
    const parts = Math.max(1, Math.ceil(length / spacingM - 1e-9));
    for (let k = 1; k <= parts; k++) {
      const t = k / parts;
      out.push({ x: a.x + t * (b.x - a.x), y: a.y + t * (b.y - a.y), chainageM: chainage + t * length });
    }
    chainage += length;
  }
  return out;
}

/** The id a boundary point has as a receiver of the assessment copy. */
export function boundaryReceiverId(clauseId: string, index: number): string {
  return `@boundary/${clauseId}/${index}`;
}

/** A limit clause that applies along a boundary, with readable points and spacing. */
export function isBoundaryClause(clause: Clause): boolean {
  return clause.kind === 'limit' && clause.area === 'boundary';
}

/** The assessment points of a boundary clause (none when its line or spacing is not readable). */
export function pointsOfClause(clause: Clause): BoundaryPoint[] {
  const line = clause.boundary ?? [];
  const spacing = clause.spacingM ?? CLAUSE_DEFAULTS.spacingM;
  if (!(spacing > 0) || line.some((p) => !Number.isFinite(p.x) || !Number.isFinite(p.y))) return [];
  return boundaryPoints(line, spacing);
}

/**
 * The project with every boundary clause's points added as receivers (no façade, no
 * screening, no limits of their own, at the clause's height), or undefined when no clause
 * needs one. O(points).
 */
export function withBoundaryReceivers(project: Project): Project | undefined {
  const extra: Receiver[] = [];
  for (const clause of project.clauses ?? []) {
    if (!isBoundaryClause(clause)) continue;
    const height = clause.heightM ?? CLAUSE_DEFAULTS.heightM;
    pointsOfClause(clause).forEach((p, k) => {
      extra.push({
        id: boundaryReceiverId(clause.id, k),
        name: `boundary point ${k + 1} (${p.x.toFixed(1)}, ${p.y.toFixed(1)})`,
        kind: 'other',
        x: p.x,
        y: p.y,
        heightM: Number.isFinite(height) ? height : CLAUSE_DEFAULTS.heightM,
        facade: false,
        limitsDb: {},
        screening: {},
      });
    });
  }
  if (extra.length === 0) return undefined;
  return { ...project, receivers: [...project.receivers, ...extra] };
}
