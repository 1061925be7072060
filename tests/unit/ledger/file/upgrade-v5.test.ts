import { describe, expect, it } from 'vitest';
import { parseProjectFile, serializeProject } from '../../../../src/ledger/file/project-file.ts';
import { upgradeVersion5 } from '../../../../src/ledger/file/upgrade-v5.ts';
import { PROJECT_VERSION } from '../../../../src/ledger/model/model.ts';
import { validateProject } from '../../../../src/ledger/validate/validate.ts';
import { twoDutyProject } from '../fixtures.ts';

describe('project file upgrade from version 5 to 6', () => {
  function version5File(): string {
    return JSON.stringify({ ...JSON.parse(serializeProject(twoDutyProject())), version: 5 });
  }

  it('a version-5 file opens upgraded, every value as it was, with no uncertainty settings (the defaults apply)', () => {
    const text = version5File();
    const r = parseProjectFile(text);
    expect('project' in r && r.upgradedFrom).toBe(5);
    if (!('project' in r)) return;
    expect(r.project.version).toBe(PROJECT_VERSION);
    expect(r.project.uncertainty).toBeUndefined();
    expect({ ...r.project, version: 5 }).toEqual(JSON.parse(text));
  });

  it('upgradeVersion5 drops an `uncertainty` and on-time ranges a version-5 file carried, and leaves its input alone', () => {
    const file = {
      version: 5,
      uncertainty: { draws: 5 },
      duties: [{ id: 'u1', onTimeRangePct: { lowPct: 1, highPct: 2 } }, { id: 'u2' }],
    };
    const copy = JSON.parse(JSON.stringify(file));
    expect(upgradeVersion5(file)).toEqual({ version: 5, duties: [{ id: 'u1' }, { id: 'u2' }] });
    expect(file).toEqual(copy);
  });
});

describe('validation of the version-6 fields', () => {
  it('accepts settings and an on-time range within their ranges', () => {
    const p = twoDutyProject();
    p.uncertainty = { defaultKDb: 2, draws: 5000 };
    p.duties[0]!.onTimeRangePct = { lowPct: 30, highPct: 70 };
    expect(validateProject(p)).toEqual([]);
  });
  it('says what is wrong, where, and what is accepted', () => {
    const p = twoDutyProject();
    p.uncertainty = { draws: 10, kPerStandardDeviation: 0 };
    p.duties[0]!.onTimeRangePct = { lowPct: 70, highPct: 30 };
    const messages = validateProject(p).map((x) => `${x.path} ${x.message}`);
    expect(messages).toContain(
      '$.uncertainty.kPerStandardDeviation K per standard deviation: 0 is out of range (use a factor from 0.5 to 4, e.g. 1.645)',
    );
    expect(messages.some((m) => m.startsWith('$.uncertainty.draws Monte Carlo draws: 10'))).toBe(true);
    expect(messages).toContain(
      '$.duties[0].onTimeRangePct.highPct Duty "A", highest on-time: 30 is below the lowest 70 % (give the highest on-time at or above the lowest)',
    );
  });
});
