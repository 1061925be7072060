/**
 * Named fleets: resolving names, the assessed fleet, the out-of-date mark of the
 * optimiser's fleet, the version 1 → 2 upgrade, and a file round trip. Expected values are
 * read by hand from the invented demo project (src/ledger/model/demo.ts, demo-candidates.ts).
 */
import { describe, expect, it } from 'vitest';
import { demoProject } from '../../../../src/ledger/model/demo.ts';
import {
  BASELINE_FLEET,
  assessedFleet,
  fleetByName,
  fleetChanges,
  fleetNameProblem,
  inputsFingerprint,
  isOutOfDate,
  withAssessedFleet,
  withFleet,
  withoutFleet,
} from '../../../../src/ledger/model/fleets.ts';
import { parseProjectFile, serializeProject } from '../../../../src/ledger/file/project-file.ts';
import { UPGRADES, upgradeFile } from '../../../../src/ledger/file/upgrade.ts';
import { evaluateProject } from '../../../../src/ledger/prediction/evaluate.ts';
import { validateProject } from '../../../../src/ledger/validate/validate.ts';
import { withCurrentBody } from '../../../../src/db/projects.ts';
import type { ProjectRecord } from '../../../../src/db/ProjectRecord.ts';
import { PROJECT_VERSION } from '../../../../src/ledger/model/model.ts';

const quiet = {
  name: 'Quiet option A',
  origin: 'user' as const,
  choice: { 'd-slab': 'slab-crusher', 'd-shell': 'shell-14t-electric' },
};

describe('named fleets', () => {
  it('the baseline answers to "baseline" and is assessed when nothing else is chosen', () => {
    const p = demoProject();
    const a = assessedFleet(p);
    expect(a.name).toBe(BASELINE_FLEET);
    expect(a.fleet['d-slab']).toBe('slab-rig-breaker');
    expect(fleetByName(p, 'Baseline')).toEqual(a.fleet);
  });

  it('a stored fleet is found by name (case ignored); duties it leaves out keep their baseline', () => {
    const p = withAssessedFleet(withFleet(demoProject(), quiet), 'quiet option a');
    const a = assessedFleet(p);
    expect(a.name).toBe('Quiet option A');
    expect(a.fleet['d-slab']).toBe('slab-crusher');
    expect(a.fleet['d-dig']).toBe('dig-21t');
    expect(fleetChanges(p, fleetByName(p, 'baseline')!, a.fleet).map((c) => c.dutyId)).toEqual(['d-slab', 'd-shell']);
  });

  it('a choice no longer offered for its duty falls back to the duty’s baseline', () => {
    const p = withFleet(demoProject(), { ...quiet, choice: { 'd-slab': 'shell-21t' } });
    expect(fleetByName(p, quiet.name)!['d-slab']).toBe('slab-rig-breaker');
  });

  it('removing the assessed fleet hands over to the baseline', () => {
    const p = withoutFleet(withAssessedFleet(withFleet(demoProject(), quiet), quiet.name), quiet.name);
    expect(p.fleets).toBeUndefined();
    expect(assessedFleet(p).name).toBe(BASELINE_FLEET);
  });

  it('names: empty, reserved and taken names are refused with words', () => {
    const p = withFleet(demoProject(), quiet);
    expect(fleetNameProblem(p, ' ')).toMatch(/not filled in/);
    expect(fleetNameProblem(p, 'Best')).toMatch(/reserved/);
    expect(fleetNameProblem(p, 'quiet OPTION a')).toMatch(/already used/);
    expect(fleetNameProblem(p, 'Quiet option B')).toBeUndefined();
  });

  it('the assessed fleet changes the matrix: the quieter slab machine lowers the demolition phase at the terrace', () => {
    const base = demoProject();
    const p = withAssessedFleet(withFleet(base, quiet), quiet.name);
    const cell = (ev: ReturnType<typeof evaluateProject>) =>
      ev.matrix.find((c) => c.phaseId === 'ph-demolition' && c.receiverId === 'r-terrace')!.levelDb;
    // a 106 dB crusher in place of the 118 dB breaker can only lower the energetic sum (common practice)
    expect(cell(evaluateProject(p, assessedFleet(p).fleet))).toBeLessThan(cell(evaluateProject(base)));
  });
});

describe('out of date', () => {
  it('the optimiser’s fleet is out of date after an input edit, and not after a rename or a new fleet', () => {
    const p = demoProject();
    const found = {
      name: 'Cheapest compliant (optimiser)',
      origin: 'optimiser' as const,
      choice: {},
      foundFor: inputsFingerprint(p),
    };
    const stored = withFleet(p, found);
    expect(isOutOfDate({ ...withFleet(stored, quiet), name: 'Renamed' }, found)).toBe(false);
    const edited = { ...stored, duties: stored.duties.map((d, i) => (i === 0 ? { ...d, onTimePct: 50 } : d)) };
    expect(isOutOfDate(edited, found)).toBe(true);
  });
});

describe('project file version 3', () => {
  it('a version-2 file upgrades to version 3 with no fleets (a stray key dropped), assessing its baseline', () => {
    const v2 = { ...JSON.parse(serializeProject(demoProject())), version: 2, assessedFleet: 'stray' } as Record<
      string,
      unknown
    >;
    const up = upgradeFile(v2);
    expect('file' in up && up.from).toBe(2);
    const file = (up as { file: Record<string, unknown> }).file;
    expect(file.version).toBe(PROJECT_VERSION);
    expect(file.fleets).toBeUndefined();
    expect(file.assessedFleet).toBeUndefined();
    expect(UPGRADES[2]).toBeTypeOf('function');
    const read = parseProjectFile(JSON.stringify(v2));
    expect('project' in read && assessedFleet(read.project).name).toBe(BASELINE_FLEET);
  });

  it('fleets and the assessed fleet survive a file round trip and validate', () => {
    const p = withAssessedFleet(withFleet(demoProject(), quiet), quiet.name);
    expect(validateProject(p)).toEqual([]);
    const back = parseProjectFile(serializeProject(p));
    expect('project' in back && back.project.fleets).toEqual([quiet]);
    expect('project' in back && back.project.assessedFleet).toBe('Quiet option A');
  });
});

describe('projects stored in the browser by an older version', () => {
  it('withCurrentBody upgrades a stored version-1 body on reading; a current one is returned as it is', () => {
    const old = { ...demoProject(), version: 1 } as unknown as ProjectRecord['project'];
    const record = { id: 'p1', name: 'Old', project: old, createdAt: 1, updatedAt: 1, revision: 3 } as ProjectRecord;
    const read = withCurrentBody(record);
    expect(read.project.version).toBe(PROJECT_VERSION);
    expect(read.revision).toBe(3);
    const current = { ...record, project: demoProject() };
    expect(withCurrentBody(current)).toBe(current);
  });
});
