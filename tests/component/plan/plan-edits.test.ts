import { describe, expect, it } from 'vitest';
import {
  withBarrierAdded,
  withDistanceBy,
  withDutyArea,
  withItemMoved,
  withPlanImage,
  withoutBarrier,
  withVertexInserted,
  withVertexRemoved,
  sameItem,
  type VertexItem,
} from '../../../src/app/plan/plan-edits.ts';
import { twoDutyProject } from '../../unit/ledger/fixtures.ts';
import { validateProject } from '../../../src/ledger/validate/validate.ts';

describe('plan edits', () => {
  it('moving a receiver or a point duty changes its coordinates only, to the centimetre', () => {
    const p = twoDutyProject();
    const q = withItemMoved(p, { kind: 'receiver', id: 'r1' }, 1.23456, -2);
    expect([q.receivers[0]!.x, q.receivers[0]!.y]).toEqual([1.23, -2]);
    expect(q.duties).toBe(p.duties);
    const r = withItemMoved(p, { kind: 'duty', id: 'u1' }, 5, 5);
    expect(r.duties[0]!.location).toEqual({ kind: 'point', x: 25, y: 5 });
    expect(r.duties[1]).toBe(p.duties[1]);
  });

  it('an area moves whole, its shape and its distance rule kept', () => {
    const p = withDutyArea(
      twoDutyProject(),
      'u1',
      'polygon',
      [
        { x: 0, y: 0 },
        { x: 10, y: 0 },
        { x: 10, y: 10 },
      ],
      'centroid',
    );
    const q = withItemMoved(p, { kind: 'duty', id: 'u1' }, 1, 2);
    expect(q.duties[0]!.location).toEqual({
      kind: 'polygon',
      points: [
        { x: 1, y: 2 },
        { x: 11, y: 2 },
        { x: 11, y: 12 },
      ],
      distanceBy: 'centroid',
    });
    expect(withDistanceBy(q, 'u1', 'nearest').duties[0]!.location).toMatchObject({ distanceBy: 'nearest' });
  });

  it('barriers are added with the next free id, moved, and removed; the project stays valid', () => {
    const { next, id } = withBarrierAdded(
      twoDutyProject(),
      [
        { x: 0, y: 5 },
        { x: 30, y: 5.004 },
      ],
      2.4,
    );
    expect(id).toBe('b1');
    expect(next.barriers![0]).toEqual({
      id: 'b1',
      name: 'Barrier 1',
      heightM: 2.4,
      points: [
        { x: 0, y: 5 },
        { x: 30, y: 5 },
      ],
    });
    expect(validateProject(next)).toEqual([]);
    const second = withBarrierAdded(
      next,
      [
        { x: 0, y: 0 },
        { x: 1, y: 1 },
      ],
      3,
    );
    expect(second.id).toBe('b2');
    const moved = withItemMoved(second.next, { kind: 'barrier', id: 'b1' }, 0, 10);
    expect(moved.barriers![0]!.points).toEqual([
      { x: 0, y: 15 },
      { x: 30, y: 15 },
    ]);
    expect(withoutBarrier(moved, 'b1').barriers!.map((b) => b.id)).toEqual(['b2']);
  });

  it('a drawing is set and removed without touching anything else', () => {
    const p = twoDutyProject();
    const image = {
      dataUrl: 'data:image/png;base64,AAAA',
      fileName: 'site.png',
      widthPx: 10,
      heightPx: 10,
      metresPerPixel: 1,
      originPx: { x: 5, y: 5 },
      northDeg: 0,
    };
    const q = withPlanImage(p, image);
    expect(q.sitePlan).toEqual({ image });
    expect(withPlanImage(q, undefined)).toEqual(p);
  });

  describe('corner points of barriers, lines and areas', () => {
    const square = () =>
      withDutyArea(
        twoDutyProject(),
        'u1',
        'polygon',
        [
          { x: 0, y: 0 },
          { x: 10, y: 0 },
          { x: 10, y: 10 },
          { x: 0, y: 10 },
        ],
        'nearest',
      );
    const vertex = (owner: 'barrier' | 'duty', id: string, index: number): VertexItem => ({
      kind: 'vertex',
      owner,
      id,
      index,
    });

    it('moving one vertex of an area moves that point alone, to the centimetre', () => {
      const q = withItemMoved(square(), vertex('duty', 'u1', 2), 2.345, -1);
      const loc = q.duties[0]!.location;
      expect(loc.kind === 'polygon' && loc.points).toEqual([
        { x: 0, y: 0 },
        { x: 10, y: 0 },
        { x: 12.35, y: 9 },
        { x: 0, y: 10 },
      ]);
      expect(loc.kind === 'polygon' && loc.distanceBy).toBe('nearest');
    });

    it('moving a barrier vertex keeps its name, height and other points', () => {
      const { next } = withBarrierAdded(
        twoDutyProject(),
        [
          { x: 0, y: 5 },
          { x: 20, y: 5 },
        ],
        3,
        'Hoarding A',
      );
      const q = withItemMoved(next, vertex('barrier', 'b1', 0), 0, -5);
      expect(q.barriers![0]).toEqual({
        id: 'b1',
        name: 'Hoarding A',
        heightM: 3,
        points: [
          { x: 0, y: 0 },
          { x: 20, y: 5 },
        ],
      });
    });

    it('a vertex is inserted halfway along a segment; an area also along its closing side', () => {
      const mid = withVertexInserted(square(), 'duty', 'u1', 0)!;
      const loc = mid.next.duties[0]!.location;
      expect(loc.kind === 'polygon' && loc.points[1]).toEqual({ x: 5, y: 0 });
      expect(mid.vertex).toEqual(vertex('duty', 'u1', 1));
      const closing = withVertexInserted(square(), 'duty', 'u1', 3)!;
      const c = closing.next.duties[0]!.location;
      expect(c.kind === 'polygon' && c.points[4]).toEqual({ x: 0, y: 5 });
      const { next } = withBarrierAdded(
        twoDutyProject(),
        [
          { x: 0, y: 0 },
          { x: 20, y: 0 },
        ],
        3,
      );
      // a barrier is open: there is no segment after its last point
      expect(withVertexInserted(next, 'barrier', 'b1', 1)).toBeUndefined();
      expect(validateProject(mid.next)).toEqual([]);
    });

    it('a vertex is removed while the item keeps enough points, and refused in words below that', () => {
      const q = withVertexRemoved(square(), vertex('duty', 'u1', 1));
      expect(typeof q).not.toBe('string');
      const loc = (q as ReturnType<typeof square>).duties[0]!.location;
      expect(loc.kind === 'polygon' && loc.points.length).toBe(3);
      expect(withVertexRemoved(q as ReturnType<typeof square>, vertex('duty', 'u1', 0))).toMatch(
        /has 3 points, the fewest it can have/,
      );
      const { next } = withBarrierAdded(
        twoDutyProject(),
        [
          { x: 0, y: 0 },
          { x: 20, y: 0 },
        ],
        3,
      );
      expect(withVertexRemoved(next, vertex('barrier', 'b1', 1))).toMatch(/barrier has 2 points/);
    });

    it('sameItem tells vertices apart by owner and index', () => {
      expect(sameItem(vertex('duty', 'u1', 1), vertex('duty', 'u1', 1))).toBe(true);
      expect(sameItem(vertex('duty', 'u1', 1), vertex('duty', 'u1', 2))).toBe(false);
      expect(sameItem(vertex('barrier', 'u1', 1), vertex('duty', 'u1', 1))).toBe(false);
      expect(sameItem({ kind: 'duty', id: 'u1' }, vertex('duty', 'u1', 1))).toBe(false);
    });
  });
});
