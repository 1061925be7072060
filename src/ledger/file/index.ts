/**
 * The project file: reading and writing JSON with messages that point at the line, the upgrade steps from every
 * older version (one file per step), the three-way merge two tabs use, and the format's description
 * (project-format.md, tested against the schema).
 */
export * from './json-syntax.ts';
export * from './project-file.ts';
export * from './project-merge.ts';
export * from './upgrade.ts';
export * from './upgrade-step.ts';
export * from './upgrade-v1.ts';
export * from './upgrade-v2.ts';
export * from './upgrade-v3.ts';
export * from './upgrade-v4.ts';
export * from './upgrade-v5.ts';
export * from './upgrade-v6.ts';
export * from './upgrade-v7.ts';
export * from './upgrade-v8.ts';
export * from './upgrade-v9.ts';
