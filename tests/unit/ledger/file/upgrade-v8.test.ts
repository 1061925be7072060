import { describe, expect, it } from 'vitest';
import { parseProjectFile, serializeProject } from '../../../../src/ledger/file/project-file.ts';
import { upgradeVersion8 } from '../../../../src/ledger/file/upgrade-v8.ts';
import { PROJECT_VERSION } from '../../../../src/ledger/model/model.ts';
import { twoDutyProject } from '../fixtures.ts';

describe('project file upgrade from version 8 to 9', () => {
  it('a version-8 file opens upgraded, every value as it was, with no set-aside costs', () => {
    const text = JSON.stringify({ ...JSON.parse(serializeProject(twoDutyProject())), version: 8 });
    const r = parseProjectFile(text);
    expect('project' in r && r.upgradedFrom).toBe(8);
    if (!('project' in r)) return;
    expect(r.project.version).toBe(PROJECT_VERSION);
    expect(r.project.candidates.every((c) => c.setAsideCost === undefined)).toBe(true);
    expect({ ...r.project, version: 8 }).toEqual(JSON.parse(text));
  });

  it('upgradeVersion8 drops a `setAsideCost` a version-8 file carried, and leaves its input alone', () => {
    const file = {
      version: 8,
      candidates: [{ id: 'c1', setAsideCost: { kind: 'hire', dayRate: 1 } }, { id: 'c2' }, 'not a row'],
    };
    const copy = JSON.parse(JSON.stringify(file));
    expect(upgradeVersion8(file)).toEqual({ version: 8, candidates: [{ id: 'c1' }, { id: 'c2' }, 'not a row'] });
    expect(file).toEqual(copy);
  });
});
