/**
 * Fuzz of project files (fast-check): whatever a file holds, reading it and validating it
 * never throws; it either opens or lists its problems, each with a JSON path.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { parseProjectFile, serializeProject } from '../../../src/ledger/file/project-file.ts';
import { validateProject } from '../../../src/ledger/validate/validate.ts';
import { demoProject } from '../../../src/ledger/model/demo.ts';

const demo = JSON.parse(serializeProject(demoProject())) as Record<string, unknown>;

/** The demo project with one top-level field or one list item replaced by anything. */
const mangled = fc
  .tuple(fc.constantFrom(...Object.keys(demo)), fc.jsonValue({ maxDepth: 4 }))
  .map(([key, value]) => ({ ...demo, [key]: value }));

describe('project files under random content', () => {
  it('any JSON text: read never throws; problems carry a path', () => {
    fc.assert(
      fc.property(fc.json({ maxDepth: 6 }), (text) => {
        const outcome = parseProjectFile(text);
        if ('problems' in outcome) for (const p of outcome.problems) expect(p.path.startsWith('$')).toBe(true);
        else expect(() => validateProject(outcome.project)).not.toThrow();
      }),
      { numRuns: 500 },
    );
  });

  it('the demo with one field replaced by any JSON value: read and validation never throw', () => {
    fc.assert(
      fc.property(mangled, (file) => {
        const outcome = parseProjectFile(JSON.stringify(file));
        if ('project' in outcome) {
          const problems = validateProject(outcome.project);
          for (const p of problems) expect(p.path.startsWith('$')).toBe(true);
        }
      }),
      { numRuns: 500 },
    );
  });

  it('any text at all, with or without a byte-order mark: read never throws', () => {
    fc.assert(
      fc.property(fc.string({ maxLength: 200 }), fc.boolean(), (text, bom) => {
        expect(() => parseProjectFile(bom ? `\uFEFF${text}` : text)).not.toThrow();
      }),
      { numRuns: 500 },
    );
  });
});
