/**
 * Test and benchmark fixture: a random site project evaluated by the real evaluation
 * (simple point-source propagation, Q = 2). Invented numbers: machines with LWA 90–115 dB,
 * receivers 15–250 m away, day hire rates that rise as machines get quieter. Limits are set
 * between the quietest and the baseline fleet's levels so that the choice is tight.
 */
import type { Candidate, Project } from '../../../../src/ledger/model/model.ts';
import { PROJECT_FORMAT, PROJECT_VERSION } from '../../../../src/ledger/model/model.ts';
import type { Evaluation } from '../../../../src/ledger/model/results.ts';
import { evaluateProject } from '../../../../src/ledger/prediction/evaluate.ts';
import { dbSum } from '../../../../src/core/decibel.ts';
import { rng } from './table-project.ts';

export interface SiteSize {
  duties: number;
  candidates: number;
  receivers: number;
  phases: number;
}

/** Builds the project and evaluates it (baseline fleet). */
export function siteProject(size: SiteSize, seed: number): { project: Project; evaluation: Evaluation } {
  const r = rng(seed);
  const phases = Array.from({ length: size.phases }, (_, p) => ({
    id: `ph${p}`,
    name: `Phase ${p + 1}`,
    periodId: 'day',
    start: '08:00',
    end: '18:00',
  }));
  const receivers = Array.from({ length: size.receivers }, (_, i) => {
    const angle = r() * 2 * Math.PI;
    const distance = 40 + r() * 200;
    return {
      id: `rc${i}`,
      name: `Receiver ${i + 1}`,
      kind: 'home' as const,
      x: distance * Math.cos(angle),
      y: distance * Math.sin(angle),
      heightM: 4,
      facade: true,
      limitsDb: { day: 70 },
      screening: {},
    };
  });
  const duties = Array.from({ length: size.duties }, (_, d) => ({
    id: `du${d}`,
    name: `Duty ${d + 1}`,
    phaseId: `ph${d % size.phases}`,
    count: 1 + Math.floor(r() * 2),
    onTimePct: 50 + Math.round(r() * 50),
    durationDays: 5 + Math.floor(r() * 40),
    location: { kind: 'point' as const, x: (r() - 0.5) * 60, y: (r() - 0.5) * 60 },
    baselineCandidateId: `du${d}c0`,
  }));
  const candidates: Candidate[] = duties.flatMap((duty) => {
    const loud = 100 + r() * 15;
    const rate = 80 + r() * 400;
    return Array.from({ length: size.candidates }, (_, k) => {
      const quieter = k === 0 ? 0 : r() * 14;
      return {
        id: `${duty.id}c${k}`,
        dutyId: duty.id,
        label: `${duty.name} option ${k + 1}`,
        category: 'test',
        lwaDb: Math.round((loud - quieter) * 10) / 10,
        declaration: 'guaranteed' as const,
        lwaOrigin: 'declared' as const,
        character: 'none' as const,
        energy: k % 3 === 0 ? ('diesel' as const) : ('electric' as const),
        source: 'invented for tests',
        cost: {
          kind: 'hire' as const,
          dayRate: Math.round(rate * (1 + quieter * (0.04 + r() * 0.12)) * (0.9 + r() * 0.2)),
        },
        runningPerDay: Math.round(20 + r() * 40),
        fixedCharges: 100,
      };
    });
  });
  const project: Project = {
    format: PROJECT_FORMAT,
    version: PROJECT_VERSION,
    name: `Random site ${seed}`,
    currency: 'GBP',
    propagation: { method: 'simple', q: 2 },
    settings: { referenceDistanceM: 10, characterPenaltyDb: 0, levelBasis: 'guaranteed', decimalSeparator: '.' },
    periods: [{ id: 'day', name: 'Weekday daytime', start: '07:00', end: '19:00' }],
    phases,
    receivers,
    duties,
    candidates,
  };
  // Limits between the quietest and the baseline level of each receiver's loudest phase.
  const first = evaluateProject(project);
  for (const rc of receivers) {
    let baseline = -Infinity;
    let quietest = -Infinity;
    for (const ph of phases) {
      const here = duties.filter((d) => d.phaseId === ph.id);
      baseline = Math.max(baseline, dbSum(here.map((d) => first.contributionDb(d.baselineCandidateId, rc.id))));
      quietest = Math.max(
        quietest,
        dbSum(
          here.map((d) =>
            Math.min(...candidates.filter((c) => c.dutyId === d.id).map((c) => first.contributionDb(c.id, rc.id))),
          ),
        ),
      );
    }
    rc.limitsDb.day = Math.round(Math.max(quietest + 0.5 + r() * 2, baseline - 1 - r() * 6) * 10) / 10;
  }
  return { project, evaluation: evaluateProject(project) };
}
