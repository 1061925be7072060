import { describe, expect, it } from 'vitest';
import { symbolParts } from '../../../../src/app/text/symbol-parts.ts';

describe('symbolParts', () => {
  // symbols as ISO 9613-2:1996 writes them (A_div eq. 7, D_Ω eq. 11) and ISO 3744 (L_WA)
  it('symbolParts("Geometric divergence A_div") splits the subscript off', () => {
    expect(symbolParts('Geometric divergence A_div')).toEqual([
      { text: 'Geometric divergence ' },
      { base: 'A', sub: 'div' },
    ]);
  });
  it('symbolParts keeps the comma of L_Aeq,T in the subscript', () => {
    expect(symbolParts('L_Aeq,T at the façade')).toEqual([{ base: 'L', sub: 'Aeq,T' }, { text: ' at the façade' }]);
  });
  it('symbolParts reads D_Ω and L_WA', () => {
    expect(symbolParts('D_Ω and L_WA')).toEqual([{ base: 'D', sub: 'Ω' }, { text: ' and ' }, { base: 'L', sub: 'WA' }]);
  });
  it('symbolParts leaves a file_name and text without symbols alone', () => {
    expect(symbolParts('file_name')).toEqual([{ text: 'file_name' }]);
    expect(symbolParts('')).toEqual([]);
  });
});
