import { describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { demoProject } from '../../../../src/ledger/model/demo.ts';
import { PROJECT_VERSION } from '../../../../src/ledger/model/model.ts';

const schema = JSON.parse(
  readFileSync(fileURLToPath(new URL('../../../../static/project.schema.json', import.meta.url)), 'utf8'),
);
type Def = { properties?: Record<string, unknown>; required?: string[] };
const defs = schema.$defs as Record<string, Def & { oneOf?: Def[] }>;

/** The property names a definition allows (every branch of a oneOf). */
const allowed = (def: Def & { oneOf?: Def[] }) =>
  new Set([...(def.oneOf ?? [def]).flatMap((d) => Object.keys(d.properties ?? {}))]);

describe('static/project.schema.json', () => {
  it('is a draft 2020-12 schema that names the format and version', () => {
    expect(schema.$schema).toBe('https://json-schema.org/draft/2020-12/schema');
    expect(schema.properties.format.const).toBe('plant-noise-ledger/project');
    expect(schema.properties.version.const).toBe(PROJECT_VERSION);
  });

  it.each([
    ['receiver', 'receivers'],
    ['duty', 'duties'],
    ['candidate', 'candidates'],
    ['phase', 'phases'],
    ['period', 'periods'],
  ] as const)('allows every field the demo project uses in %s and requires only fields it has', (def, list) => {
    const items = demoProject()[list] as unknown as Record<string, unknown>[];
    for (const item of items) {
      for (const key of Object.keys(item)) expect(allowed(defs[def]!)).toContain(key);
      for (const key of defs[def]!.required ?? []) expect(item).toHaveProperty(key);
    }
  });

  it('lists every top-level field of the demo project', () => {
    for (const key of Object.keys(demoProject())) expect(Object.keys(schema.properties)).toContain(key);
  });
});

describe('src/ledger/file/project-format.md', () => {
  it('its full example reads and validates without problems', async () => {
    const { parseProjectFile } = await import('../../../../src/ledger/file/project-file.ts');
    const { validateProject } = await import('../../../../src/ledger/validate/validate.ts');
    const doc = readFileSync(
      fileURLToPath(new URL('../../../../src/ledger/file/project-format.md', import.meta.url)),
      'utf8',
    );
    const example = doc.split('```json\n')[1]!.split('```')[0]!;
    const parsed = parseProjectFile(example);
    expect('project' in parsed).toBe(true);
    if ('project' in parsed) expect(validateProject(parsed.project)).toEqual([]);
  });
});
