import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { jsonPieces, writeInBlocks } from '../../src/cli/json-stream.ts';

/** The `--json` replacer of the command line: a number that is not finite is written as null. */
const jsonNumbers = (_k: string, v: unknown) => (typeof v === 'number' && !Number.isFinite(v) ? null : v);

const leaf = fc.oneof(
  fc.double(),
  fc.constantFrom(NaN, Infinity, -Infinity, -0, undefined, null, true, false),
  fc.string(),
  fc.string({ unit: 'binary' }),
);
const value = fc.letrec((tie) => ({
  node: fc.oneof({ depthSize: 'small' }, leaf, tie('array'), tie('object')),
  array: fc.array(tie('node'), { maxLength: 5 }),
  object: fc.dictionary(fc.string({ maxLength: 6 }), tie('node'), { maxKeys: 5 }),
})).node;

describe('jsonPieces', () => {
  it('joined, gives exactly JSON.stringify(value, replacer, 2), at every depth (the reference: ECMA-262 JSON.stringify)', () => {
    fc.assert(
      fc.property(value, fc.integer({ min: 0, max: 4 }), (v, depth) => {
        expect([...jsonPieces(v, jsonNumbers, depth)].join('')).toBe(JSON.stringify(v, jsonNumbers, 2) ?? '');
      }),
      { numRuns: 400 },
    );
  });

  it('writes a small case as JSON.stringify lays it out (worked by hand)', () => {
    const pieces = [...jsonPieces({ a: [1, NaN, { b: undefined }], c: {}, d: [] }, jsonNumbers, 2)];
    expect(pieces.join('')).toBe('{\n  "a": [\n    1,\n    null,\n    {}\n  ],\n  "c": {},\n  "d": []\n}');
    // Opened two levels down: the array's elements are pieces of their own.
    expect(pieces).toContain('null');
  });

  it('writeInBlocks passes every character on, in blocks of the size asked', () => {
    const blocks: string[] = [];
    writeInBlocks(['ab', 'cd', 'e'], (t) => blocks.push(t), 3);
    expect(blocks).toEqual(['abcd', 'e']);
  });
});
