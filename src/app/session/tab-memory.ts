/**
 * Which project this browser tab has open, kept in sessionStorage (one per tab, kept over
 * a reload), so a reload reopens this tab's project even when another tab opened a
 * different one since.
 */
const KEY = 'plant-noise-ledger/tab-project';

function store(): Storage | undefined {
  try {
    return typeof sessionStorage === 'undefined' ? undefined : sessionStorage;
  } catch {
    return undefined;
  }
}

/** The project id this tab had open, if any. */
export function tabProject(): string | undefined {
  try {
    return store()?.getItem(KEY) ?? undefined;
  } catch {
    return undefined;
  }
}

export function rememberTabProject(id: string): void {
  try {
    store()?.setItem(KEY, id);
  } catch {
    // storage refused: a reload opens the last project opened in any tab
  }
}

export function forgetTabProject(): void {
  try {
    store()?.removeItem(KEY);
  } catch {
    // nothing kept
  }
}
