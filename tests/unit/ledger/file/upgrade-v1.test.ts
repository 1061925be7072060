import { describe, expect, it } from 'vitest';
import { upgradeVersion1 } from '../../../../src/ledger/file/upgrade-v1.ts';
import { parseProjectFile, serializeProject } from '../../../../src/ledger/file/project-file.ts';
import { demoProject } from '../../../../src/ledger/model/demo.ts';
import { validateProject } from '../../../../src/ledger/validate/validate.ts';
import { PROJECT_VERSION } from '../../../../src/ledger/model/model.ts';

/** A version-1 file as the program wrote it before registers existed. */
function versionOneText(extra: Record<string, unknown> = {}): string {
  const file = JSON.parse(serializeProject(demoProject()));
  file.version = 1;
  file.candidates[0] = { ...file.candidates[0], ...extra };
  return JSON.stringify(file, null, 2);
}

describe('project file upgrade from version 1 to 2', () => {
  it('a version-1 file opens as the current version with the same content, and says it was upgraded', () => {
    const out = parseProjectFile(versionOneText());
    expect('project' in out).toBe(true);
    if (!('project' in out)) return;
    expect(out.upgradedFrom).toBe(1);
    expect(out.project.version).toBe(PROJECT_VERSION);
    expect({ ...out.project, version: 1 }).toEqual({ ...demoProject(), version: 1 });
    expect(validateProject(out.project)).toEqual([]);
  });

  it('drops a registerLink key a version-1 file carries (it meant nothing in version 1)', () => {
    const out = parseProjectFile(versionOneText({ registerLink: { machineId: 'm9', basis: 'hire' } }));
    expect('project' in out && out.project.candidates[0]!.registerLink).toBeUndefined();
  });

  it('does not change its input', () => {
    const file = { version: 1, candidates: [{ id: 'c1', registerLink: { machineId: 'x' } }] };
    const copy = structuredClone(file);
    upgradeVersion1(file);
    expect(file).toEqual(copy);
  });
});
