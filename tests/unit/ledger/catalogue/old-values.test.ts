/**
 * A value an older file holds that a catalogue range now refuses (LWA 30–160 and operator
 * LpA 30–150 before the ranges were chosen from the trade; now 40–150 and 40–140) opens,
 * keeps its value, and is marked by validation with the machine's label, the field, the
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
