/**
 * Downloading and opening whole project files (versioned JSON, format
 * "plant-noise-ledger/project"). Writing and reading are the ledger's
 * (serializeProject / parseProjectFile): older versions are upgraded on opening, newer
 * ones refused with a message naming the versions this program reads. Nothing is
 * replaced here: the caller decides what to do with an opened project.
 */
import type { Project } from '../../ledger/model/model.ts';
import { parseProjectFile, serializeProject } from '../../ledger/file/project-file.ts';
import { upgradeNotes } from '../../ledger/file/upgrade.ts';
import { MAX_FILE_BYTES, formatBytes } from '../../io/import/limits.ts';
import type { ChosenFile } from './import-client.ts';

/** A project file chosen by the user. */
export interface ChosenTextFile extends ChosenFile {
  text(): Promise<string>;
}

/** What opening a project file gave. */
export type ProjectFileOutcome =
  | {
      ok: true;
      project: Project;
      /** The version the file was written in, when it was upgraded on opening. */
      upgradedFrom?: number;
      /** A sentence for the user, e.g. that the file was upgraded. */
      message: string;
    }
  | {
      ok: false;
      /** Every problem, one sentence each, in the pattern "where: what (what is accepted)". */
      problems: string[];
    };

/** Problems listed at most in one outcome. */
const MAX_PROBLEMS = 50;

/**
 * The file name a project is downloaded as: its name with letters, digits, spaces and
 * dashes kept, spaces as dashes, and ".ledger.json".
 * @example projectFileName('Riverside bridge / phase 2') // "Riverside-bridge-phase-2.ledger.json"
 */
export function projectFileName(name: string): string {
  const base =
    name
      .normalize('NFC')
      .replace(/[^\p{L}\p{N} _-]+/gu, ' ')
      .trim()
      .replace(/\s+/g, '-')
      .slice(0, 80) || 'project';
  return `${base}.ledger.json`;
}

/** The project as the text of a project file. */
export function projectFileText(project: Project): string {
  return serializeProject(project);
}

/** Offers the project to the user as a download of its project file. */
export function downloadProjectFile(project: Project, doc: Document = document): void {
  downloadText(projectFileText(project), projectFileName(project.name), doc);
}

/**
 * The file name of a stored project's raw text (one that could not be opened), e.g.
 * "Depot-works.stored.json", so it is never taken for a checked project file.
 */
export function storedTextFileName(name: string): string {
  return projectFileName(name).replace(/\.ledger\.json$/, '.stored.json');
}

/** Offers JSON text to the user as a download under `fileName`. */
export function downloadText(text: string, fileName: string, doc: Document = document): void {
  const blob = new Blob([text], { type: 'application/json' });
  const url = URL.createObjectURL(blob);
  const a = doc.createElement('a');
  a.href = url;
  a.download = fileName;
  doc.body.append(a);
  a.click();
  a.remove();
  setTimeout(() => URL.revokeObjectURL(url), 10_000);
}

/** Reads project file text; never throws. */
export function readProjectText(text: string, fileName: string): ProjectFileOutcome {
  const outcome = parseProjectFile(text.charCodeAt(0) === 0xfeff ? text.slice(1) : text);
  if ('problems' in outcome) {
    const lines = outcome.problems.slice(0, MAX_PROBLEMS).map((p) => `"${fileName}", ${p.message}`);
    if (outcome.problems.length > MAX_PROBLEMS)
      lines.push(`and ${outcome.problems.length - MAX_PROBLEMS} more problems`);
    return { ok: false, problems: lines };
  }
  const upgraded = outcome.upgradedFrom;
  return {
    ok: true,
    project: outcome.project,
    ...(upgraded !== undefined ? { upgradedFrom: upgraded } : {}),
    message:
      upgraded !== undefined
        ? `Opened "${fileName}", written in project file version ${upgraded} and upgraded to the current version; save it to keep the upgrade. ${upgradeNotes(upgraded, undefined, outcome.project).join(' ')}`.trimEnd()
        : `Opened "${fileName}".`,
  };
}

/** Opens a project file chosen by the user; refuses files over the size limit before reading them. Never throws. */
export async function openProjectFile(file: ChosenTextFile): Promise<ProjectFileOutcome> {
  if (file.size > MAX_FILE_BYTES) {
    return {
      ok: false,
      problems: [
        `"${file.name}" is ${formatBytes(file.size)}; project files of up to ${formatBytes(MAX_FILE_BYTES)} are accepted`,
      ],
    };
  }
  let text: string;
  try {
    text = await file.text();
  } catch (e) {
    return {
      ok: false,
      problems: [`"${file.name}" could not be read (${e instanceof Error ? e.message : String(e)})`],
    };
  }
  return readProjectText(text, file.name);
}
