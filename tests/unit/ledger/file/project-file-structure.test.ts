/**
 * Project files whose rows cannot be told apart or whose octave bands are not a list are
 * refused with every problem listed (they used to open and leave the app stuck or the grid
 * blank). Expected messages are worked by hand from the rule: ids are text, unique per list.
 */
import { describe, expect, it } from 'vitest';
import { parseProjectFile, serializeProject } from '../../../../src/ledger/file/project-file.ts';
import { demoProject } from '../../../../src/ledger/model/demo.ts';

const demo = demoProject();

function problems(file: unknown): string[] {
  const outcome = parseProjectFile(JSON.stringify(file));
  return 'problems' in outcome ? outcome.problems.map((p) => `${p.path} ${p.message}`) : [];
}

describe('project files that must not open', () => {
  it('duplicate ids of machines, duties and receivers are each listed, naming the first use', () => {
    const file = {
      ...demo,
      candidates: [...demo.candidates, demo.candidates[0]],
      duties: [...demo.duties, demo.duties[1]],
      receivers: [...demo.receivers, demo.receivers[0]],
    };
    const found = problems(file);
    expect(found).toHaveLength(3);
    expect(found).toContain(
      `$.candidates[${demo.candidates.length}].id candidates[${demo.candidates.length}].id: "${demo.candidates[0]!.id}" is used twice, also by candidates[0] (give each row its own id)`,
    );
    expect(
      found.some((m) => m.startsWith(`$.duties[${demo.duties.length}].id`) && m.includes('also by duties[1]')),
    ).toBe(true);
    expect(found.some((m) => m.startsWith(`$.receivers[${demo.receivers.length}].id`))).toBe(true);
  });

  it('octave bands given as an object, and an id that is not text, are refused', () => {
    const file = {
      ...demo,
      candidates: demo.candidates.map((c, i) =>
        i === 2 ? { ...c, bandsDb: { '63': 90, '125': 92 } } : i === 3 ? { ...c, id: 7 } : c,
      ),
    };
    const found = problems(file);
    expect(found.some((m) => m.startsWith('$.candidates[2].bandsDb') && m.includes('is not a list'))).toBe(true);
    expect(found.some((m) => m.startsWith('$.candidates[3].id') && m.includes('7 is not an id'))).toBe(true);
  });

  it('the demo written and read back still opens', () => {
    expect('project' in parseProjectFile(serializeProject(demo))).toBe(true);
  });
});
