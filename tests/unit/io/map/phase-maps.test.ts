import { describe, expect, it } from 'vitest';
import { phaseMaps, REPORT_MAP_POINTS_ACROSS } from '../../../../src/io/map/phase-maps.ts';
import { demoProject } from '../../../../src/ledger/model/demo.ts';
import { baselineChoice } from '../../../../src/ledger/model/fleets.ts';
import { evaluateProject } from '../../../../src/ledger/prediction/evaluate.ts';
import { duty, twoDutyProject } from '../../ledger/fixtures.ts';

describe('phaseMaps: the report’s map of each phase, from the project alone', () => {
  it('phaseMaps(demo) draws one map per phase, each with its title, legend, limit line and cautions', () => {
    const p = demoProject();
    const ev = evaluateProject(p);
    const maps = phaseMaps(p, ev.fleet, 'baseline', ev.worstReceiverByPhase);
    expect(maps.map((m) => m.phaseId)).toEqual(p.phases.map((ph) => ph.id));
    for (const m of maps) {
      expect(m.svg).toMatch(/^<svg xmlns="http:\/\/www\.w3\.org\/2000\/svg"/);
      // the group clipped to the plan is closed (an image of unbalanced XML does not load; the browser test loads it)
      expect(m.svg.match(/<g[ >]/g)?.length).toBe(1);
      expect(m.svg.match(/<\/g>/g)?.length).toBe(1);
      expect(m.svg).toContain(`<title>${p.name.replace('&', '&amp;')}: ${m.phaseName}, baseline fleet</title>`);
      expect(m.svg).toMatch(/>\d+\+<\/text>/); // a legend swatch's level
      expect(m.svg).toContain('free field (no façade term)');
      expect(m.svg).toContain('Predictions ±3 dB (ISO 9613-2)');
      expect((m.svg.match(/<path /g) ?? []).length).toBeGreaterThan(2);
      // the limit line of the phase's worst receiver, as the matrix names it
      const worst = p.receivers.find((r) => r.id === ev.worstReceiverByPhase[m.phaseId]);
      if (m.limit) expect(m.limit.words).toContain(`Limit of ${worst?.name}`);
    }
  });

  it('phaseMaps spaces its points about REPORT_MAP_POINTS_ACROSS across the plan, in round half metres', () => {
    const p = demoProject();
    const [m] = phaseMaps(p, baselineChoice(p), 'baseline');
    expect(m!.spacingM * 2).toBe(Math.round(m!.spacingM * 2)); // a round half metre
    const across = (/viewBox="[-\d.]+ [-\d.]+ ([\d.]+)/.exec(m!.svg)?.[1] ?? 'NaN') as string;
    expect(Number(across) / m!.spacingM).toBeGreaterThan(REPORT_MAP_POINTS_ACROSS * 0.9);
    expect(Number(across) / m!.spacingM).toBeLessThan(REPORT_MAP_POINTS_ACROSS * 1.1);
  });

  it('phaseMaps leaves out a phase whose duties are all known by stated distances, and names such duties beside a mapped phase', () => {
    const p = twoDutyProject();
    p.phases.push({ ...p.phases[0]!, id: 'ph2', name: 'Distances only' });
    p.duties.push(
      duty({ id: 'far', name: 'Far pump', phaseId: 'ph2', location: { kind: 'distances', distancesM: { r1: 50 } } }),
    );
    p.duties.push(
      duty({ id: 'far1', name: 'Far saw', phaseId: 'ph1', location: { kind: 'distances', distancesM: { r1: 50 } } }),
    );
    const maps = phaseMaps(p, baselineChoice(p), 'baseline');
    expect(maps.map((m) => m.phaseId)).toEqual(['ph1']);
    expect(maps[0]!.leftOff).toEqual(['Far saw']);
  });
});
