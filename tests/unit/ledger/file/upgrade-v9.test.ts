import { describe, expect, it } from 'vitest';
import { parseProjectFile, serializeProject } from '../../../../src/ledger/file/project-file.ts';
import { upgradeNotes } from '../../../../src/ledger/file/upgrade.ts';
import { upgradeVersion9, VERSION_10_NOTE } from '../../../../src/ledger/file/upgrade-v9.ts';
import { PROJECT_VERSION } from '../../../../src/ledger/model/model.ts';
import { permissibleSoundPower } from '../../../../src/core/standards/directive-2000-14-ec/index.ts';
import { twoDutyProject } from '../fixtures.ts';

describe('project file upgrade from version 9 to 10', () => {
  const withDozer = () => {
    const p = twoDutyProject();
    return {
      ...p,
      candidates: p.candidates.map((c, i) =>
        i === 0 ? { ...c, name: 'Crawler dozer D1', directiveCategory: 'tracked-dozer', netPowerKw: 100 } : c,
      ),
    };
  };

  it('a version-9 file opens upgraded with every word and value kept', () => {
    const text = JSON.stringify({ ...JSON.parse(serializeProject(withDozer())), version: 9 });
    const r = parseProjectFile(text);
    expect('project' in r && r.upgradedFrom).toBe(9);
    if (!('project' in r)) return;
    expect(r.project.version).toBe(PROJECT_VERSION);
    expect({ ...r.project, version: 9 }).toEqual(JSON.parse(text));
  });

  it('the notice says what changed and names the tracked dozers and loaders to check', () => {
    const r = parseProjectFile(JSON.stringify({ ...JSON.parse(serializeProject(withDozer())), version: 9 }));
    if (!('project' in r)) throw new Error('not opened');
    const notes = upgradeNotes(9, PROJECT_VERSION, r.project);
    expect(notes[0]).toBe(VERSION_10_NOTE);
    expect(notes[1]).toBe('Tracked dozers and loaders to check: Crawler dozer D1.');
    // A file with no tracked dozer or loader gets the general note alone.
    expect(upgradeNotes(9, PROJECT_VERSION, twoDutyProject())).toEqual([VERSION_10_NOTE]);
  });

  it('the word the note warns about now takes the Stage I figure of a steel-tracked dozer', () => {
    // Directive 2000/14/EC Article 12 table, tracked machines above 55 kW: Stage I 87 + 11·lg P,
    // Stage II 84 + 11·lg P, indicative only for steel-tracked dozers (2005/88/EC) — from memory of
    // the text; at 100 kW: 87 + 11·lg 100 = 109 dB (Stage I) rather than 106 dB — worked by hand.
    const level = permissibleSoundPower('tracked-dozer', 100);
    expect(level.levelDb).toBe(109);
    expect(level.stage).toBe('I (Stage II indicative only)');
  });

  it('upgradeVersion9 copies the file and leaves its input alone', () => {
    const file = { version: 9, candidates: [{ id: 'c1', directiveCategory: 'tracked-loader' }] };
    const copy = JSON.parse(JSON.stringify(file));
    expect(upgradeVersion9(file)).toEqual(copy);
    expect(upgradeVersion9(file)).not.toBe(file);
    expect(file).toEqual(copy);
  });
});
