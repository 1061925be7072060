/**
 * The printed report's code, fetched as soon as the page has painted its first frame and is
 * idle (before the projects have opened; not when the results tab is first opened), and the
 * print path that waits for it: printing at once after opening the app still prints the report,
 * whether from the print button, Ctrl+P or the browser's own menu.
 */
import { tick } from 'svelte';

type ReportModule = typeof import('../results/Report.svelte');

let loading: Promise<ReportModule> | undefined;
let loaded: ReportModule | undefined;

/** Imports the report's component once; a failed import may be tried again. */
export function loadReport(): Promise<ReportModule> {
  loading ??= import('../results/Report.svelte').then(
    (mod) => {
      loaded = mod;
      return mod;
    },
    (error: unknown) => {
      loading = undefined;
      throw error;
    },
  );
  return loading;
}

/** True once the report's component is in the page's code. */
export function reportLoaded(): boolean {
  return loaded !== undefined;
}

/** The report's module once it is in the page's code, so a report mounted later shows at once. */
export function loadedReport(): ReportModule | undefined {
  return loaded;
}

/**
 * Fetches the report's code once the first frame is painted and the page is idle (at most
 * a fifth of a second later), so the moment in which the browser's own print menu would find it
 * missing is the first paint's. A failure is ignored here: the report's place says it, and
 * printing tries again.
 */
export function loadReportWhenIdle(): void {
  const start = () => void loadReport().catch(() => {});
  const afterPaint = () => {
    if (typeof requestIdleCallback === 'function') requestIdleCallback(start, { timeout: 200 });
    else setTimeout(start, 0);
  };
  if (typeof requestAnimationFrame === 'function') requestAnimationFrame(() => setTimeout(afterPaint, 0));
  else afterPaint();
}

/** Prints the report: waits for its code and for the page to show it, then opens the browser's print. */
export async function printReport(): Promise<void> {
  try {
    await loadReport();
  } catch {
    // The report's place in the page says it could not be loaded; print that.
  }
  await tick();
  window.print();
}
