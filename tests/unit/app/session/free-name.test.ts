import { describe, expect, it } from 'vitest';
import { freeCopyName } from '../../../../src/app/session/free-name.ts';

// Expected names worked by hand from the rule in free-name.ts's doc (no standard applies).
describe('freeCopyName', () => {
  it('freeCopyName(base, [base]) adds " (copy)"', () => {
    expect(freeCopyName('Yard', ['Yard'])).toBe('Yard (copy)');
  });
  it('freeCopyName counts on past names already taken, ignoring case and spaces', () => {
    expect(freeCopyName('Yard', ['Yard', ' yard (COPY) ', 'Yard (copy 2)'])).toBe('Yard (copy 3)');
  });
  it('freeCopyName(base, [], false) keeps a free name as it is', () => {
    expect(freeCopyName('Yard', [], false)).toBe('Yard');
    expect(freeCopyName('Yard', ['yard'], false)).toBe('Yard (copy)');
  });
  it('freeCopyName never returns a taken name', () => {
    const taken = ['A', 'A (copy)', ...Array.from({ length: 20 }, (_, i) => `A (copy ${i + 2})`)];
    const name = freeCopyName('A', taken);
    expect(taken).not.toContain(name);
    expect(name).toBe('A (copy 22)');
  });
});
