/**
 * ISO 9613-2:1996 Acoustics — Attenuation of sound during propagation outdoors — Part 2:
 * General method of calculation. One file per term; this module re-exports them.
 * The accuracy it states (Table 5) is in ./accuracy.ts, with the paths it excludes.
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
export * from './accuracy.ts';
