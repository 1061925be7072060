/**
 * The candidate table's directive, declaration, penalty and exposure columns, read through
 * the Workspace on the invented demo project. Expected figures carry their source:
 * Directive 2000/14/EC Article 12 (as amended by 2005/88/EC) for permissible levels,
 * ISO 4871 for the declared pair (L, K), ISO 9612 for L_EX,8h, Directive 2003/10/EC
 * Article 3 for the action and limit values.
 */
import { describe, expect, it } from 'vitest';
import { Workspace } from '../../../src/app/state/workspace.svelte.ts';
import { demoProject } from '../../../src/ledger/model/demo.ts';
import { REFERENCE_RECEIVER_ID, type Candidate } from '../../../src/ledger/model/model.ts';

/** Tolerance for levels compared with hand-worked values, dB. */
const TOL_DB = 0.05;

function cellText(ws: Workspace, candidateId: string, columnId: string): string {
  const column = ws.candidateTable.columns.find((c) => c.id === columnId);
  if (!column) throw new Error(`no column ${columnId}`);
  return column.display(ws.project.candidates.find((c) => c.id === candidateId) as Candidate);
}

const candidate = (ws: Workspace, id: string) => ws.project.candidates.find((c) => c.id === id) as Candidate;

describe('candidate table: directive and declaration columns', () => {
  it('LWA used of a machine without a declared LWA reads "101.0 (stand-in)" with the reason as the cell message', () => {
    const ws = new Workspace(demoProject());
    // Directive 2000/14/EC Art. 12 item 3 (dumpers), Stage II, P ≤ 55 kW: 101 dB; demo dumper 40 kW.
    expect(cellText(ws, 'dump-unlisted', 'ratedLwa')).toBe('101.0 (stand-in)');
    expect(ws.problem('candidates', 'dump-unlisted', 'ratedLwa')).toMatch(/^Stand-in: no declared LWA/);
    expect(cellText(ws, 'dump-unlisted', 'flags')).toContain('stand-in LWA');
    // A declared machine is not marked.
    expect(cellText(ws, 'dump-9t', 'ratedLwa')).toBe('103.0');
    expect(ws.problem('candidates', 'dump-9t', 'ratedLwa')).toBeUndefined();
  });

  it('Permissible LWA of a 120 kW excavator declared at 105 dB reads "103 (over)" and flags "over permissible"', () => {
    const ws = new Workspace(demoProject());
    // Directive 2000/14/EC Art. 12 item 4, Stage II: 80 + 11·lg 120 = 102.87 → 103 dB (rounded to the nearest integer).
    expect(cellText(ws, 'shell-21t', 'permissibleLwa')).toBe('103 (over)');
    expect(ws.problem('candidates', 'shell-21t', 'permissibleLwa')).toMatch(/over the permissible 103 dB by 2\.0 dB/);
    expect(cellText(ws, 'shell-21t', 'flags')).toContain('over permissible');
    // The 101 dB low-noise version of the same machine is under it.
    expect(cellText(ws, 'shell-21t-quiet', 'permissibleLwa')).toBe('103');
    expect(cellText(ws, 'shell-21t-quiet', 'flags')).not.toContain('over permissible');
  });

  it('Directive type accepts a type word, clears with "none", and keeps unknown text with a message', () => {
    const ws = new Workspace(demoProject());
    const id = 'pile-vibro';
    ws.applyCellTexts('candidates', [{ rowId: id, columnId: 'directiveCategory', text: 'compressor' }]);
    expect(candidate(ws, id).directiveCategory).toBe('compressor');
    ws.applyCellTexts('candidates', [{ rowId: id, columnId: 'netPowerKw', text: '20' }]);
    // Directive 2000/14/EC Art. 12 item 8 (compressors), Stage II, P > 15 kW: 95 + 2·lg 20 = 97.60 → 98 dB.
    expect(cellText(ws, id, 'permissibleLwa')).toBe('98 (over)');
    ws.applyCellTexts('candidates', [{ rowId: id, columnId: 'directiveCategory', text: 'none' }]);
    expect(candidate(ws, id).directiveCategory).toBeUndefined();
    expect(cellText(ws, id, 'permissibleLwa')).toBe('');
    ws.applyCellTexts('candidates', [{ rowId: id, columnId: 'directiveCategory', text: 'pile driver' }]);
    expect(ws.rawText('candidates', id, 'directiveCategory')).toBe('pile driver');
    expect(ws.problem('candidates', id, 'directiveCategory')).toMatch(
      /^"[^"]+" \(row \d+\), Directive type: "pile driver" is not a directive type \(use none or a Directive 2000\/14\/EC type/,
    );
  });

  it('Size for limit gives a generator its permissible level from the electric power', () => {
    const ws = new Workspace(demoProject());
    const id = 'power-diesel';
    ws.applyCellTexts('candidates', [{ rowId: id, columnId: 'directiveQuantity', text: '8 kW' }]);
    expect(candidate(ws, id).directiveQuantity).toBe(8);
    // Directive 2000/14/EC Art. 12 item 7 (generators), Stage II, 2 < Pel ≤ 10 kW: 96 + lg 8 = 96.90 → 97 dB.
    expect(cellText(ws, id, 'permissibleLwa')).toBe('97');
    ws.applyCellTexts('candidates', [{ rowId: id, columnId: 'directiveQuantity', text: 'eight' }]);
    expect(ws.problem('candidates', id, 'directiveQuantity')).toMatch(/"eight" is not a number/);
    expect(cellText(ws, id, 'permissibleLwa')).toBe('give the quantity');
  });

  it('an Article 13 type shows "no limit (marking only)"', () => {
    const ws = new Workspace(demoProject());
    // Directive 2000/14/EC Art. 13: hydraulic hammers carry a marked level without a limit.
    expect(cellText(ws, 'slab-rig-breaker', 'permissibleLwa')).toBe('no limit (marking only)');
  });
});

describe('candidate table: exposure and penalty columns', () => {
  it('LEX,8h of an operator at 84 dB(A) for 6 h is 82.8 dB(A), the lower action value', () => {
    const ws = new Workspace(demoProject());
    // ISO 9612: L_EX,8h = L_p,A,eqT + 10·lg(T/8 h) = 84 + 10·lg(6/8) = 82.75 dB(A).
    expect(cellText(ws, 'slab-rig-breaker', 'dailyExposureDb')).toBe('82.8');
    // Directive 2003/10/EC Art. 3: 80 ≤ 82.75 < 85 dB(A) reaches the lower exposure action value.
    expect(cellText(ws, 'slab-rig-breaker', 'exposureBand')).toBe('lower action value 80');
    expect(ws.candidateChecks['slab-rig-breaker']?.exposure?.dailyExposureDb).toBeCloseTo(82.75, 1);
  });

  it('LEX,8h reads "not computed" while the operator hours cannot be read, and nothing without operator data', () => {
    const ws = new Workspace(demoProject());
    ws.applyCellTexts('candidates', [{ rowId: 'slab-rig-breaker', columnId: 'operatorHoursPerDay', text: 'six' }]);
    expect(cellText(ws, 'slab-rig-breaker', 'dailyExposureDb')).toBe('not computed');
    expect(cellText(ws, 'dig-13t', 'dailyExposureDb')).toBe('');
  });

  it('the Penalty column and the levels follow the project’s character penalty at once', () => {
    const ws = new Workspace(demoProject());
    const receiverId = ws.project.receivers[0]!.id;
    const before = ws.evaluation!.contributionDb('slab-rig-breaker', receiverId);
    expect(cellText(ws, 'slab-rig-breaker', 'penaltyDb')).toBe('+3');
    expect(cellText(ws, 'dig-13t', 'penaltyDb')).toBe('0');
    ws.setSettings({ characterPenaltyDb: 6 });
    expect(cellText(ws, 'slab-rig-breaker', 'penaltyDb')).toBe('+6');
    // Common practice: the penalty is added to the rating level, so 3 → 6 dB raises the contribution by 3 dB.
    expect(ws.evaluation!.contributionDb('slab-rig-breaker', receiverId) - before).toBeCloseTo(3, 1);
    ws.setSettings({ characterPenaltyDb: 0 });
    expect(cellText(ws, 'slab-rig-breaker', 'penaltyDb')).toBe('0');
  });

  it('the level basis switches a measured pair from L + K to L at once', () => {
    const ws = new Workspace(demoProject());
    // ISO 4871: declared pair L = 93.5 dB, K = 2.5 dB; guaranteed value L + K = 96.0 dB.
    expect(cellText(ws, 'load-electric', 'ratedLwa')).toBe('96.0');
    expect(cellText(ws, 'load-electric', 'ratedFrom')).toContain('93.5');
    const receiverId = ws.project.receivers[0]!.id;
    const before = ws.evaluation!.contributionDb('load-electric', receiverId);
    ws.setSettings({ levelBasis: 'measured' });
    expect(cellText(ws, 'load-electric', 'ratedLwa')).toBe('93.5');
    expect(before - ws.evaluation!.contributionDb('load-electric', receiverId)).toBeCloseTo(2.5, 1);
    // A guaranteed single value has no K to take off: used as declared and marked off the basis (ISO 4871:1996 L = L_d − K needs K).
    expect(cellText(ws, 'dig-13t', 'ratedLwa')).toBe('101.0 (off basis)');
  });

  it('candidateChecks gives every machine the rated LWA the evaluation’s predictions used', () => {
    // Consistency of the grid with the results: the rated LWA is the "lw" term at the reference receiver.
    const ws = new Workspace(demoProject());
    for (const basis of ['guaranteed', 'measured'] as const) {
      ws.setSettings({ levelBasis: basis });
      for (const c of ws.project.candidates) {
        const used = ws.evaluation!.contribution(c.id, REFERENCE_RECEIVER_ID).terms.find((t) => t.key === 'lw')!.db;
        expect(ws.candidateChecks[c.id]!.ratedLwaDb).toBe(used);
      }
    }
  });

  it('candidateChecks reuses the check of an unchanged machine after an edit of another', () => {
    const ws = new Workspace(demoProject());
    const kept = ws.candidateChecks['dig-13t'];
    ws.applyCellTexts('candidates', [{ rowId: 'dig-21t', columnId: 'lwaDb', text: '104' }]);
    expect(ws.candidateChecks['dig-13t']).toBe(kept);
    // Directive 2000/14/EC Art. 12 item 4: 104 dB is still over the permissible 103 dB of 120 kW.
    expect(ws.candidateChecks['dig-21t']?.overPermissible).toBe(true);
    expect(Math.abs((ws.candidateChecks['dig-21t']?.ratedLwaDb ?? NaN) - 104)).toBeLessThan(TOL_DB);
  });
  it('a cell’s message is the same asked with the machine itself or by its id, and only rows with a message are flagged', () => {
    // The grid passes each row to the Workspace so it need not look the machine up among all of them:
    // the answers must not depend on which way it asked.
    const ws = new Workspace(demoProject());
    ws.applyCellTexts('candidates', [{ rowId: 'dig-13t', columnId: 'lwaDb', text: '' }]);
    const columns = ws.candidateTable.columns.map((c) => c.id);
    let flaggedRows = 0;
    for (const c of ws.project.candidates) {
      const messages = columns.map((col) => ws.problem('candidates', c.id, col, c));
      expect(messages).toEqual(columns.map((col) => ws.problem('candidates', c.id, col)));
      const any = messages.some((m) => m !== undefined);
      // flagged may only say "none" when no cell has a message
      if (!ws.flagged('candidates', c.id, c)) expect(any).toBe(false);
      else flaggedRows++;
      expect(ws.flagged('candidates', c.id, c)).toBe(any);
    }
    // The stand-in dumper, the 105 dB excavator over its permissible level and the machine left without an LWA.
    expect(flaggedRows).toBeGreaterThanOrEqual(3);
    expect(ws.flagged('candidates', 'dump-unlisted', candidate(ws, 'dump-unlisted'))).toBe(true);
    expect(ws.flagged('candidates', 'dig-13t', candidate(ws, 'dig-13t'))).toBe(true);
    expect(ws.flagged('candidates', 'dump-9t', candidate(ws, 'dump-9t'))).toBe(false);
  });
});
