/**
 * The printed report's code, loaded once the project is open (not when the results tab is
 * first opened), and the print path that waits for it: printing at once after opening the
 * app still prints the report.
 */
import { tick } from 'svelte';

type ReportModule = typeof import('../results/Report.svelte');

let loading: Promise<ReportModule> | undefined;
let loaded = false;

/** Imports the report's component once; a failed import may be tried again. */
export function loadReport(): Promise<ReportModule> {
  loading ??= import('../results/Report.svelte').then(
    (mod) => {
      loaded = true;
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
  return loaded;
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
