/** The tabs of an open project, in the order the tab bar shows them. */
export const PROJECT_TABS = [
  'candidates',
  'duties',
  'receivers',
  'phases',
  'clauses',
  'plan',
  'results',
  'quick',
  'register',
  'settings',
] as const;
export type ProjectTab = (typeof PROJECT_TABS)[number];
