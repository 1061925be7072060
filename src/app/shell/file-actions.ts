/**
 * File actions of the shell. Each loads its module on first use (exceljs alone is about
 * 250 kB gzip), so the first download stays small.
 */
import type { Project } from '../../ledger/model.ts';
import type { Workspace } from '../state/workspace.svelte.ts';

interface ProjectFileModule {
  serializeProject(project: Project): string;
  parseProjectFile(text: string): Project | { project: Project };
}

// Globs, not plain imports, so the shell builds while a module is still being written.
const projectFileModule = import.meta.glob<ProjectFileModule>('../../ledger/project-file.ts');

async function loadProjectFileModule(): Promise<ProjectFileModule> {
  const load = projectFileModule['../../ledger/project-file.ts'];
  if (!load) throw new Error('Project files cannot be read or written in this build.');
  return load();
}

/** A file name from a project name: letters, digits, spaces and dashes kept. */
export function fileNameFor(name: string, extension: string): string {
  const base = name.replace(/[^\p{L}\p{N} _-]+/gu, '').trim().replace(/\s+/g, '-') || 'project';
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
  const { serializeProject } = await loadProjectFileModule();
  download(serializeProject(project), fileNameFor(project.name, 'json'), 'application/json');
}

/** Reads a project file chosen by the user; throws with the file's problem in words. */
export async function importProjectFile(file: File): Promise<Project> {
  const { parseProjectFile } = await loadProjectFileModule();
  const parsed = parseProjectFile(await file.text());
  return 'project' in parsed && !('format' in parsed) ? parsed.project : (parsed as Project);
}

/** Builds the auditable workbook of the open project (evaluation, rankings, optimiser result) and downloads it. */
export async function exportWorkbook(ws: Workspace): Promise<void> {
  const evaluation = ws.evaluation;
  if (!evaluation) throw new Error(`The workbook cannot be written while the results cannot be computed: ${ws.evaluationError ?? 'unknown reason'}`);
  const { exportWorkbook: build } = await import('../../io/workbook/index.ts');
  const bytes = await build(ws.project, {
    evaluation,
    ...(ws.optimiserResult && !ws.optimiserStale ? { optimise: ws.optimiserResult } : {}),
  });
  download(bytes as BlobPart, fileNameFor(ws.project.name, 'xlsx'), 'application/vnd.openxmlformats-officedocument.spreadsheetml.sheet');
}
