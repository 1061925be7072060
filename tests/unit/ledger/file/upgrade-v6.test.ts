import { describe, expect, it } from 'vitest';
import { parseProjectFile, serializeProject } from '../../../../src/ledger/file/project-file.ts';
import { upgradeVersion6 } from '../../../../src/ledger/file/upgrade-v6.ts';
import { evaluateProject } from '../../../../src/ledger/prediction/evaluate.ts';
import { validateProject } from '../../../../src/ledger/validate/validate.ts';
import { PROJECT_VERSION } from '../../../../src/ledger/model/model.ts';
import { twoDutyProject } from '../fixtures.ts';

describe('project file upgrade from version 6 to 7 (site plan)', () => {
  function version6File(): string {
    return JSON.stringify({ ...JSON.parse(serializeProject(twoDutyProject())), version: 6 });
  }

  it('a version-6 file opens upgraded with every value kept, no barriers and no drawing', () => {
    const text = version6File();
    const r = parseProjectFile(text);
    if (!('project' in r)) throw new Error('not read');
    expect(r.upgradedFrom).toBe(6);
    expect(r.project.version).toBe(PROJECT_VERSION);
    expect({ ...r.project, version: 6 }).toEqual(JSON.parse(text));
    expect(r.project.barriers).toBeUndefined();
    expect(r.project.sitePlan).toBeUndefined();
  });

  it('its levels are those of the same project written by this version', () => {
    const r = parseProjectFile(version6File());
    if (!('project' in r)) throw new Error('not read');
    const now = evaluateProject(twoDutyProject());
    expect(evaluateProject(r.project).matrix.map((c) => c.levelDb)).toEqual(now.matrix.map((c) => c.levelDb));
  });

  it('upgradeVersion6 copies the file and leaves its input alone', () => {
    const file = { version: 6, name: 'x' };
    const out = upgradeVersion6(file);
    expect(out).toEqual(file);
    expect(out).not.toBe(file);
  });

  it('upgradeVersion6 drops barriers or a drawing a version-6 file carries (they meant nothing there)', () => {
    const file = { version: 6, name: 'x', barriers: [{ id: 'b' }], sitePlan: {} };
    expect(upgradeVersion6(file)).toEqual({ version: 6, name: 'x' });
    expect(file.barriers).toHaveLength(1);
  });
});

describe('validation of the plan parts', () => {
  it('an area with too few points, a barrier with no height and a drawing that is not an image are each named', () => {
    const p = twoDutyProject();
    p.duties[0]!.location = {
      kind: 'polygon',
      points: [
        { x: 0, y: 0 },
        { x: 1, y: 0 },
      ],
      distanceBy: 'nearest',
    };
    p.barriers = [
      {
        id: 'b1',
        name: 'Hoarding',
        points: [
          { x: 0, y: 0 },
          { x: 5, y: 0 },
        ],
        heightM: 0,
      },
    ];
    p.sitePlan = {
      image: {
        dataUrl: 'data:text/plain;base64,AAAA',
        fileName: 'x.txt',
        widthPx: 10,
        heightPx: 10,
        metresPerPixel: 0.1,
        originPx: { x: 0, y: 0 },
        northDeg: 0,
      },
    };
    const messages = validateProject(p).map((x) => `${x.path} ${x.message}`);
    expect(messages).toContain(
      '$.duties[0].location.points Duty "A", points: "2 points" are too few (give 3 or more points { "x": …, "y": … })',
    );
    expect(messages).toContain(
      '$.barriers[0].heightM Barrier "Hoarding", height: 0 is out of range (use a barrier top height in metres above 0 and up to 100, e.g. 2.4)',
    );
    expect(
      messages.some(
        (m) =>
          m.startsWith('$.sitePlan.image.dataUrl Site drawing, image:') && m.includes('is not a PNG or JPEG image'),
      ),
    ).toBe(true);
  });

  it('a drawing over 5 MB is refused with its size', () => {
    const p = twoDutyProject();
    const body = 'A'.repeat(Math.ceil((5 * 1024 * 1024 * 4) / 3) + 8);
    p.sitePlan = {
      image: {
        dataUrl: `data:image/png;base64,${body}`,
        fileName: 'big.png',
        widthPx: 10,
        heightPx: 10,
        metresPerPixel: 0.1,
        originPx: { x: 0, y: 0 },
        northDeg: 0,
      },
    };
    const messages = validateProject(p).map((x) => x.message);
    expect(messages).toContain('Site drawing, image: "5.0 MB" is too large (use an image of at most 5 MB)');
  });

  it('a line location with distance by centroid and a barrier validate cleanly', () => {
    const p = twoDutyProject();
    p.duties[0]!.location = {
      kind: 'line',
      points: [
        { x: 10, y: 0 },
        { x: 30, y: 0 },
      ],
      distanceBy: 'centroid',
    };
    p.barriers = [
      {
        id: 'b1',
        name: 'Hoarding',
        points: [
          { x: 0, y: 5 },
          { x: 30, y: 5 },
        ],
        heightM: 2.4,
      },
    ];
    expect(validateProject(p)).toEqual([]);
  });
});
