/**
 * One stored project as the app reads it: the project itself (plain JSON, exactly the
 * project file's shape) plus the bookkeeping the app needs to list projects and notice
 * other tabs' edits. Stored as a {@link StoredProject} and its parts (./project-parts.ts).
 */
import type { Project } from '../ledger/model/model.ts';

/** What the `projects` table keeps per project (schema version 4): the body lives in parts. */
export interface StoredProject {
  id: string;
  name: string;
  createdAt: number;
  updatedAt: number;
  revision: number;
}

export interface ProjectRecord {
  /** Random id, never shown; stable across renames. */
  id: string;
  /** The project's name, copied from `project.name` on every save so the list needs no parse. */
  name: string;
  project: Project;
  /** Milliseconds since 1970 (Date.now()) of the first save. */
  createdAt: number;
  /** Milliseconds since 1970 of the last save (added in schema version 2). */
  updatedAt: number;
  /**
   * Count of saves, starting at 1 (added in schema version 2). A tab that sees a higher
   * revision than the one it holds reloads the project: that is how another tab's edits
   * reach this one.
   */
  revision: number;
  /**
   * True when the stored body was written by an older project-file version and upgraded on
   * reading: the first save then writes the project whole, in the current version.
   */
  olderBody?: boolean;
}

/** A project as the list shows it, without the (possibly large) project body. */
export interface ProjectSummary {
  id: string;
  name: string;
  updatedAt: number;
}
