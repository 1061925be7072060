/** Project files in the app: download text, opening with upgrade or refusal, size limit. */
import { describe, expect, it, vi } from 'vitest';
import {
  downloadProjectFile,
  openProjectFile,
  projectFileName,
  projectFileText,
  readProjectText,
} from '../../../src/app/services/project-files.ts';
import { demoProject } from '../../../src/ledger/model/demo.ts';
import { PROJECT_VERSION } from '../../../src/ledger/model/model.ts';

const chosen = (text: string, name = 'site.ledger.json', size = text.length) => ({
  name,
  size,
  text: async () => text,
  arrayBuffer: async () => new TextEncoder().encode(text).buffer,
});

describe('project files', () => {
  it('projectFileName keeps letters, digits and dashes', () => {
    expect(projectFileName('Riverside bridge / phase 2')).toBe('Riverside-bridge-phase-2.ledger.json');
    expect(projectFileName('***')).toBe('project.ledger.json');
  });

  it('projectFileText then openProjectFile gives the same project, unread cells and NaN included', async () => {
    const project = demoProject();
    const first = project.candidates[0]!;
    first.lwaDb = NaN;
    project.unreadCells = { [`candidates/${first.id}/lwaDb`]: '12O' };
    const outcome = await openProjectFile(chosen(projectFileText(project)));
    expect(outcome.ok).toBe(true);
    if (!outcome.ok) return;
    expect(outcome.project).toEqual(project);
    expect(outcome.upgradedFrom).toBeUndefined();
    expect(outcome.message).toBe('Opened "site.ledger.json".');
  });

  it('openProjectFile refuses a newer version with a message naming the versions read', async () => {
    const file = JSON.parse(projectFileText(demoProject()));
    file.version = PROJECT_VERSION + 1;
    const outcome = await openProjectFile(chosen(JSON.stringify(file), 'future.json'));
    expect(outcome).toEqual({
      ok: false,
      problems: [
        `"future.json", Version: ${PROJECT_VERSION + 1} is newer than this program reads (it reads versions 1 to ${PROJECT_VERSION}; open the file with a newer version of the program)`,
      ],
    });
  });

  it('openProjectFile reports JSON syntax errors with line and column, and tolerates a byte-order mark', async () => {
    const broken = await openProjectFile(
      chosen('{\n  "format": "plant-noise-ledger/project",\n  "version": 1,,\n}', 'broken.json'),
    );
    expect(broken.ok).toBe(false);
    if (!broken.ok) expect(broken.problems[0]).toMatch(/^"broken\.json", Line 3, column \d+: /);
    const withMark = readProjectText(`\ufeff${projectFileText(demoProject())}`, 'mark.json');
    expect(withMark.ok).toBe(true);
  });

  it('openProjectFile refuses a file over 20 MB without reading it', async () => {
    const text = vi.fn(async () => '');
    const outcome = await openProjectFile({
      name: 'huge.json',
      size: 21 * 1024 * 1024,
      text,
      arrayBuffer: async () => new ArrayBuffer(0),
    });
    expect(outcome).toEqual({
      ok: false,
      problems: ['"huge.json" is 21 MB; project files of up to 20 MB are accepted'],
    });
    expect(text).not.toHaveBeenCalled();
  });

  it('downloadProjectFile offers the project file under its file name', () => {
    const clicks: string[] = [];
    const createObjectURL = vi.fn(() => 'blob:project');
    Object.assign(URL, { createObjectURL, revokeObjectURL: vi.fn() });
    const click = vi.spyOn(HTMLAnchorElement.prototype, 'click').mockImplementation(function (this: HTMLAnchorElement) {
      clicks.push(this.download);
    });
    downloadProjectFile({ ...demoProject(), name: 'Depot works' });
    expect(clicks).toEqual(['Depot-works.ledger.json']);
    expect(createObjectURL).toHaveBeenCalledTimes(1);
    click.mockRestore();
  });
});
