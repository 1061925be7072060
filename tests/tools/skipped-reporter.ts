/**
 * A Vitest reporter that closes the run with what a reader must not miss: every skipped test
 * by name (a skip is never silent; each skipped test's name says why), and one plain closing
 * line `Tests: N passed, N failed, N skipped` that any log reader can count.
 */
import type { Reporter, TestModule } from 'vitest/node';

export default class SkippedReporter implements Reporter {
  onTestRunEnd(testModules: ReadonlyArray<TestModule>): void {
    let passed = 0;
    let failed = 0;
    const skipped: string[] = [];
    for (const module of testModules) {
      for (const test of module.children.allTests()) {
        const state = test.result().state;
        if (state === 'passed') passed++;
        else if (state === 'failed') failed++;
        else if (state === 'skipped')
          skipped.push(`${module.moduleId.replace(`${process.cwd()}/`, '')} › ${test.fullName}`);
      }
    }
    const lines: string[] = [];
    if (skipped.length > 0) {
      lines.push('', `Skipped (${skipped.length}):`);
      for (const name of skipped) lines.push(`  - ${name}`);
    }
    lines.push('', `Tests: ${passed} passed, ${failed} failed, ${skipped.length} skipped`);
    process.stdout.write(`${lines.join('\n')}\n`);
  }
}
