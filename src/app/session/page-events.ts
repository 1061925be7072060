/**
 * The page events the session needs: when the page is left or hidden (the moment to write
 * any waiting edit), and whether the browser will keep this site's data.
 */

/** Calls `leave` when the page is hidden or left; returns the function that stops listening. */
export function onPageLeave(leave: () => void): () => void {
  if (typeof window === 'undefined') return () => undefined;
  const hidden = () => {
    if (document.visibilityState === 'hidden') leave();
  };
  window.addEventListener('pagehide', leave);
  document.addEventListener('visibilitychange', hidden);
  return () => {
    window.removeEventListener('pagehide', leave);
    document.removeEventListener('visibilitychange', hidden);
  };
}

/** Asks the browser to keep this site's data; true when it will, false when not or when asking failed. */
export async function askToPersist(): Promise<boolean | undefined> {
  try {
    if (typeof navigator === 'undefined' || !navigator.storage?.persist) return undefined;
    return (await navigator.storage.persisted()) || (await navigator.storage.persist());
  } catch {
    return false;
  }
}
