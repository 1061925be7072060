/**
 * File actions of the shell. Each loads its module on first use (exceljs alone is about
 * 250 kB gzip), so the first download stays small.
 */
import type { Project } from '../../ledger/model/model.ts';
import type { Workspace } from '../state/workspace.svelte.ts';
import type { Progress } from '../services/worker-calls.ts';

// Loaded on first use: the project-file code (and the ledger's JSON reader) stays out of the first download.
const loadProjectFiles = () => import('../services/project-files.ts');

/** A file name from a project name: letters, digits, spaces and dashes kept. */
export function fileNameFor(name: string, extension: string): string {
  const base =
    name
      .replace(/[^\p{L}\p{N} _-]+/gu, '')
      .trim()
      .replace(/\s+/g, '-') || 'project';
  return `${base}.${extension}`;
}

/** Offers bytes or text to the user as a download. */
export function download(data: BlobPart, fileName: string, type: string): void {
  const url = URL.createObjectURL(new Blob([data], { type }));
  const a = document.createElement('a');
  a.href = url;
  a.download = fileName;
  document.body.append(a);
  a.click();
  a.remove();
  setTimeout(() => URL.revokeObjectURL(url), 10_000);
}

export async function exportProjectFile(project: Project): Promise<void> {
  const { downloadProjectFile } = await loadProjectFiles();
  downloadProjectFile(project);
}

/**
 * Reads a project file chosen by the user. Older file versions are upgraded (the message says
 * so); a file with problems is refused with every problem listed, one per line.
 */
export async function importProjectFile(file: File): Promise<{ project: Project; message: string }> {
  const { openProjectFile } = await loadProjectFiles();
  const outcome = await openProjectFile(file);
  if (!outcome.ok) throw new Error(`The project file was not opened:\n${outcome.problems.join('\n')}`);
  return { project: outcome.project, message: outcome.message };
}

/**
 * Builds the auditable workbook of the open project for its assessed fleet (with the optimiser's
 * result when it is current) in a worker, reporting progress, and downloads it. Rejects with a
 * message in words when the results cannot be computed, or when the export is cancelled.
 */
export async function exportWorkbook(
  ws: Workspace,
  signal?: AbortSignal,
  onProgress?: (progress: Progress) => void,
): Promise<void> {
  if (!ws.evaluation)
    throw new Error(
      `The workbook cannot be written while the results cannot be computed: ${ws.evaluationError ?? 'unknown reason'}`,
    );
  const { workbookInWorker } = await import('../services/workbook-client.ts');
  const project = $state.snapshot(ws.project) as Project;
  const optimise = ws.optimiserResult && !ws.optimiserStale ? ws.optimiserResult : undefined;
  const bytes = await workbookInWorker(
    project,
    optimise && ($state.snapshot(optimise) as typeof optimise),
    signal,
    onProgress,
  );
  download(
    bytes as BlobPart,
    fileNameFor(ws.project.name, 'xlsx'),
    'application/vnd.openxmlformats-officedocument.spreadsheetml.sheet',
  );
}
