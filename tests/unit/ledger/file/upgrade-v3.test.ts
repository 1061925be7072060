import { describe, expect, it } from 'vitest';
import { parseProjectFile, serializeProject } from '../../../../src/ledger/file/project-file.ts';
import { upgradeNotes } from '../../../../src/ledger/file/upgrade.ts';
import { upgradeVersion3 } from '../../../../src/ledger/file/upgrade-v3.ts';
import { evaluateProject } from '../../../../src/ledger/prediction/evaluate.ts';
import { PROJECT_VERSION } from '../../../../src/ledger/model/model.ts';
import { twoDutyProject } from '../fixtures.ts';

describe('project file upgrade from version 3 to 4', () => {
  /** A version-3 file as version 3 wrote it: a phase working 07:00–21:00 whose own period is the day 07:00–19:00, and an evening period. */
  function version3File(): string {
    const p = twoDutyProject();
    p.periods.push({ id: 'eve', name: 'Evening', start: '19:00', end: '23:00' });
    p.phases[0]!.start = '07:00';
    p.phases[0]!.end = '21:00';
    p.receivers[0]!.limitsDb = { day: 70, eve: 60 };
    return JSON.stringify({ ...JSON.parse(serializeProject(p)), version: 3 });
  }

  it('a version-3 file opens upgraded, every value as it was', () => {
    const text = version3File();
    const r = parseProjectFile(text);
    expect('project' in r && r.upgradedFrom).toBe(3);
    if (!('project' in r)) return;
    expect(r.project.version).toBe(PROJECT_VERSION);
    expect({ ...r.project, version: 3 }).toEqual(JSON.parse(text));
  });

  it('after the upgrade the hours past the own period are assessed: a day cell and an evening cell', () => {
    const r = parseProjectFile(version3File());
    if (!('project' in r)) throw new Error('not read');
    const ev = evaluateProject(r.project);
    expect(ev.problems).toEqual([]);
    expect(ev.matrix.map((c) => [c.periodId, c.hoursWorked, c.periodHours])).toEqual([
      ['day', 12, 12],
      ['eve', 2, 4],
    ]);
    // Shift from the own period: 10·lg(2/4) − 10·lg(12/12) = −3.01 dB (worked by hand).
    expect(ev.matrix[1]!.levelDb - ev.matrix[0]!.levelDb).toBeCloseTo(-3.01, 2);
  });

  it('upgradeNotes(3) says what version 4 changed', () => {
    expect(upgradeNotes(3).join(' ')).toMatch(/assessed in every other period they fall in/);
    expect(upgradeNotes(PROJECT_VERSION)).toEqual([]);
  });

  it('upgradeVersion3 copies the file and leaves its input alone', () => {
    const file = { version: 3, name: 'x', periods: [] };
    const out = upgradeVersion3(file);
    expect(out).toEqual(file);
    expect(out).not.toBe(file);
  });
});
