/**
 * ISO 9613-2:1996 Acoustics — Attenuation of sound during propagation outdoors — Part 2:
 * General method of calculation. One file per term; this module re-exports them.
 * The standard quotes an accuracy of ±3 dB for broadband levels up to 1 km.
 */
export * from './divergence.ts';
export * from './atmosphere.ts';
export * from './geometry.ts';
export * from './ground-general.ts';
export * from './ground-alternative.ts';
export * from './barrier.ts';
export * from './meteorology.ts';
export * from './path.ts';
export * from './barrier-path-difference.ts';
