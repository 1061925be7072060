/**
 * One optimiser run at a time for the Workspace: the result, the project it was found
 * for (so the UI can say it is stale), whether a run is under way and why it failed.
 */
import type { Project } from '../../ledger/model/model.ts';
import type { OptimiseOptions, OptimiseResult } from '../../ledger/model/results.ts';

/** Runs the optimiser (in a worker in the app; directly in tests). */
export type Optimiser = (project: Project, options: OptimiseOptions) => Promise<OptimiseResult>;

// A glob rather than a plain import() so the Workspace builds before the client exists.
const optimiseClient = import.meta.glob<{ optimiseInWorker: Optimiser }>('../services/optimise-client.ts');

/** The worker client, loaded on first use. */
export const defaultOptimise: Optimiser = async (project, options) => {
  const load = optimiseClient['../services/optimise-client.ts'];
  if (!load) throw new Error('The optimiser is not available in this build.');
  const { optimiseInWorker } = await load();
  return optimiseInWorker(project, options);
};

export class OptimiserRun {
  #optimise: Optimiser;
  #result = $state.raw<OptimiseResult | undefined>();
  #for = $state.raw<Project | undefined>();
  #running = $state(false);
  #error = $state<string | undefined>();

  constructor(optimise: Optimiser = defaultOptimise) {
    this.#optimise = optimise;
  }

  get result(): OptimiseResult | undefined {
    return this.#result;
  }
  get running(): boolean {
    return this.#running;
  }
  get error(): string | undefined {
    return this.#error;
  }
  /** True when `current` is not the project the result was found for. */
  staleFor(current: Project): boolean {
    return this.#result !== undefined && this.#for !== current;
  }

  /** Finds the cheapest compliant fleet for `project`. */
  async run(project: Project, options: OptimiseOptions): Promise<void> {
    this.#running = true;
    this.#error = undefined;
    try {
      const result = await this.#optimise($state.snapshot(project) as Project, options);
      this.#result = result;
      this.#for = project;
    } catch (error) {
      this.#error = error instanceof Error ? error.message : String(error);
    } finally {
      this.#running = false;
    }
  }
}
