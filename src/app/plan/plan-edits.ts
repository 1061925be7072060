/**
 * Edits made on the site plan, as pure functions from one project to the next (the
 * Workspace commits each as one undo step). Positions are site-grid metres; nothing here
 * computes a level.
 */
import type { AreaDistanceBy, Barrier, Duty, PlanImage, Project, SitePoint } from '../../ledger/model/model.ts';

/** What can be selected on the plan: a whole item, or one corner point of a barrier, line or area. */
export type PlanItem =
  { kind: 'receiver'; id: string } | { kind: 'duty'; id: string } | { kind: 'barrier'; id: string } | VertexItem;

/** Point `index` of a barrier's polyline or of a duty's line or area. */
export interface VertexItem {
  kind: 'vertex';
  owner: 'barrier' | 'duty';
  id: string;
  index: number;
}

/** Whether two selections are the same item (a vertex also by its owner and index). */
export function sameItem(a: PlanItem | undefined, b: PlanItem | undefined): boolean {
  if (!a || !b || a.kind !== b.kind || a.id !== b.id) return false;
  return a.kind !== 'vertex' || (b.kind === 'vertex' && a.owner === b.owner && a.index === b.index);
}

/** The item a vertex belongs to (the item itself for anything else). */
export function ownerOf(item: PlanItem): PlanItem {
  return item.kind === 'vertex' ? { kind: item.owner, id: item.id } : item;
}

/** The fewest points a barrier (2), a line (2) or an area (3) keeps. */
function leastPoints(project: Project, item: VertexItem): number {
  if (item.owner === 'barrier') return 2;
  const d = project.duties.find((x) => x.id === item.id);
  return d?.location.kind === 'polygon' ? 3 : 2;
}

/** The points of a vertex's owner, or undefined when it has none (a point duty, stated distances, gone). */
export function ownerPoints(project: Project, owner: 'barrier' | 'duty', id: string): readonly SitePoint[] | undefined {
  if (owner === 'barrier') return (project.barriers ?? []).find((b) => b.id === id)?.points;
  const loc = project.duties.find((d) => d.id === id)?.location;
  return loc && (loc.kind === 'line' || loc.kind === 'polygon') ? loc.points : undefined;
}

/** The project with the owner's points replaced by `change(points)` (rounded to the centimetre). */
function withOwnerPoints(
  project: Project,
  owner: 'barrier' | 'duty',
  id: string,
  change: (points: readonly SitePoint[]) => SitePoint[],
): Project {
  const round = (ps: SitePoint[]) => ps.map((p) => ({ x: roundM(p.x), y: roundM(p.y) }));
  if (owner === 'barrier')
    return {
      ...project,
      barriers: (project.barriers ?? []).map((b) => (b.id === id ? { ...b, points: round(change(b.points)) } : b)),
    };
  return {
    ...project,
    duties: project.duties.map((d) =>
      d.id === id && (d.location.kind === 'line' || d.location.kind === 'polygon')
        ? { ...d, location: { ...d.location, points: round(change(d.location.points)) } }
        : d,
    ),
  };
}

/** The project with one vertex moved by (dx, dy); the item's other points stay. */
export function withVertexMoved(project: Project, item: VertexItem, dx: number, dy: number): Project {
  return withOwnerPoints(project, item.owner, item.id, (ps) =>
    ps.map((p, i) => (i === item.index ? { x: p.x + dx, y: p.y + dy } : p)),
  );
}

/**
 * The project with a vertex removed, or a sentence saying why not (a barrier or line keeps
 * 2 points, an area 3).
 */
export function withVertexRemoved(project: Project, item: VertexItem): Project | string {
  const points = ownerPoints(project, item.owner, item.id);
  if (!points || !points[item.index]) return 'That point is no longer there.';
  const least = leastPoints(project, item);
  if (points.length <= least)
    return `This ${item.owner === 'barrier' ? 'barrier' : least === 3 ? 'area' : 'line'} has ${points.length} points, the fewest it can have; delete the whole item instead.`;
  return withOwnerPoints(project, item.owner, item.id, (ps) => ps.filter((_, i) => i !== item.index));
}

/**
 * The project with a new vertex halfway along the segment from point `after` to the next one
 * (for an area, the last point's segment closes back to the first); returns the new vertex.
 */
export function withVertexInserted(
  project: Project,
  owner: 'barrier' | 'duty',
  id: string,
  after: number,
): { next: Project; vertex: VertexItem } | undefined {
  const points = ownerPoints(project, owner, id);
  const a = points?.[after];
  const b = points?.[(after + 1) % (points?.length ?? 1)];
  const closed = owner === 'duty' && project.duties.find((d) => d.id === id)?.location.kind === 'polygon';
  if (!points || !a || !b || (after === points.length - 1 && !closed)) return undefined;
  const mid = { x: (a.x + b.x) / 2, y: (a.y + b.y) / 2 };
  const next = withOwnerPoints(project, owner, id, (ps) => [...ps.slice(0, after + 1), mid, ...ps.slice(after + 1)]);
  return { next, vertex: { kind: 'vertex', owner, id, index: after + 1 } };
}

/** Rounds a coordinate to the centimetre, so a drag does not store 15 decimals. */
export const roundM = (v: number): number => Math.round(v * 100) / 100;

/** The project with a receiver moved to (x, y). */
export function withReceiverAt(project: Project, id: string, at: SitePoint): Project {
  return {
    ...project,
    receivers: project.receivers.map((r) => (r.id === id ? { ...r, x: roundM(at.x), y: roundM(at.y) } : r)),
  };
}

/** A duty moved by (dx, dy): a point moves, a line or area moves whole; stated distances do not move. */
function dutyMovedBy(d: Duty, dx: number, dy: number): Duty {
  const loc = d.location;
  if (loc.kind === 'point') return { ...d, location: { ...loc, x: roundM(loc.x + dx), y: roundM(loc.y + dy) } };
  if (loc.kind === 'line' || loc.kind === 'polygon')
    return {
      ...d,
      location: { ...loc, points: loc.points.map((p) => ({ x: roundM(p.x + dx), y: roundM(p.y + dy) })) },
    };
  return d;
}

/** The project with a duty moved by (dx, dy). */
export function withDutyMoved(project: Project, id: string, dx: number, dy: number): Project {
  return { ...project, duties: project.duties.map((d) => (d.id === id ? dutyMovedBy(d, dx, dy) : d)) };
}

/** The project with a barrier moved by (dx, dy). */
export function withBarrierMoved(project: Project, id: string, dx: number, dy: number): Project {
  return {
    ...project,
    barriers: (project.barriers ?? []).map((b) =>
      b.id === id ? { ...b, points: b.points.map((p) => ({ x: roundM(p.x + dx), y: roundM(p.y + dy) })) } : b,
    ),
  };
}

/** The project with an item moved by (dx, dy) (a receiver, a duty, a barrier or one vertex). */
export function withItemMoved(project: Project, item: PlanItem, dx: number, dy: number): Project {
  if (item.kind === 'vertex') return withVertexMoved(project, item, dx, dy);
  if (item.kind === 'receiver') {
    const r = project.receivers.find((x) => x.id === item.id);
    return r ? withReceiverAt(project, r.id, { x: r.x + dx, y: r.y + dy }) : project;
  }
  if (item.kind === 'duty') return withDutyMoved(project, item.id, dx, dy);
  return withBarrierMoved(project, item.id, dx, dy);
}

/** The next free id with a prefix, e.g. "b3". */
function nextId(prefix: string, taken: Iterable<string>): string {
  const used = new Set(taken);
  let n = 1;
  while (used.has(`${prefix}${n}`)) n++;
  return `${prefix}${n}`;
}

/** The project with a new barrier along `points` with a top height; returns its id. */
export function withBarrierAdded(
  project: Project,
  points: readonly SitePoint[],
  heightM: number,
  name?: string,
): { next: Project; id: string } {
  const barriers = project.barriers ?? [];
  const id = nextId(
    'b',
    barriers.map((b) => b.id),
  );
  const barrier: Barrier = {
    id,
    name: name ?? `Barrier ${id.slice(1)}`,
    heightM,
    points: points.map((p) => ({ x: roundM(p.x), y: roundM(p.y) })),
  };
  return { next: { ...project, barriers: [...barriers, barrier] }, id };
}

/** The project with a barrier's name or height changed (a height that is not a number is kept as typed). */
export function withBarrierChanged(
  project: Project,
  id: string,
  patch: Partial<Pick<Barrier, 'name' | 'heightM'>>,
): Project {
  return { ...project, barriers: (project.barriers ?? []).map((b) => (b.id === id ? { ...b, ...patch } : b)) };
}

/** The project without a barrier. */
export function withoutBarrier(project: Project, id: string): Project {
  return { ...project, barriers: (project.barriers ?? []).filter((b) => b.id !== id) };
}

/** The project with a duty's work area drawn as a line or polygon. */
export function withDutyArea(
  project: Project,
  id: string,
  kind: 'line' | 'polygon',
  points: readonly SitePoint[],
  distanceBy: AreaDistanceBy,
): Project {
  const pts = points.map((p) => ({ x: roundM(p.x), y: roundM(p.y) }));
  return {
    ...project,
    duties: project.duties.map((d) => (d.id === id ? { ...d, location: { kind, points: pts, distanceBy } } : d)),
  };
}

/** The project with a duty placed at a point (from a table of distances or to replace an area). */
export function withDutyAtPoint(project: Project, id: string, at: SitePoint): Project {
  return {
    ...project,
    duties: project.duties.map((d) =>
      d.id === id ? { ...d, location: { kind: 'point', x: roundM(at.x), y: roundM(at.y) } } : d,
    ),
  };
}

/** The project with how a line's or area's distance is taken changed. */
export function withDistanceBy(project: Project, id: string, distanceBy: AreaDistanceBy): Project {
  return {
    ...project,
    duties: project.duties.map((d) =>
      d.id === id && (d.location.kind === 'line' || d.location.kind === 'polygon')
        ? { ...d, location: { ...d.location, distanceBy } }
        : d,
    ),
  };
}

/** The project with its drawing set, changed or removed. */
export function withPlanImage(project: Project, image: PlanImage | undefined): Project {
  const { sitePlan: _old, ...rest } = project;
  return image ? { ...rest, sitePlan: { ...project.sitePlan, image } } : rest;
}
