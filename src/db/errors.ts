/**
 * Storage errors in words a user can act on. IndexedDB reports a full disk, a blocked
 * upgrade or a private-mode refusal as error names; these become sentences.
 */

/** A sentence describing a storage failure, with what to do about it. */
export function describeStorageError(error: unknown): string {
  const name = errorName(error);
  const inner = innerName(error);
  if (name === 'QuotaExceededError' || inner === 'QuotaExceededError') {
    return 'The browser has no more storage space for this site, so the last edit was not saved. Export the project file to keep your work, then delete old projects or free disk space.';
  }
  if (name === 'BlockedError' || name === 'VersionChangeError' || inner === 'BlockedError') {
    return 'Another tab holds an older version of the ledger open, so the stored projects cannot be opened. Close the other tabs of this app, then reload this one.';
  }
  if (name === 'DatabaseClosedError') {
    return 'The project store was closed (another tab may have updated the app). Reload the page to continue; edits made before this message were saved.';
  }
  if (name === 'InvalidStateError' || name === 'MissingAPIError' || name === 'OpenFailedError') {
    return 'This browser refuses to store data for this site (private window or storage turned off). Edits stay in this tab only; export the project file to keep them.';
  }
  const message = error instanceof Error ? error.message : String(error);
  return `The project could not be saved: ${message}`;
}

function errorName(error: unknown): string | undefined {
  return typeof error === 'object' && error !== null && 'name' in error
    ? String((error as { name: unknown }).name)
    : undefined;
}

function innerName(error: unknown): string | undefined {
  if (typeof error !== 'object' || error === null || !('inner' in error)) return undefined;
  return errorName((error as { inner: unknown }).inner);
}

/**
 * A sentence for a failure to open the project store itself, in words: never the raw
 * error after "could not be saved", because nothing was being saved.
 */
export function describeOpenError(error: unknown): string {
  const name = errorName(error);
  const inner = innerName(error);
  if (
    name === 'BlockedError' ||
    name === 'VersionChangeError' ||
    inner === 'BlockedError' ||
    name === 'QuotaExceededError' ||
    inner === 'QuotaExceededError'
  ) {
    return describeStorageError(error);
  }
  const code = [name, inner].filter((n) => n && n !== 'Error').join(', ');
  return (
    'The browser’s project store (IndexedDB) could not be opened' +
    (code ? ` (${code})` : '') +
    ', so nothing can be stored in this tab. ' +
    'The demo project is open in this tab only: export the project file to keep your work. Closing other tabs of this app and reloading, ' +
    'or leaving a private window, usually helps.'
  );
}
