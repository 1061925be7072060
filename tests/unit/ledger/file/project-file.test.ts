import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { checkProjectData, parseProjectFile, serializeProject } from '../../../../src/ledger/file/project-file.ts';
import { findJsonSyntaxError } from '../../../../src/ledger/file/json-syntax.ts';
import { upgradeFile, type UpgradeStep } from '../../../../src/ledger/file/upgrade.ts';
import { demoProject } from '../../../../src/ledger/model/demo.ts';
import { PROJECT_VERSION } from '../../../../src/ledger/model/model.ts';
import { twoDutyProject } from '../fixtures.ts';

const problemsOf = (text: string) => {
  const r = parseProjectFile(text);
  return 'problems' in r ? r.problems : [];
};

describe('parseProjectFile', () => {
  it('parseProjectFile(serializeProject(demo)) gives the demo back', () => {
    const r = parseProjectFile(serializeProject(demoProject()));
    expect('project' in r && r.project).toEqual(demoProject());
  });

  it('parseProjectFile reports a JSON syntax error with its line and column', () => {
    const text = '{\n  "format": "plant-noise-ledger/project",\n  "version": 1,\n}';
    expect(problemsOf(text)).toEqual([
      {
        path: '$',
        message: 'Line 4, column 1: expected a property name in double quotes, found "}" (the file must be valid JSON)',
      },
    ]);
  });

  it('parseProjectFile refuses a newer version with a message', () => {
    const file = { ...JSON.parse(serializeProject(demoProject())), version: PROJECT_VERSION + 1 };
    expect(problemsOf(JSON.stringify(file))[0]!.message).toBe(
      `Version: ${PROJECT_VERSION + 1} is newer than this program reads (it reads versions 1 to ${PROJECT_VERSION}; open the file with a newer version of the program)`,
    );
  });

  it('parseProjectFile refuses a file of another format', () => {
    expect(problemsOf('{"format": "something-else", "version": 1}')[0]!.path).toBe('$.format');
    expect(problemsOf('[1, 2]')[0]!.message).toMatch(/is not a project/);
  });

  it('parseProjectFile refuses shapes the program cannot hold, listing each', () => {
    const file = JSON.parse(serializeProject(twoDutyProject()));
    file.candidates = 'none';
    file.receivers[0].limitsDb = 70;
    expect(problemsOf(JSON.stringify(file)).map((p) => p.path)).toEqual(['$.receivers[0].limitsDb', '$.candidates']);
  });

  it('checkProjectData reports an upgrade step that fails as a problem of the version, with the reason, instead of throwing', () => {
    const file: Record<string, unknown> = { ...JSON.parse(serializeProject(demoProject())), version: 7 };
    // Storage that hands back a body whose propagation cannot be read (a damaged record).
    Object.defineProperty(file, 'propagation', {
      enumerable: true,
      get() {
        throw new Error('the stored value is unreadable');
      },
    });
    const outcome = checkProjectData(file);
    expect('problems' in outcome && outcome.problems).toEqual([
      {
        path: '$.version',
        message: `Version: upgrading from version 7 to ${PROJECT_VERSION} failed (the stored value is unreadable); the data is damaged or was not written by this program`,
      },
    ]);
  });

  it('checkProjectData returns a current-version body itself, unchanged', () => {
    const project = demoProject();
    const outcome = checkProjectData(project);
    expect('project' in outcome && outcome.project).toBe(project);
  });

  it('parseProjectFile keeps values it does not judge: a bad number is for validateProject', () => {
    const file = JSON.parse(serializeProject(twoDutyProject()));
    file.candidates[0].lwaDb = 'loud';
    const r = parseProjectFile(JSON.stringify(file));
    expect('project' in r && r.project.candidates[0]!.lwaDb).toBe('loud');
  });

  it('serializeProject writes NaN as null and keeps the typed text; reading restores NaN', () => {
    const p = twoDutyProject();
    p.candidates[0]!.lwaDb = NaN;
    p.unreadCells = { 'candidates/a1/lwaDb': '12O' };
    const text = serializeProject(p);
    expect(text).toContain('"lwaDb": null');
    expect(text).toContain('"candidates/a1/lwaDb": "12O"');
    const back = parseProjectFile(text);
    expect('project' in back && back.project.candidates[0]!.lwaDb).toBeNaN();
  });
});

describe('upgradeFile', () => {
  it('upgradeFile runs every step from the file’s version to the target, in order', () => {
    // A made-up chain 1 → 2 → 3 to exercise the mechanism on its own.
    const steps: Record<number, UpgradeStep> = {
      1: (f) => ({ ...f, settings: { ...(f.settings as object), added: 'in 2' } }),
      2: (f) => ({ ...f, renamed: f.name, name: undefined }),
    };
    const r = upgradeFile({ version: 1, name: 'Old', settings: {} }, 3, steps);
    expect(r).toEqual({ file: { version: 3, renamed: 'Old', name: undefined, settings: { added: 'in 2' } }, from: 1 });
  });

  it('upgradeFile starts from the file’s own version', () => {
    const steps: Record<number, UpgradeStep> = { 1: () => ({ wrong: true }), 2: (f) => ({ ...f, two: true }) };
    expect(upgradeFile({ version: 2 }, 3, steps)).toEqual({ file: { version: 3, two: true }, from: 2 });
  });

  it('upgradeFile refuses a newer file and an unknown version', () => {
    expect(upgradeFile({ version: 5 }, 3, {})).toEqual({ error: 'newer', version: 5 });
    expect(upgradeFile({ version: 'one' }, 3, {})).toEqual({ error: 'unknown', version: 'one' });
    expect(upgradeFile({ version: 1 }, 3, {})).toEqual({ error: 'unknown', version: 1 });
  });

  it('upgradeFile leaves a current file as it is', () => {
    const file = { version: PROJECT_VERSION, name: 'x' };
    expect(upgradeFile(file)).toEqual({ file, from: PROJECT_VERSION });
  });
});

describe('findJsonSyntaxError', () => {
  it.each([
    ['{"a": 1}', undefined],
    ['{"a": 1,}', [1, 9, 'expected a property name in double quotes, found "}"']],
    ['{"a": 1\n "b": 2}', [2, 2, "expected ',' or '}' after a property value, found \"\\\"\""]],
    ["{'a': 1}", [1, 2, 'expected a property name in double quotes, found "\'"']],
    ['[1, 2', [1, 6, "expected ',' or ']' after a list item, found the end of the file"]],
    ['{"a": 01}', [1, 8, "expected ',' or '}' after a property value, found \"1\""]],
    ['{"a": tru}', [1, 7, 'expected a value, found "t"']],
    ['{} x', [1, 4, 'unexpected "x" after the end of the JSON value']],
    ['', [1, 1, 'the file ends where a value is expected']],
  ])('findJsonSyntaxError(%j)', (text, expected) => {
    const r = findJsonSyntaxError(text);
    expect(r === undefined ? undefined : [r.line, r.column, r.message]).toEqual(expected);
  });

  it('findJsonSyntaxError finds an error exactly when JSON.parse refuses the text (property, mutated JSON)', () => {
    const accepts = (t: string) => {
      try {
        JSON.parse(t);
        return true;
      } catch {
        return false;
      }
    };
    fc.assert(
      fc.property(
        fc.json(),
        fc.nat(),
        fc.constantFrom('', ',', '}', ']', '"', ':', 'x', '0', ' ', '\\', '{', '['),
        fc.boolean(),
        (json, at, insert, remove) => {
          const i = at % (json.length + 1);
          const text = remove ? json.slice(0, i) + json.slice(i + 1) : json.slice(0, i) + insert + json.slice(i);
          expect(findJsonSyntaxError(text) === undefined).toBe(accepts(text));
        },
      ),
      { numRuns: 3000 },
    );
  });
});

describe('hostile nesting', () => {
  it('a file nested 100,000 levels deep is refused with a message, not a stack overflow', () => {
    const text = `${'['.repeat(100_000)}${']'.repeat(100_000)}`;
    const outcome = parseProjectFile(text);
    expect('problems' in outcome && outcome.problems[0]?.message).toMatch(
      /nested more than 1000 levels deep; a project file nests at most 64/,
    );
    const inObject = `{"format":"plant-noise-ledger/project","version":1,"notes":${'{"a":'.repeat(100_000)}1${'}'.repeat(100_000)}}`;
    const second = parseProjectFile(inObject);
    expect('problems' in second && second.problems[0]?.message).toMatch(/nested/);
  });

  it('brackets inside strings do not count, and the demo project still opens', () => {
    const demo = demoProject();
    demo.notes = '['.repeat(5000);
    const outcome = parseProjectFile(serializeProject(demo));
    expect('project' in outcome).toBe(true);
  });
});

describe('screening as bare words', () => {
  it('reads "hidden", "top-visible" and "none" as the objects they stand for; validation refuses any other word and names the accepted ones', async () => {
    const { validateProject } = await import('../../../../src/ledger/validate/validate.ts');
    const file = JSON.parse(serializeProject(twoDutyProject()));
    file.receivers[0].screening = { u1: 'hidden', u2: 'top-visible' };
    const r = parseProjectFile(JSON.stringify(file));
    expect('project' in r && r.project.receivers[0]!.screening).toEqual({
      u1: { kind: 'hidden' },
      u2: { kind: 'top-visible' },
    });
    file.receivers[0].screening = { u1: 'behind a wall' };
    const bad = parseProjectFile(JSON.stringify(file));
    const problems = 'project' in bad ? validateProject(bad.project) : bad.problems;
    expect(problems.map((p) => p.message).join('\n')).toMatch(
      /"behind a wall" is not a screening.*use "none", "top-visible", "hidden", or an object/,
    );
  });
});
