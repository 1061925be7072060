/**
 * Ranking: a duty's candidates by predicted level and by decibels of reduction per unit of cost, with what the
 * declared uncertainty K could change and which rankings are close calls.
 */
export * from './close-calls.ts';
export * from './rank.ts';
export * from './ranking-uncertainty.ts';
export * from './rank-every-duty.ts';
export * from './flag-words.ts';
