/**
 * The panes whose code is loaded on first use (see LazyPane.svelte): the site plan, the
 * results, the machine register and the settings. Each loader is the module import, which the
 * browser fetches once; `loadEveryPane` fetches them all when the page is idle, so switching
 * tabs later does not wait.
 */
export const loadPlanPane = () => import('../plan/PlanPane.svelte');
export const loadResultsPane = () => import('./ResultsPane.svelte');
export const loadRegisterView = () => import('../register/RegisterView.svelte');
export const loadSettingsPane = () => import('./SettingsPane.svelte');

/** Fetches every lazily loaded pane once the page is idle (a failure is ignored here: the tab says it when opened). */
export function loadEveryPaneWhenIdle(): void {
  const start = () => {
    for (const load of [loadResultsPane, loadPlanPane, loadRegisterView, loadSettingsPane]) void load().catch(() => {});
  };
  if (typeof requestIdleCallback === 'function') requestIdleCallback(start, { timeout: 3000 });
  else setTimeout(start, 1000);
}
