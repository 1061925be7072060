import { describe, expect, it } from 'vitest';
import { energeticSumMoments, levelFromMoments, onTimeFactorMoments } from '../../../src/core/energetic-sum-spread.ts';
import { standardDeviationFromK } from '../../../src/core/standards/iso4871-1996.ts';

const beta = Math.LN10 / 10;

describe('energeticSumMoments', () => {
  it('n = 4 identical independent sources, μ 60 dB, σ 2 dB: mean energy 10^(μ/10)·n·exp((σ·ln10/10)²/2) = 4.4475 × 10^6 (moment generating function of the normal distribution, worked by hand)', () => {
    const terms = [0, 1, 2, 3].map((k) => ({ centreDb: 60, loadings: [{ factor: k, sigmaDb: 2 }] }));
    const m = energeticSumMoments(terms, 0);
    // worked by hand: 4 × exp((0.2303·2)²/2) = 4 × 1.11186 = 4.44746, times 10^6
    expect(m.mean / 1e6).toBeCloseTo(4.44746, 4);
  });
  it('one term with σ 2 dB gives back median 70 dB and σ 2 dB exactly (a log-normal is its own fit)', () => {
    const fit = levelFromMoments(energeticSumMoments([{ centreDb: 70, loadings: [{ factor: 0, sigmaDb: 2 }] }], 65));
    expect(fit.medianDb).toBeCloseTo(70, 9);
    expect(fit.sigmaDb).toBeCloseTo(2, 9);
  });
  it('two terms fully sharing one error (σ 2) keep σ 2 dB and add 3.01 dB to the median (a shared error shifts both together)', () => {
    const shared = [
      { centreDb: 70, loadings: [{ factor: 0, sigmaDb: 2 }] },
      { centreDb: 70, loadings: [{ factor: 0, sigmaDb: 2 }] },
    ];
    const fit = levelFromMoments(energeticSumMoments(shared, 70));
    expect(fit.sigmaDb).toBeCloseTo(2, 9);
    expect(fit.medianDb).toBeCloseTo(73.0103, 4); // 70 + 10·lg 2 (common practice)
  });
  it('two independent terms (σ 2 each) spread less than one: σ < 2 dB', () => {
    const fit = levelFromMoments(
      energeticSumMoments(
        [
          { centreDb: 70, loadings: [{ factor: 0, sigmaDb: 2 }] },
          { centreDb: 70, loadings: [{ factor: 1, sigmaDb: 2 }] },
        ],
        70,
      ),
    );
    expect(fit.sigmaDb).toBeLessThan(2);
    expect(fit.sigmaDb).toBeGreaterThan(2 / Math.SQRT2 - 0.2);
  });
  it('an empty sum is silence: median −Infinity', () => {
    expect(levelFromMoments(energeticSumMoments([], 70)).medianDb).toBe(-Infinity);
  });
  it('β = ln10/10 is the conversion used (0.230259)', () => {
    expect(beta).toBeCloseTo(0.230259, 6);
  });
});

describe('onTimeFactorMoments', () => {
  it('on-time 40–80 % about a nominal 60 %: E[U] = 1, E[U²] = 28/27 = 1.0370 (uniform distribution, worked by hand)', () => {
    const m = onTimeFactorMoments(40, 80, 60);
    expect(m.mean).toBeCloseTo(1, 12);
    expect(m.squareMean).toBeCloseTo(28 / 27, 12);
  });
});

describe('standardDeviationFromK', () => {
  it('K 3.29 dB is σ 2 dB with K = 1.645·σ (ISO 4871:1996, from memory)', () => {
    expect(standardDeviationFromK(3.29)).toBeCloseTo(2, 12);
  });
  it('a negative K is refused with what is accepted', () => {
    expect(() => standardDeviationFromK(-1)).toThrow(/uncertainty K in dB of 0 or more/);
  });
});
