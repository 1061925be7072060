/**
 * The supplier-list import dialog. Props: { project, dutyId?, onconfirm(candidates,
 * unreadCells), oncancel, reader? }. The caller adds the confirmed candidates (and their
 * unread cells) to the project as one edit.
 */
export { default as ImportDialog } from './ImportDialog.svelte';
export { readInWorker, readInProcess, type ImportReader, type ReadOutcome } from '../services/import-client.ts';
