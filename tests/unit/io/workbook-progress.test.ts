/**
 * The workbook export's progress: one report per sheet written (in workbook order), then the
 * compression, with a share that only grows; the same bytes whether or not anyone listens.
 */
import { describe, expect, it } from 'vitest';
import { demoProject } from '../../../src/ledger/model/demo.ts';
import { evaluateProject } from '../../../src/ledger/prediction/evaluate.ts';
import { exportWorkbook, SHEETS } from '../../../src/io/workbook/index.ts';

describe('workbook export progress', () => {
  it('reports each sheet once it is written, then the compression, in order', async () => {
    const project = demoProject();
    const evaluation = evaluateProject(project);
    const heard: { step: string; fraction: number }[] = [];
    const created = new Date('2026-01-01T00:00:00Z');
    for (const writer of ['memory', 'stream'] as const) {
      heard.length = 0;
      await exportWorkbook(project, { evaluation, created, writer, onProgress: (p) => heard.push(p) });
      const written = heard
        .filter((p) => p.step.endsWith('sheet written'))
        .map((p) => /: (\w+) sheet/.exec(p.step)?.[1]);
      // the demo has no tender clauses, so no clauses sheet (src/io/workbook/index.ts writes it only with clauses)
      expect(written).toEqual([...SHEETS]);
      expect(heard[heard.length - 1]?.step).toBe('Compressing the workbook');
      expect(heard[0]?.fraction).toBe(0);
      for (let i = 1; i < heard.length; i++) expect(heard[i]!.fraction).toBeGreaterThanOrEqual(heard[i - 1]!.fraction);
      expect(heard.every((p) => p.fraction >= 0 && p.fraction < 1)).toBe(true);
    }
  }, 60_000);
});
