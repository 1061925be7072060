/**
 * Tells other tabs of this app what changed in storage, and hears what they changed:
 * a saved project (with its new revision), a change to the project list, or a saved
 * machine register.
 */
import type { MergeConflict } from '../../ledger/file/project-merge.ts';

export type StorageMessage =
  /** A project was stored at `revision`; `conflicts`: cells where this save replaced a value another tab had stored. */
  /** `keys`: the stored parts this revision wrote, when known, so a tab one revision behind reads only those. */
  | { type: 'saved'; projectId: string; revision: number; from: string; conflicts?: MergeConflict[]; keys?: string[] }
  /** The register was stored at `revision`; `conflicts`: cells where this save replaced a value another tab had stored. */
  | { type: 'register'; revision: number; from: string; conflicts?: MergeConflict<'machines'>[] }
  | { type: 'list'; from: string };

const CHANNEL_NAME = 'plant-noise-ledger/storage';

export class TabsChannel {
  /** This tab's id, so a tab ignores its own messages. */
  readonly tabId = Math.random().toString(36).slice(2);
  #channel: BroadcastChannel | undefined;

  constructor(onmessage: (message: StorageMessage) => void) {
    if (typeof BroadcastChannel === 'undefined') return;
    this.#channel = new BroadcastChannel(CHANNEL_NAME);
    this.#channel.onmessage = (event: MessageEvent<StorageMessage>) => {
      if (event.data && event.data.from !== this.tabId) onmessage(event.data);
    };
  }

  saved(projectId: string, revision: number, conflicts: MergeConflict[] = [], keys?: string[]): void {
    const message: StorageMessage = { type: 'saved', projectId, revision, from: this.tabId };
    if (conflicts.length) message.conflicts = conflicts;
    if (keys?.length) message.keys = keys;
    this.#channel?.postMessage(message);
  }

  registerSaved(revision: number, conflicts: MergeConflict<'machines'>[] = []): void {
    const message: StorageMessage = { type: 'register', revision, from: this.tabId };
    if (conflicts.length) message.conflicts = conflicts;
    this.#channel?.postMessage(message);
  }

  listChanged(): void {
    this.#channel?.postMessage({ type: 'list', from: this.tabId } satisfies StorageMessage);
  }

  close(): void {
    this.#channel?.close();
  }
}
