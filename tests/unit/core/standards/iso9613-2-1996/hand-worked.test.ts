/**
 * ISO 9613-2:1996 at interior values, each worked by hand from the standard's equations
 * (the working is in the comment beside each check), and the rules that tie the terms
 * together: the ground method for A-weighted data, screening as D_z replacing the ground
 * effect, C_met per path, and the accuracy the standard states.
 */
import { describe, expect, it } from 'vitest';
import {
  aWeightedPathAttenuation,
  alternativeGroundAttenuationDb,
  barrierDzDb,
  barrierKmet,
  generalGroundAttenuationDb,
  groundReflectionCorrectionDb,
  meteorologicalCorrectionDb,
  octaveBandPathAttenuation,
  pathAccuracy,
  type PathInput,
} from '../../../../../src/core/standards/iso9613-2-1996/index.ts';
import { absorptionAccuracyNote } from '../../../../../src/core/standards/iso9613-1-1993.ts';

/** Hand-worked values are carried to three decimals: checks allow half a unit of the last one. */
const HAND = 3;

const path: PathInput = {
  distanceM: 200,
  sourceHeightM: 1.5,
  receiverHeightM: 4,
  groundFactor: 0.5,
  temperatureC: 10,
  humidityPct: 70,
};

describe('equation 10 and D_Ω (clause 7.3.2) at interior values', () => {
  it('alternativeGroundAttenuationDb(200, 2.75) is 4.291 dB', () => {
    // Worked by hand from eq. 10: 4.8 − (2·2.75/200)·(17 + 300/200) = 4.8 − 0.0275·18.5 = 4.291
    expect(alternativeGroundAttenuationDb(200, 2.75)).toBeCloseTo(4.291, HAND);
  });
  it('alternativeGroundAttenuationDb(50, 3) is 2.040 dB', () => {
    // Worked by hand from eq. 10: 2·3/50 = 0.12, 17 + 300/50 = 23; 4.8 − 0.12·23 = 2.040
    expect(alternativeGroundAttenuationDb(50, 3)).toBeCloseTo(2.04, HAND);
  });
  it('groundReflectionCorrectionDb(10, 2, 4) is 2.467 dB', () => {
    // Worked by hand from eq. 11: 10·lg{1 + (100 + 4)/(100 + 36)} = 10·lg 1.7647 = 2.467
    expect(groundReflectionCorrectionDb(10, 2, 4)).toBeCloseTo(2.467, HAND);
  });
});

describe('D_z and K_met (clause 7.4) at interior values', () => {
  it('barrierKmet(20, 30, 49, 0.5) is 0.918', () => {
    // Worked by hand from eq. 18: exp[−(1/2000)·√(20·30·49/(2·0.5))] = exp(−171.46/2000) = exp(−0.08573) = 0.918
    expect(barrierKmet(20, 30, 49, 0.5)).toBeCloseTo(0.918, HAND);
  });
  it('single diffraction at 500 Hz, z = 0.5 m, K_met 0.918: D_z = 12.174 dB', () => {
    // Worked by hand from eq. 14: λ = 340/500 = 0.68 m; 10·lg[3 + (20/0.68)·1·0.5·0.91784] = 10·lg 16.498 = 12.174
    expect(barrierDzDb({ frequencyHz: 500, pathDifferenceM: 0.5, kmet: barrierKmet(20, 30, 49, 0.5) })).toBeCloseTo(
      12.174,
      HAND,
    );
  });
  it('double diffraction at 500 Hz, z = 0.5 m, e = 2 m, K_met 1: D_z = 13.170 dB', () => {
    // Worked by hand from eqs 14, 15: (5λ/e)² = 1.7² = 2.89; C3 = 3.89/3.2233 = 1.2068;
    // 10·lg[3 + 29.412·1.2068·0.5] = 10·lg 20.747 = 13.170
    expect(barrierDzDb({ frequencyHz: 500, pathDifferenceM: 0.5, double: true, innerDistanceM: 2 })).toBeCloseTo(
      13.17,
      HAND,
    );
  });
});

describe('general method at 500 Hz (clause 7.3.1, Table 3) over hard, mixed and porous ground', () => {
  // d_p = √(200² − 2.5²) = 199.98 m; q = 1 − 30·5.5/199.98 = 0.175; 1 − e^(−d_p/50) = 0.98168;
  // c′(1.5) = 1.5 + 14·e^(−1.035)·0.98168 = 6.382; c′(4) = 1.5 + 14·e^(−7.36)·0.98168 = 1.509.
  const at500 = (g: number) =>
    generalGroundAttenuationDb({
      projectedDistanceM: 199.984375,
      sourceHeightM: 1.5,
      receiverHeightM: 4,
      groundFactor: g,
    })[3]!.total;
  it('hard (G = 0): A_gr = −1.5 − 1.5 − 3·0.175 = −3.525 dB', () => {
    expect(at500(0)).toBeCloseTo(-3.525, 2); // worked by hand, Table 3
  });
  it('mixed (G = 0.5): A_gr = (−1.5 + 0.5·6.382) + (−1.5 + 0.5·1.509) − 3·0.175·0.5 = 0.683 dB', () => {
    expect(at500(0.5)).toBeCloseTo(0.683, 2); // worked by hand, Table 3
  });
  it('porous (G = 1): A_gr = 4.882 + 0.009 + 0 = 4.891 dB', () => {
    expect(at500(1)).toBeCloseTo(4.891, 2); // worked by hand, Table 3
  });
  it('the A-weighted estimate with the general method takes these 500 Hz figures, and D_c = D_Ω = 0', () => {
    for (const [g, agr] of [
      [0, -3.525],
      [0.5, 0.683],
      [1, 4.891],
    ] as const) {
      const a = aWeightedPathAttenuation({ ...path, groundFactor: g });
      expect(a.groundMethod).toBe('general');
      expect(a.agr).toBeCloseTo(agr, 2); // worked by hand above
      expect(a.dc).toBe(0);
      expect(a.dOmega).toBe(0);
    }
  });
  it('the alternative method is used only when chosen: eq. 10 and D_Ω in D_c', () => {
    const a = aWeightedPathAttenuation({ ...path, groundFactor: 0, groundMethod: 'alternative' });
    expect(a.agr).toBeCloseTo(4.291, HAND); // eq. 10, worked by hand above (h_m = 2.75)
    // eq. 11: 10·lg{1 + (39993.75 + 6.25)/(39993.75 + 30.25)} = 10·lg 1.99940 = 3.009
    expect(a.dOmega).toBeCloseTo(3.009, HAND);
    expect(a.dc).toBe(a.dOmega);
    expect(a.total).toBeCloseTo(a.adiv + a.aatm + a.agr - a.dc, 10); // L = L_W + D_c − A (eq. 3)
  });
});

describe('screening replaces the ground effect (eq. 12)', () => {
  it('a 10 dB stated D_z over hard ground at 200 m: A_bar = 10 − (−3.525) = 13.525 dB, not 10 on top of A_gr', () => {
    const a = aWeightedPathAttenuation({ ...path, groundFactor: 0, statedDzDb: 10 });
    expect(a.abar).toBeCloseTo(13.525, 2); // worked by hand from eq. 12 with A_gr from Table 3 above
    expect(a.agr + a.abar).toBeCloseTo(10, 10);
  });
  it('a barrier (z = 0.5 m) over porous ground at 200 m: A_gr + A_bar = D_z at 500 Hz', () => {
    // D_z at 500 Hz with the edge midway: d_ss = d_sr = 100.25, K_met = exp[−(1/2000)·√(100.25²·200/1)] = exp(−0.70887) = 0.4922;
    // 10·lg[3 + 29.412·0.5·0.4922] = 10·lg 10.238 = 10.102 (worked by hand from eqs 14, 18); A_gr = 4.891 < D_z
    const a = aWeightedPathAttenuation({ ...path, groundFactor: 1, barrier: { pathDifferenceM: 0.5 } });
    expect(a.dz).toBeCloseTo(10.102, 2);
    expect(a.abar).toBeCloseTo(10.102 - 4.891, 2);
  });
  it('in octave bands each band takes A_bar = max(0, D_z − A_gr)', () => {
    for (const b of octaveBandPathAttenuation({ ...path, groundFactor: 1, statedDzDb: 5 })) {
      expect(b.dz).toBe(5);
      expect(b.abar).toBeCloseTo(Math.max(0, 5 - b.agr), 10); // eq. 12
    }
  });
  it('a barrier and a stated D_z on one path are refused', () => {
    expect(() => aWeightedPathAttenuation({ ...path, barrier: { pathDifferenceM: 1 }, statedDzDb: 5 })).toThrow(
      /screening: 5 is given together with a barrier path difference/,
    );
  });
});

describe('C_met per path (clause 8, eqs 21, 22)', () => {
  it('is 0 below 10(h_s + h_r) and C0·[1 − 10(h_s + h_r)/d_p] beyond', () => {
    expect(meteorologicalCorrectionDb(2, 54.9, 1.5, 4)).toBe(0); // eq. 21: d_p ≤ 55 m
    expect(meteorologicalCorrectionDb(2, 200, 1.5, 4)).toBeCloseTo(1.45, HAND); // eq. 22 by hand: 2·(1 − 55/200) = 1.450
    expect(meteorologicalCorrectionDb(3, 110, 1.5, 4)).toBeCloseTo(1.5, HAND); // eq. 22 by hand: 3·(1 − 55/110) = 1.500
  });
  it('the A-weighted estimate carries it', () => {
    expect(aWeightedPathAttenuation({ ...path, cmet: { c0Db: 2 } }).cmet).toBeCloseTo(1.45, 2); // d_p = 199.98: 2·(1 − 55/199.98) = 1.450
  });
});

describe('pathAccuracy (Table 5) and the ISO 9613-1 range', () => {
  const base = { distanceM: 200, sourceHeightM: 1.5, receiverHeightM: 4, temperatureC: 10, humidityPct: 70 };
  it('±3 dB for mean height 2.75 m at 200 m; ±1 dB for mean height 10 m at 80 m', () => {
    expect(pathAccuracy(base).statedDb).toBe(3); // Table 5, 0 < h < 5 m
    expect(pathAccuracy({ ...base, distanceM: 80, sourceHeightM: 8, receiverHeightM: 12 }).statedDb).toBe(1); // Table 5, 5 < h < 30 m, d < 100 m
  });
  it.each([
    [{ distanceM: 1000 }, /Distance 1000 m is 1 km or more/],
    [{ sourceHeightM: 40, receiverHeightM: 30 }, /Mean height \(h_s \+ h_r\)\/2 = 35 m is above 30 m/],
    [{ screened: true }, /Screened path/],
    [{ reflected: true }, /excludes reflections/],
  ])('states no accuracy for %j', (change, note) => {
    const a = pathAccuracy({ ...base, ...change });
    expect(a.statedDb).toBeUndefined();
    expect(a.notes.join(' ')).toMatch(note);
  });
  it('notes a molar concentration of water vapour outside 0.05 % to 5 % (ISO 9613-1:1993 clause 7)', () => {
    // Annex B by hand at −20 °C, 10 %: (273.16/253.15)^1.261 = 1.1007; p_sat/p_r = 10^(−6.8346·1.1007 + 4.6151) = 10^(−2.9077) = 0.001237;
    // h = 10·0.001237 = 0.012 %
    expect(absorptionAccuracyNote(-20, 10)).toMatch(/h = 0\.012 %/);
    expect(absorptionAccuracyNote(10, 70)).toBeUndefined(); // h ≈ 0.86 %
    expect(pathAccuracy({ ...base, temperatureC: -20, humidityPct: 10 }).notes.join(' ')).toMatch(
      /outside 0.05 % to 5 %/,
    );
  });
});
