import { describe, expect, it } from 'vitest';
import { parseProjectFile, serializeProject } from '../../../../src/ledger/file/project-file.ts';
import { upgradeNotes } from '../../../../src/ledger/file/upgrade.ts';
import { upgradeVersion7 } from '../../../../src/ledger/file/upgrade-v7.ts';
import { validateProject } from '../../../../src/ledger/validate/validate.ts';
import { PROJECT_VERSION } from '../../../../src/ledger/model/model.ts';
import { twoDutyProject } from '../fixtures.ts';

describe('project file upgrade from version 7 to 8', () => {
  /** A version-7 file as version 7 wrote it: ISO 9613-2 with one flat `cmetDb`. */
  function version7File(cmetDb: unknown, unread?: Record<string, string>): Record<string, unknown> {
    const p = twoDutyProject();
    const file = JSON.parse(serializeProject(p)) as Record<string, unknown>;
    file.version = 7;
    file.propagation = {
      method: 'iso9613-2:1996',
      temperatureC: 10,
      humidityPct: 70,
      pressureKPa: 101.325,
      groundFactor: 0.5,
      groundMethod: 'general',
      sourceHeightM: 1.5,
      cmetDb,
    };
    if (unread) file.unreadCells = unread;
    return file;
  }

  it('carries the flat C_met over as C0, every other value kept', () => {
    const file = version7File(2);
    const r = parseProjectFile(JSON.stringify(file));
    expect('project' in r && r.upgradedFrom).toBe(7);
    if (!('project' in r)) return;
    expect(r.project.version).toBe(PROJECT_VERSION);
    expect(r.project.propagation).toEqual({
      method: 'iso9613-2:1996',
      temperatureC: 10,
      humidityPct: 70,
      pressureKPa: 101.325,
      groundFactor: 0.5,
      groundMethod: 'general',
      sourceHeightM: 1.5,
      c0Db: 2,
    });
    const { propagation: _a, version: _v, ...rest } = r.project as unknown as Record<string, unknown>;
    const { propagation: _b, version: _w, ...restOld } = file;
    expect(rest).toEqual(restOld);
  });

  it('keeps a value above 5 dB as it was, and validation names it (never clipped)', () => {
    const r = parseProjectFile(JSON.stringify(version7File(8)));
    if (!('project' in r)) throw new Error('not read');
    expect(r.project.propagation).toMatchObject({ c0Db: 8 });
    expect(validateProject(r.project).some((p) => p.path === '$.propagation.c0Db')).toBe(true);
  });

  it('keeps the typed text of an unreadable C_met under the new key', () => {
    const out = upgradeVersion7(version7File(null, { 'propagation/-/cmetDb': '2,5x' }));
    expect(out.unreadCells).toEqual({ 'propagation/-/c0Db': '2,5x' });
    expect(out.propagation).toMatchObject({ c0Db: null });
  });

  it('leaves a simple-method file untouched and does not mutate its input', () => {
    const file = { version: 7, propagation: { method: 'simple', q: 2 } };
    const copy = structuredClone(file);
    expect(upgradeVersion7(file)).toEqual(file);
    expect(file).toEqual(copy);
  });

  it('says what changed when a version-7 file is opened', () => {
    expect(upgradeNotes(7).join(' ')).toMatch(/C_met per path from C0/);
  });
});
