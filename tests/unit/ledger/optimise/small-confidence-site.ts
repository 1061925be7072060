/**
 * The small site of the confidence tests: three duties × three machines (loud and cheap,
 * middle, quiet and dear), two receivers, a day limit of 69 dB at the school: the
 * deterministic optimum sits close to the limits, so confidence costs. Invented values.
 */
import type { Project } from '../../../../src/ledger/model/model.ts';
import { candidate, duty, receiver, twoDutyProject } from '../fixtures.ts';

export function smallConfidenceSite(): Project {
  const p = twoDutyProject();
  const spots = [
    [20, 0],
    [0, 30],
    [-25, 10],
  ] as const;
  return {
    ...p,
    receivers: [
      receiver({ id: 'r1', limitsDb: { day: 72 } }),
      receiver({ id: 'r2', name: 'School', x: 10, y: 40, limitsDb: { day: 69 } }),
    ],
    duties: spots.map(([x, y], i) =>
      duty({ id: `u${i}`, name: `Duty ${i}`, location: { kind: 'point', x, y }, baselineCandidateId: `c${i}a` }),
    ),
    candidates: spots.flatMap((_, i) => [
      candidate({
        id: `c${i}a`,
        dutyId: `u${i}`,
        label: `D${i} loud`,
        lwaDb: 101,
        uncertaintyDb: 2,
        cost: { kind: 'hire', dayRate: 100 },
      }),
      candidate({
        id: `c${i}b`,
        dutyId: `u${i}`,
        label: `D${i} middle`,
        lwaDb: 98,
        uncertaintyDb: 2,
        cost: { kind: 'hire', dayRate: 140 + 10 * i },
      }),
      candidate({
        id: `c${i}c`,
        dutyId: `u${i}`,
        label: `D${i} quiet`,
        lwaDb: 94,
        uncertaintyDb: 2,
        cost: { kind: 'hire', dayRate: 220 + 15 * i },
      }),
    ]),
  };
}
