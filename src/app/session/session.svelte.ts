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
import { OtherTabs } from './other-tabs.ts';
import { askToPersist, onPageLeave } from './page-events.ts';
import { RegisterStore } from '../register/register-store.svelte.ts';
import { mergeProjects } from '../../ledger/file/project-merge.ts';
import { skippedMessage } from './conflict-words.ts';
import { forgetTabProject, rememberTabProject, tabProject } from './tab-memory.ts';

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
  readonly #others = new OtherTabs({
    db: () => this.#db,
    saver: () => this.#saver,
    workspace: () => this.workspace,
    register: this.register,
    notify: (tone, text) => this.notify(tone, text),
  });

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
    void askToPersist().then((kept) => (this.persisted = kept));
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
    this.#listeners.push(onPageLeave(() => this.#saver?.leave()));
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
        if (!pending) void this.#others.catchUp();
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
    this.#others.opened(record.revision);
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

  async #heard(message: StorageMessage): Promise<void> {
    if (!this.#db) return;
    if (message.type !== 'list') return this.#others.heard(message);
    await this.refreshList();
    if (this.currentId && !this.projects.some((p) => p.id === this.currentId)) {
      this.notify(
        'info',
        'The open project was deleted in another tab. It stays on screen here until you open another; export it to keep a copy.',
      );
      this.#saver?.dispose();
      this.#saver = undefined;
    }
  }
}
