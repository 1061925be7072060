/**
 * Results views for the declared uncertainty, the stand-in level, the character penalty
 * and operator exposure. The views only write what the ledger computed; the figures
 * checked here carry their source: ISO 4871 for K, ISO 9612 for L_EX,8h, Directive
 * 2003/10/EC Article 3 for the exposure values, NIOSH 98-126 (85 dB(A), 3 dB exchange) for
 * the time to 85 dB(A), Directive 2000/14/EC Article 12 for the permissible level.
 */
import { describe, expect, it } from 'vitest';
import { fireEvent, render, screen, within } from '@testing-library/svelte';
import RankingView from '../../../src/app/results/RankingView.svelte';
import ExposurePanel from '../../../src/app/results/ExposurePanel.svelte';
import ContributionTerms from '../../../src/app/results/ContributionTerms.svelte';
import { exposureRows, formatHours } from '../../../src/app/results/exposure-view.ts';
import { rankingFirmness, FIRMNESS_ROW_LIMIT } from '../../../src/app/state/ranking-firmness.ts';
import { candidateChecks } from '../../../src/ledger/checks/candidate-checks.ts';
import { rankingUncertainty } from '../../../src/ledger/ranking/ranking-uncertainty.ts';
import { evaluateProject } from '../../../src/ledger/prediction/evaluate.ts';
import { demoProject } from '../../../src/ledger/model/demo.ts';
import { EXPOSURE_CAUTION } from '../../../src/ledger/checks/operator-exposure.ts';
import type { Project } from '../../../src/ledger/model/model.ts';
import type { RankingRow } from '../../../src/ledger/model/results.ts';
import { digRanking, smallProject } from './fixtures.ts';

/** The small project with a measured pair on two excavators, K = 3 dB. */
function withK(): Project {
  const p = smallProject();
  return {
    ...p,
    candidates: p.candidates.map((c) =>
      c.id === 'd1' || c.id === 'd2' ? { ...c, declaration: 'measured' as const, uncertaintyDb: 3 } : c,
    ),
  };
}

/** d2 at 55.2 dB and d1 at 57.0 dB: 1.8 dB apart, within K = 3 dB (ISO 4871 declared uncertainty). */
function closeRanking(): RankingRow[] {
  const rows = digRanking();
  return rows.map((r) => (r.candidateId === 'd1' ? { ...r, contributionDb: 57.0 } : r));
}

const rowOf = (name: string) => screen.getByRole('rowheader', { name: new RegExp(name) }).closest('tr') as HTMLElement;

/** The ranking of one duty, its checks read from the ledger's checks of every machine. */
function renderRanking(
  project: ReturnType<typeof demoProject>,
  dutyId: string,
  rows: RankingRow[],
  checks: ReturnType<typeof candidateChecks>,
): void {
  render(RankingView, {
    props: {
      project,
      dutyId,
      receiverId: project.receivers[0]!.id,
      rows,
      checkOf: (c: { id: string }) => checks[c.id],
      locale: 'en-GB',
    },
  });
}

describe('RankingView with the declared uncertainty', () => {
  it('RankingView lists a pair too close to call and the places each row could take', () => {
    const project = withK();
    const rows = closeRanking();
    const uncertainty = rankingUncertainty(rows, project.candidates);
    render(RankingView, {
      props: { project, dutyId: 'dig', receiverId: 'school', rows, uncertainty, locale: 'en-GB' },
    });
    const firmness = screen.getByTestId('ranking-firmness');
    expect(firmness.textContent).toContain('Order not firm.');
    expect(within(firmness).getByRole('list', { name: 'Pairs too close to call' }).textContent).toContain(
      'Electric excavator 14 t (55.2 dB) and Excavator 14 t (57.0 dB) differ by 1.8 dB, within K 3.0 dB',
    );
    expect(screen.getByRole('columnheader', { name: /Possible places ±K/ })).toBeTruthy();
    expect(rowOf('Electric excavator').textContent).toContain('1–2');
  });

  it('RankingView says the order holds and shows no place column when every level is further apart than K', () => {
    const project = withK();
    const rows = digRanking();
    // 55.2 and 61.1 dB differ by 5.9 dB, more than K = 3 dB: the order holds (ISO 4871).
    const uncertainty = rankingUncertainty(rows, project.candidates);
    expect(uncertainty.firm).toBe(true);
    render(RankingView, {
      props: { project, dutyId: 'dig', receiverId: 'school', rows, uncertainty, locale: 'en-GB' },
    });
    expect(screen.getByTestId('ranking-firmness').textContent).toContain(
      'The order holds within the declared uncertainty K',
    );
    expect(screen.queryByRole('columnheader', { name: /Possible places ±K/ })).toBeNull();
  });

  it('RankingView takes the stand-in flag and the rated level from the candidate checks', () => {
    const project = demoProject();
    const evaluation = evaluateProject(project);
    const checks = candidateChecks(project, evaluation);
    const duty = project.candidates.find((c) => c.id === 'dump-unlisted')!.dutyId;
    const rows: RankingRow[] = project.candidates
      .filter((c) => c.dutyId === duty)
      .map((c, i) => ({
        candidateId: c.id,
        rank: i + 1,
        contributionDb: 50 + i,
        phaseTotalDb: 60,
        reductionDb: 0,
        extraCost: 0,
        dominated: false,
        freeWin: false,
        overLimit: false,
        isBaseline: i === 0,
      }));
    renderRanking(project, duty, rows, checks);
    const row = rowOf('Hedgeby 6 t site dumper');
    expect(within(row).getByText('stand-in LWA')).toBeTruthy();
    // Directive 2000/14/EC Art. 12 item 3, Stage II, P ≤ 55 kW: 101 dB stands in.
    expect(row.textContent).toContain('LWA 101.0 dB (stand-in)');
  });

  it('RankingView writes the character penalty in the machine’s detail line', () => {
    const project = demoProject();
    const checks = candidateChecks(project);
    const duty = 'd-slab';
    // Two machines, so the ranking is a table (a lone baseline is described in words).
    const rows: RankingRow[] = [
      {
        candidateId: 'slab-crusher',
        rank: 1,
        contributionDb: 56,
        phaseTotalDb: 62,
        reductionDb: 7,
        extraCost: 1500,
        dominated: false,
        freeWin: false,
        overLimit: false,
        isBaseline: false,
      },
      {
        candidateId: 'slab-rig-breaker',
        rank: 2,
        contributionDb: 68,
        phaseTotalDb: 69,
        reductionDb: 0,
        extraCost: 0,
        dominated: false,
        freeWin: false,
        overLimit: false,
        isBaseline: true,
      },
    ];
    renderRanking(project, duty, rows, checks);
    // The demo project's penalty is 3 dB for impulsive machines.
    expect(rowOf('Brantor HB20 breaker').textContent).toContain('impulsive: +3.0 dB penalty');
    // The crusher attachment is not marked tonal or impulsive in the demo: no penalty in its line.
    expect(rowOf('Valdor jaw crusher').textContent).not.toContain('penalty');
  });

  it('RankingView with a row limit keeps the baseline in sight and shows all on request', async () => {
    const project = smallProject();
    project.candidates = project.candidates.map((c) => ({ ...c, excluded: false }));
    render(RankingView, {
      props: { project, dutyId: 'dig', receiverId: 'school', rows: digRanking(), rowLimit: 1, locale: 'en-GB' },
    });
    // The best-ranked row, then the baseline (rank 2) kept in sight; the third is hidden.
    expect(screen.getAllByRole('rowheader').map((h) => h.textContent)).toEqual([
      expect.stringContaining('Electric excavator 14 t'),
      expect.stringMatching(/^\s*Excavator 14 t/),
    ]);
    expect(screen.getByText(/1 more machine of this duty not shown/)).toBeTruthy();
    await fireEvent.click(screen.getByRole('button', { name: 'Show all 3' }));
    expect(screen.getAllByRole('rowheader')).toHaveLength(3);
  });

  it(`rankingFirmness does not run on a duty of more than ${FIRMNESS_ROW_LIMIT} machines and says why`, () => {
    const rows: RankingRow[] = Array.from({ length: FIRMNESS_ROW_LIMIT + 1 }, (_, i) => ({
      ...digRanking()[0]!,
      candidateId: `x${i}`,
      rank: i + 1,
    }));
    const firmness = rankingFirmness(rows, []);
    expect(firmness.kind).toBe('not-checked');
    expect(firmness.kind === 'not-checked' && firmness.note).toContain(`${FIRMNESS_ROW_LIMIT + 1} machines`);
    expect(rankingFirmness([], []).kind).toBe('empty');
  });
});

describe('operator exposure', () => {
  it('formatHours writes hours and minutes of the working day', () => {
    // NIOSH 98-126: at 88 dB(A) the time to reach 85 dB(A) is 8 h / 2 = 4 h; at 103 dB(A), 8 h / 2^6 = 7.5 min.
    expect(formatHours(4)).toBe('4 h 00 min');
    expect(formatHours(0.125)).toBe('8 min');
    expect(formatHours(10.0794)).toBe('10 h 05 min');
    expect(formatHours(40)).toBe('more than 24 h');
    expect(formatHours(NaN)).toBe('not computed');
  });

  it('exposureRows lists machines with operator data, highest exposure first, and says what is missing', () => {
    const project = demoProject();
    project.candidates = project.candidates.map((c) => (c.id === 'dig-13t' ? { ...c, operatorLpaDb: 80 } : c));
    const rows = exposureRows(project, candidateChecks(project));
    expect(rows.map((r) => r.candidateId)).toEqual(['wall-petrol-saw', 'slab-rig-breaker', 'dig-13t']);
    // ISO 9612: 103 + 10·lg(2/8) = 96.98 dB(A), above the 87 dB(A) limit value of Directive 2003/10/EC Art. 3.
    expect(rows[0]).toMatchObject({ dailyExposure: '97.0 dB(A)', bandKind: 'limit value', hoursTo85: '8 min' });
    expect(rows[2]).toMatchObject({ dailyExposure: 'not computed', note: 'give the hours a day' });
  });

  it('ExposurePanel shows LEX,8h, the value reached, the time to 85 dB(A) and the caution', () => {
    const project = demoProject();
    render(ExposurePanel, { props: { project, checks: candidateChecks(project) } });
    const panel = screen.getByTestId('exposure-panel');
    const row = within(panel)
      .getByRole('rowheader', { name: /Brantor HB20 breaker/ })
      .closest('tr') as HTMLElement;
    // ISO 9612: 84 + 10·lg(6/8) = 82.75 dB(A); Directive 2003/10/EC: lower action value (80 dB(A)) reached.
    expect(row.textContent).toContain('82.8 dB(A)');
    expect(row.textContent).toContain('lower action value (80 dB(A)) reached');
    expect(within(row).getByText('lower action value (80 dB(A)) reached').className).toContain(
      'band-lower-action-value',
    );
    // NIOSH 98-126: 8 h / 2^((84 − 85)/3) = 10.08 h.
    expect(row.textContent).toContain('10 h 05 min');
    expect(panel.textContent).toContain(EXPOSURE_CAUTION);
  });

  it('ExposurePanel without operator data says where to add it', () => {
    const project = smallProject();
    render(ExposurePanel, { props: { project, checks: candidateChecks(project) } });
    expect(screen.getByText(/No machine gives an operator-position LpA/)).toBeTruthy();
  });
});

describe('ContributionTerms', () => {
  it('ContributionTerms shows the character penalty as its own term of an impulsive machine', () => {
    const project = demoProject();
    const evaluation = evaluateProject(project);
    const receiverId = project.receivers[0]!.id;
    render(ContributionTerms, {
      props: {
        project,
        receiverId,
        candidateIds: ['slab-rig-breaker'],
        contributionOf: (id: string) => evaluation.contribution(id, receiverId),
      },
    });
    const panel = screen.getByTestId('contribution-terms');
    const penalty = panel.querySelector('tr[data-term="penalty"]') as HTMLElement;
    // The demo project's penalty: +3 dB for an impulsive machine.
    expect(penalty.textContent).toContain('Character penalty (impulsive)');
    expect(penalty.textContent).toContain('+3.0 dB');
  });

  it('ContributionTerms says there is no penalty for a machine without tonal or impulsive character', () => {
    const project = demoProject();
    const evaluation = evaluateProject(project);
    const receiverId = project.receivers[0]!.id;
    render(ContributionTerms, {
      props: {
        project,
        receiverId,
        candidateIds: ['dig-13t'],
        contributionOf: (id: string) => evaluation.contribution(id, receiverId),
      },
    });
    expect(screen.getByText(/Character penalty: none \(neither tonal nor impulsive\)/)).toBeTruthy();
  });
});
