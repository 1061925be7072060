/** Project file version 4 → 5: the tender's noise clauses. */
import { describe, expect, it } from 'vitest';
import { parseProjectFile, serializeProject } from '../../../../src/ledger/file/project-file.ts';
import { UPGRADES, upgradeFile } from '../../../../src/ledger/file/upgrade.ts';
import { upgradeVersion4 } from '../../../../src/ledger/file/upgrade-v4.ts';
import { validateProject } from '../../../../src/ledger/validate/validate.ts';
import { PROJECT_VERSION } from '../../../../src/ledger/model/model.ts';
import { clause, clauseProject } from '../clauses/clause-project.ts';

/** A file as version 4 wrote it: the clause test site without clauses. */
function version4File(extra: Record<string, unknown> = {}): Record<string, unknown> {
  const file = JSON.parse(serializeProject(clauseProject())) as Record<string, unknown>;
  delete file.clauses;
  return { ...file, version: 4, ...extra };
}

describe('project file upgrade from version 4 to 5 (tender clauses)', () => {
  it('the chain runs 1 → 2 → 3 → 4 → 5 (and on to PROJECT_VERSION)', () => {
    expect(PROJECT_VERSION).toBeGreaterThanOrEqual(5);
    expect([1, 2, 3, 4].map((v) => typeof UPGRADES[v])).toEqual(['function', 'function', 'function', 'function']);
    expect(UPGRADES[4]).toBe(upgradeVersion4);
  });

  it('upgradeVersion4 drops a stray clauses key and leaves its input alone', () => {
    const v4 = { version: 4, name: 'Old site', clauses: [{ id: 'x' }] };
    const out = upgradeVersion4(v4);
    expect(out).toEqual({ version: 4, name: 'Old site' });
    expect(v4).toEqual({ version: 4, name: 'Old site', clauses: [{ id: 'x' }] });
    expect(upgradeVersion4({ version: 4, name: 'A' })).toEqual({ version: 4, name: 'A' });
  });

  it('a version-4 file opens as the current version with no clauses, every other value kept, saying it was upgraded', () => {
    const v4 = version4File();
    const r = parseProjectFile(JSON.stringify(v4));
    if (!('project' in r)) throw new Error(JSON.stringify(r));
    expect(r.upgradedFrom).toBe(4);
    expect(r.project.version).toBe(PROJECT_VERSION);
    expect(r.project.clauses ?? []).toEqual([]);
    expect({ ...r.project, version: 4 }).toEqual(v4);
    expect(validateProject(r.project)).toEqual([]);
  });

  it('a version-4 file carrying a stray clauses list opens without it', () => {
    const r = parseProjectFile(JSON.stringify(version4File({ clauses: [{ id: 'k1', kind: 'nonsense' }] })));
    if (!('project' in r)) throw new Error(JSON.stringify(r));
    expect(r.project.clauses).toBeUndefined();
  });

  it('a version-1 file goes through every step to the current version', () => {
    const up = upgradeFile({ ...version4File(), version: 1 });
    expect('file' in up && up.from).toBe(1);
    expect('file' in up && up.file.version).toBe(PROJECT_VERSION);
  });

  it('clauses round-trip through a file, an unread limit kept as typed', () => {
    const project = clauseProject([
      clause('k1', '4.1', { kind: 'limit', periodId: 'day', limitDb: NaN, statement: 'See method statement 3.' }),
    ]);
    project.unreadCells = { 'clauses/k1/limitDb': '7O' };
    const r = parseProjectFile(serializeProject(project));
    if (!('project' in r)) throw new Error(JSON.stringify(r));
    expect(r.project.clauses?.[0]?.limitDb).toBeNaN();
    expect(validateProject(r.project).map((p) => p.message)).toEqual([
      'Clause "4.1", limit: "7O" is not a number (use a limit LAeq,T in dB from 20 to 120, e.g. 75)',
    ]);
  });

  it('a file whose clauses are not a list is refused, naming the place', () => {
    const file = JSON.parse(serializeProject(clauseProject())) as Record<string, unknown>;
    file.clauses = { a: 1 };
    const r = parseProjectFile(JSON.stringify(file));
    expect('problems' in r && r.problems[0]!.path).toBe('$.clauses');
  });
});
