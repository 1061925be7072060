/**
 * A value an older file holds that a catalogue range now refuses (LWA 30–160 and operator
 * LpA 30–150 before the ranges were chosen from the trade; now 40–150 and 40–140) opens,
 * keeps its value, and is marked by validation with the machine’s label, the field, the
 * value and the range accepted; the prediction still uses it.
 */
import { describe, expect, it } from 'vitest';
import { demoProject } from '../../../../src/ledger/model/demo.ts';
import { parseProjectFile, serializeProject } from '../../../../src/ledger/file/project-file.ts';
import { validateProject } from '../../../../src/ledger/validate/validate.ts';
import { evaluateProject } from '../../../../src/ledger/prediction/evaluate.ts';
import type { Project } from '../../../../src/ledger/model/model.ts';

/** The project a file opens as; fails the test when the file does not open. */
function opened(text: string): Project {
  const outcome = parseProjectFile(text);
  if (!('project' in outcome)) throw new Error(outcome.problems.map((p) => p.message).join('; '));
  return outcome.project;
}

describe('a stored value outside the catalogue’s range', () => {
  const original = demoProject();
  const first = original.candidates[0]!;
  const second = original.candidates[1]!;
  // A version-10 file as an older program wrote it: values its ranges (30–160, 30–150) accepted.
  const file = JSON.parse(serializeProject(original)) as { version: number; candidates: Record<string, unknown>[] };
  file.candidates[0]!.lwaDb = 155;
  file.candidates[1]!.operatorLpaDb = 35;
  const text = JSON.stringify(file);

  it('opens with the value unchanged', () => {
    expect(file.version).toBe(10);
    const project = opened(text);
    expect(project.candidates[0]?.lwaDb).toBe(155);
    expect(project.candidates[1]?.operatorLpaDb).toBe(35);
  });

  it('is marked with the machine’s label, the field, the value and the accepted range', () => {
    const project = opened(text);
    const messages = validateProject(project).map((p) => `${p.path} ${p.message}`);
    expect(messages).toContain(
      `$.candidates[0].lwaDb Candidate ${JSON.stringify(first.label)}, LWA: 155 is out of range (use a sound power level in dB from 40 to 150, e.g. 104.5)`,
    );
    expect(messages).toContain(
      `$.candidates[1].operatorLpaDb Candidate ${JSON.stringify(second.label)}, operator LpA: 35 is out of range (use an operator-position level LpA in dB from 40 to 140, e.g. 82)`,
    );
  });

  it('is still used by the prediction (never dropped): 10 dB more LWA gives 10 dB more at every receiver', () => {
    const project = opened(text);
    const receiver = project.receivers[0]!.id;
    const withOld = evaluateProject(project).contributionDb(first.id, receiver);
    const at145 = evaluateProject({
      ...project,
      candidates: project.candidates.map((c) => (c.id === first.id ? { ...c, lwaDb: 145 } : c)),
    }).contributionDb(first.id, receiver);
    // worked by hand: the contribution is LWA + terms that do not depend on LWA, so it moves dB for dB
    expect(withOld - at145).toBeCloseTo(10, 6);
  });
});

describe('a duty’s or a receiver’s stored value outside the catalogue’s range', () => {
  const original = demoProject();
  const duty = original.duties[0]!;
  const receiver = original.receivers[0]!;
  const period = original.periods[0]!;
  // Values the grid once took (a half day; a limit from 0 to 200 dB; a reduction with no ceiling)
  // that the catalogue's ranges refuse.
  const file = JSON.parse(serializeProject(original)) as {
    duties: Record<string, unknown>[];
    receivers: { limitsDb: Record<string, unknown>; screening: Record<string, unknown> }[];
  };
  file.duties[0]!.durationDays = 0.5;
  file.receivers[0]!.limitsDb[period.id] = 15;
  file.receivers[0]!.screening[duty.id] = { kind: 'explicit', db: 45 };
  const text = JSON.stringify(file);

  it('opens with the values unchanged', () => {
    const project = opened(text);
    expect(project.duties[0]?.durationDays).toBe(0.5);
    expect(project.receivers[0]?.limitsDb[period.id]).toBe(15);
    expect(project.receivers[0]?.screening[duty.id]).toEqual({ kind: 'explicit', db: 45 });
  });

  it('is marked with the item, the field, the value and the accepted range', () => {
    const messages = validateProject(opened(text)).map((p) => `${p.path} ${p.message}`);
    expect(messages).toContain(
      `$.duties[0].durationDays Duty ${JSON.stringify(duty.name)}, duration: 0.5 is out of range (use a whole number of days from 1 to 3650, e.g. 9)`,
    );
    expect(messages).toContain(
      `$.receivers[0].limitsDb.${period.id} Receiver ${JSON.stringify(receiver.name)}, limit for ${period.id}: 15 is out of range (use a limit LAeq,T in dB from 20 to 120, e.g. 75)`,
    );
    expect(messages).toContain(
      `$.receivers[0].screening[${JSON.stringify(duty.id)}].db Receiver ${JSON.stringify(receiver.name)}, screening from duty ${JSON.stringify(duty.id)}: 45 is out of range (use a reduction in dB from 0 to 40, e.g. 7.5)`,
    );
  });
});

describe('a setting’s stored value outside the catalogue’s range', () => {
  // Values the earlier ranges took (a pressure above 0 kPa, a reference distance above 0 m)
  // that the catalogue's ranges, 50–200 kPa and 1–10000 m, now refuse.
  const original: Project = {
    ...demoProject(),
    propagation: {
      method: 'iso9613-2:1996',
      temperatureC: 10,
      humidityPct: 70,
      pressureKPa: 101.325,
      groundFactor: 0.5,
      groundMethod: 'general',
      sourceHeightM: 1.5,
      c0Db: 0,
    },
  };
  const file = JSON.parse(serializeProject(original)) as {
    propagation: Record<string, unknown>;
    settings: Record<string, unknown>;
  };
  file.propagation.pressureKPa = 40;
  file.settings.referenceDistanceM = 0.5;
  const text = JSON.stringify(file);

  it('opens with the values unchanged', () => {
    const project = opened(text);
    expect(project.propagation.method === 'iso9613-2:1996' && project.propagation.pressureKPa).toBe(40);
    expect(project.settings.referenceDistanceM).toBe(0.5);
  });

  it('is marked with the setting, the value and the accepted range', () => {
    const messages = validateProject(opened(text)).map((p) => `${p.path} ${p.message}`);
    expect(messages).toContain(
      '$.propagation.pressureKPa Atmospheric pressure: 40 is out of range (use an atmospheric pressure in kPa from 50 to 200, e.g. 101.325)',
    );
    expect(messages).toContain(
      '$.settings.referenceDistanceM Reference receiver distance: 0.5 is out of range (use a reference distance in metres from 1 to 10000, e.g. 10)',
    );
  });

  it('is still used by the prediction: the level at 40 kPa differs from the level at 101.325 kPa', () => {
    const project = opened(text);
    const candidate = project.candidates[0]!.id;
    const receiver = project.receivers[0]!.id;
    const at40 = evaluateProject(project).contributionDb(candidate, receiver);
    const atSeaLevel = evaluateProject(original).contributionDb(candidate, receiver);
    // ISO 9613-1:1993 eq. 3–5: the absorption depends on the pressure, so a kept 40 kPa changes A_atm
    expect(Number.isFinite(at40)).toBe(true);
    expect(at40).not.toBe(atSeaLevel);
  });
});
