/**
 * Rating: the sound power a candidate's predictions start from (ISO 4871:1996 declared or measured value, or the
 * A-weighted total of its bands), its character penalty, and the Directive 2000/14/EC permissible level.
 */
export * from './basis-notes.ts';
export * from './permissible.ts';
export * from './rated-level.ts';
export * from './rating.ts';
