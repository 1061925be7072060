/**
 * The session: which projects are stored, which one is open, its Workspace, and the
 * messages about storage the user should read. It opens the database, keeps the open
 * project saved as it is edited, and listens to other tabs.
 */
import { freeCopyName } from './free-name.ts';
import type { Project } from '../../ledger/model/model.ts';
import { demoProject } from '../../ledger/model/demo.ts';
import {
  createProject,
  deleteProject,
  describeOpenError,
  describeStorageError,
  duplicateProject,
  ledgerDb,
  listProjects,
  loadChanges,
  loadProject,
  projectToOpen,
  rememberLastProject,
  renameProject,
  storedText,
  UnopenableProjectError,
  type LedgerDB,
  type ProjectRecord,
  type ProjectSummary,
} from '../../db/index.ts';
import { Workspace } from '../state/workspace.svelte.ts';
import { blankProject } from '../state/blank-project.ts';
import { ProjectSaver, recoverUnsaved } from './saver.ts';
import { TabsChannel, type StorageMessage } from './tabs-channel.ts';
import { RegisterStore } from '../register/register-store.svelte.ts';
import { mergeProjects, same, type MergeConflict } from '../../ledger/file/project-merge.ts';
import { registerReplacedMessage, replacedMessage, skippedMessage } from './conflict-words.ts';
import { registerColumns } from '../register/register-table.ts';
import { forgetTabProject, rememberTabProject, tabProject } from './tab-memory.ts';

/** The value of a conflict's cell in a project (undefined when the row or field is absent). */
function cellValue(project: Project, c: MergeConflict): unknown {
  if (c.list === 'project') return (project as unknown as Record<string, unknown>)[c.field];
  const row = (project[c.list] as unknown as Record<string, unknown>[]).find((r) => r.id === c.rowId);
  if (!row) return undefined;
  return c.field ? row[c.field] : row;
}

/** A stored project that cannot be opened, with every problem found, in words. */
export interface Unopenable {
  id: string;
  name: string;
  problems: readonly string[];
}

export interface Notice {
  id: number;
  tone: 'error' | 'info';
  text: string;
}

export class Session {
  status = $state<'starting' | 'ready'>('starting');
  projects = $state.raw<ProjectSummary[]>([]);
  currentId = $state<string | undefined>();
  workspace = $state.raw<Workspace | undefined>();
  notices = $state.raw<Notice[]>([]);
  /** True while an edit waits to be written. */
  saving = $state(false);
  /** The last write failed: the header says so until a later write succeeds. */
  saveFailed = $state(false);
  /** Whether the browser agreed to keep this site's data (undefined until it answers). */
  persisted = $state<boolean | undefined>();
  /** False when the database could not be opened: edits then live in this tab only. */
  stored = $state(true);
  /** Stored projects that cannot be opened (damaged, newer, or not upgradable): kept until exported or deleted. */
  unopenable = $state.raw<Unopenable[]>([]);

  /** The buyer's machine register, shared by every project. */
  readonly register = new RegisterStore();

  #db: LedgerDB | undefined;
  #saver: ProjectSaver | undefined;
  #channel: TabsChannel | undefined;
  #noticeId = 0;
  #listeners: (() => void)[] = [];

  async start(db: LedgerDB = ledgerDb()): Promise<void> {
    try {
      db.on('versionchange', () => {
        db.close();
        this.notify(
          'error',
          'This app was updated in another tab. This tab reloads in a moment to use the new version; your saved edits are kept.',
        );
        setTimeout(() => location.reload(), 1500);
        return false;
      });
      db.on('blocked', () => {
        this.notify('error', describeStorageError({ name: 'BlockedError' }));
      });
      await db.open();
      this.#db = db;
    } catch (error) {
      this.stored = false;
      this.notify('error', describeOpenError(error));
      this.#openInMemory(demoProject());
      void this.register.open(undefined);
      this.status = 'ready';
      return;
    }
    void this.#askToPersist();
    void this.register.open(db);
    this.#channel = new TabsChannel((m) => void this.#heard(m));
    this.register.onsaved = (revision, conflicts) => this.#channel?.registerSaved(revision, conflicts);
    try {
      const recovery = await recoverUnsaved(db);
      for (const name of recovery.keptApart) {
        this.notify(
          'info',
          `An edit left unsaved by an earlier visit was made on an older copy of a project that has changed since; it is kept as the project “${name}”.`,
        );
      }
      let record = await projectToOpen(db, tabProject(), (e) => this.#cannotOpen(e));
      if (!record) record = await createProject(db, demoProject());
      await this.#open(record);
      await this.refreshList();
    } catch (error) {
      this.notify('error', describeStorageError(error));
      if (!this.workspace) this.#openInMemory(demoProject());
    }
    this.#listen();
    this.status = 'ready';
  }

  /** Stops timers, listeners and the channel (tests, or a page being torn down). */
  async stop(): Promise<void> {
    await this.#saver?.flush();
    this.#saver?.dispose();
    this.#channel?.close();
    for (const off of this.#listeners) off();
    this.#listeners = [];
  }

  notify(tone: Notice['tone'], text: string): void {
    if (this.notices.some((n) => n.text === text)) return;
    this.notices = [...this.notices, { id: ++this.#noticeId, tone, text }];
  }

  dismiss(id: number): void {
    this.notices = this.notices.filter((n) => n.id !== id);
  }

  get currentName(): string {
    return this.workspace?.project.name ?? '';
  }

  async refreshList(): Promise<void> {
    if (!this.#db) return;
    this.projects = await listProjects(this.#db);
    if (this.unopenable.length)
      this.unopenable = this.unopenable.filter((u) => this.projects.some((p) => p.id === u.id));
  }

  /** Writes any waiting edit now. */
  async flush(): Promise<void> {
    await this.#saver?.flush();
  }

  async switchTo(id: string): Promise<void> {
    if (!this.#db || id === this.currentId) return;
    await this.#saver?.flush();
    let record;
    try {
      record = await loadProject(this.#db, id);
    } catch (error) {
      if (error instanceof UnopenableProjectError) this.#cannotOpen(error);
      else this.notify('error', describeStorageError(error));
      return;
    }
    if (!record) {
      this.notify('error', 'That project no longer exists; it may have been deleted in another tab.');
      await this.refreshList();
      return;
    }
    await this.#open(record);
  }

  /**
   * The stored text of a project that cannot be opened, exactly as kept (undefined when it
   * no longer exists); the view offers it as a download.
   */
  async unopenableText(id: string): Promise<string | undefined> {
    if (!this.#db) return undefined;
    try {
      return await storedText(this.#db, id);
    } catch (error) {
      this.notify('error', describeStorageError(error));
      return undefined;
    }
  }

  /** Deletes a stored project that cannot be opened. */
  async removeUnopenable(id: string): Promise<void> {
    if (!this.#db) return;
    try {
      await deleteProject(this.#db, id);
      this.unopenable = this.unopenable.filter((u) => u.id !== id);
      this.#channel?.listChanged();
      await this.refreshList();
    } catch (error) {
      this.notify('error', describeStorageError(error));
    }
  }

  #cannotOpen(error: UnopenableProjectError): void {
    const entry = { id: error.projectId, name: error.projectName, problems: error.problems };
    this.unopenable = [...this.unopenable.filter((u) => u.id !== entry.id), entry];
  }

  async createBlank(name: string): Promise<void> {
    await this.#create(blankProject(name));
  }

  /** Opens a new copy of the demo under a name no other project has ("… (copy)", "… (copy 2)", …). */
  async createDemo(): Promise<void> {
    const demo = demoProject();
    const name = freeCopyName(
      demo.name,
      this.projects.map((p) => p.name),
      false,
    );
    await this.#create({ ...demo, name });
  }

  /** The name offered for a duplicate of the open project: one no stored project has. */
  get copyName(): string {
    return freeCopyName(
      this.currentName,
      this.projects.map((p) => p.name),
    );
  }

  /** Stores a project read from a file as a new project and opens it. */
  async createFrom(project: Project): Promise<void> {
    await this.#create(project);
  }

  async rename(name: string): Promise<void> {
    const id = this.currentId;
    const trimmed = name.trim();
    if (!id || !trimmed) return;
    if (!this.#db) {
      this.workspace?.setName(trimmed);
      return;
    }
    await this.#saver?.flush();
    try {
      const revision = await renameProject(this.#db, id, trimmed);
      const record = await loadProject(this.#db, id);
      if (record && this.#saver?.adopt(record)) this.workspace?.replaceFromOutside(record.project);
      this.#channel?.saved(id, revision);
      this.#channel?.listChanged();
      await this.refreshList();
    } catch (error) {
      this.notify('error', describeStorageError(error));
    }
  }

  async duplicate(name: string): Promise<void> {
    if (!this.#db || !this.currentId) return;
    await this.#saver?.flush();
    try {
      const record = await duplicateProject(this.#db, this.currentId, name.trim() || this.copyName);
      this.#channel?.listChanged();
      await this.#open(record);
      await this.refreshList();
    } catch (error) {
      this.notify('error', describeStorageError(error));
    }
  }

  /** Deletes a project; when it is the open one, opens another (or a new demo when none is left). */
  async remove(id: string): Promise<void> {
    if (!this.#db) return;
    try {
      if (id === this.currentId) {
        this.#saver?.dispose();
        this.#saver = undefined;
        forgetTabProject();
      }
      await deleteProject(this.#db, id);
      this.#channel?.listChanged();
      await this.refreshList();
      if (id === this.currentId) {
        const next =
          (await projectToOpen(this.#db, undefined, (e) => this.#cannotOpen(e))) ??
          (await createProject(this.#db, demoProject()));
        await this.#open(next);
        await this.refreshList();
      }
    } catch (error) {
      this.notify('error', describeStorageError(error));
    }
  }

  async #create(project: Project): Promise<void> {
    if (!this.#db) {
      this.#openInMemory(project);
      return;
    }
    await this.#saver?.flush();
    try {
      const record = await createProject(this.#db, project);
      this.#channel?.listChanged();
      await this.#open(record);
      await this.refreshList();
    } catch (error) {
      this.notify('error', describeStorageError(error));
    }
  }

  async #open(record: ProjectRecord): Promise<void> {
    const db = this.#db!;
    this.#saver?.dispose();
    const saver = new ProjectSaver(db, record, {
      onpending: (pending) => {
        this.saving = pending;
        if (!pending) void this.#catchUp();
      },
      onerror: (message) => {
        this.saveFailed = true;
        this.notify('error', message);
      },
      onmerged: (sent, stored) => {
        const ws = this.workspace;
        if (!ws || this.#saver !== saver) return stored;
        const next = mergeProjects(sent, ws.project, stored, 'mine').project;
        ws.replaceFromOutside(next);
        return next;
      },
      onsaved: (revision, keys, conflicts) => {
        this.saveFailed = false;
        this.#channel?.saved(record.id, revision, conflicts, keys);
        const name = this.workspace?.project.name;
        const listed = this.projects.find((p) => p.id === record.id);
        if (listed && name !== undefined && listed.name !== name) {
          this.projects = this.projects.map((p) => (p.id === record.id ? { ...p, name } : p));
          this.#channel?.listChanged();
        }
      },
    });
    this.#saver = saver;
    this.#heardRevision = record.revision;
    this.#heardKeys.clear();
    this.currentId = record.id;
    rememberTabProject(record.id);
    this.workspace = new Workspace(record.project, {
      onchange: (project) => saver.schedule(project),
      onskipped: (conflicts, action) => this.notify('info', skippedMessage(this.workspace, conflicts, action)),
    });
    await rememberLastProject(db, record.id).catch(() => undefined);
  }

  #openInMemory(project: Project): void {
    this.currentId = undefined;
    this.workspace = new Workspace(project);
  }

  /** The newest revision of the open project another tab said it stored. */
  #heardRevision = 0;
  /** The parts each heard revision of the open project wrote, when its tab said so. */
  #heardKeys = new Map<number, string[]>();
  #catchingUp = false;

  async #heard(message: StorageMessage): Promise<void> {
    if (!this.#db) return;
    if (message.type === 'register') {
      if (message.conflicts?.length) this.#toldRegisterReplaced(message.conflicts);
      await this.register.heard(message.revision);
      return;
    }
    if (message.type === 'list') {
      await this.refreshList();
      if (this.currentId && !this.projects.some((p) => p.id === this.currentId)) {
        this.notify(
          'info',
          'The open project was deleted in another tab. It stays on screen here until you open another; export it to keep a copy.',
        );
        this.#saver?.dispose();
        this.#saver = undefined;
      }
      return;
    }
    const saver = this.#saver;
    if (!saver || message.projectId !== saver.projectId) return;
    if (message.conflicts?.length) this.#toldReplaced(message.conflicts);
    this.#heardRevision = Math.max(this.#heardRevision, message.revision);
    if (message.keys) this.#heardKeys.set(message.revision, message.keys);
    await this.#catchUp();
  }

  /** Tells this tab when a register value it committed was replaced by another tab's later save. */
  #toldRegisterReplaced(conflicts: readonly MergeConflict<'machines'>[]): void {
    const machines = this.register.register.machines as unknown as Record<string, unknown>[];
    const mine = conflicts.filter((c) => {
      const row = machines.find((m) => m.id === c.rowId);
      return same(row === undefined ? undefined : c.field ? row[c.field] : row, c.theirs);
    });
    if (!mine.length) return;
    const columns = registerColumns(this.workspace?.separator ?? '.');
    const headerOf = (field: string) => columns.find((col) => col.id === field || col.field === field)?.header ?? field;
    this.notify('error', registerReplacedMessage(mine, headerOf));
  }

  /** Tells this tab when a value it committed was replaced by another tab's later save. */
  #toldReplaced(conflicts: readonly MergeConflict[]): void {
    const ws = this.workspace;
    if (!ws) return;
    const mine = conflicts.filter((c) => same(cellValue(ws.project, c), c.theirs));
    if (mine.length) this.notify('error', replacedMessage(ws, mine));
  }

  /**
   * Takes in what other tabs stored since this tab's revision, once this tab has nothing
   * waiting to be written (a write of its own merges by itself). Edits of this tab not yet
   * stored are kept on top.
   */
  async #catchUp(): Promise<void> {
    const saver = this.#saver;
    if (!this.#db || !saver || this.#catchingUp || saver.pending || this.#heardRevision <= saver.revision) return;
    this.#catchingUp = true;
    try {
      const record =
        (await this.#readChanges(saver.projectId, saver.revision, saver.base)) ??
        (await loadProject(this.#db, saver.projectId));
      if (!record || record.revision <= saver.revision || saver !== this.#saver) return;
      for (const r of this.#heardKeys.keys()) if (r <= record.revision) this.#heardKeys.delete(r);
      const ws = this.workspace;
      const base = saver.base;
      if (!ws || !saver.adopt(record)) return;
      const next = mergeProjects(base, ws.project, record.project, 'mine').project;
      ws.replaceFromOutside(next);
      if (next !== record.project) saver.schedule(next);
    } catch (error) {
      this.notify('error', describeStorageError(error));
    } finally {
      this.#catchingUp = false;
    }
    if (this.#heardRevision > saver.revision) void this.#catchUp();
  }

  /**
   * The stored project at the newest heard revision, reading only the parts the revisions
   * since `from` wrote, when every one of them said which; else undefined (read it whole).
   * At 14,000 machines a whole read takes about 2 s on a busy machine (`npm run bench -- catch-up`).
   */
  async #readChanges(id: string, from: number, base: Project): Promise<ProjectRecord | undefined> {
    const target = this.#heardRevision;
    const keys: string[] = [];
    for (let r = from + 1; r <= target; r++) {
      const written = this.#heardKeys.get(r);
      if (!written) return undefined;
      keys.push(...written);
    }
    return this.#db ? loadChanges(this.#db, id, base, keys, target) : undefined;
  }

  async #askToPersist(): Promise<void> {
    try {
      if (typeof navigator === 'undefined' || !navigator.storage?.persist) return;
      this.persisted = (await navigator.storage.persisted()) || (await navigator.storage.persist());
    } catch {
      this.persisted = false;
    }
  }

  #listen(): void {
    if (typeof window === 'undefined') return;
    const leave = () => this.#saver?.leave();
    const hidden = () => {
      if (document.visibilityState === 'hidden') this.#saver?.leave();
    };
    window.addEventListener('pagehide', leave);
    document.addEventListener('visibilitychange', hidden);
    this.#listeners.push(
      () => window.removeEventListener('pagehide', leave),
      () => document.removeEventListener('visibilitychange', hidden),
    );
  }
}
