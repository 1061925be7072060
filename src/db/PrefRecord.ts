/**
 * A small preference kept between visits, e.g. which project was open last.
 * Key/value so a new preference needs no schema change.
 */
export interface PrefRecord {
  /** e.g. "lastProjectId" */
  key: string;
  value: string;
}

/** The preference keys in use. */
export const PREF_LAST_PROJECT = 'lastProjectId';
