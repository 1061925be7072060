/**
 * One optimiser run at a time for the Workspace: the result, the project it was found
 * for (so the UI can say it is stale), whether a run is under way, how far it has gone,
 * and why it failed. A run can be cancelled; the solver can be loaded ahead of need.
 */
import type { Project } from '../../ledger/model/model.ts';
import type { OptimiseOptions, OptimiseResult } from '../../ledger/model/results.ts';
import type { Progress } from '../services/worker-calls.ts';

/** Runs the optimiser (in a worker in the app; directly in tests). */
export type Optimiser = (
  project: Project,
  options: OptimiseOptions,
  signal?: AbortSignal,
  onProgress?: (progress: Progress) => void,
) => Promise<OptimiseResult>;

type Client = {
  optimiseInWorker: Optimiser;
  warmOptimiser(): void;
  forgetWarmUp(): void;
};

// A glob rather than a plain import() so the Workspace builds before the client exists.
const optimiseClient = import.meta.glob<Client>('../services/optimise-client.ts');

async function client(): Promise<Client> {
  const load = optimiseClient['../services/optimise-client.ts'];
  if (!load) throw new Error('The optimiser is not available in this build.');
  return load();
}

/** The worker client, loaded on first use. */
export const defaultOptimise: Optimiser = async (project, options, signal, onProgress) =>
  (await client()).optimiseInWorker(project, options, signal, onProgress);

/** Loads the solver in the worker ahead of the first run (does nothing in a build without it). */
export async function warmDefaultOptimiser(): Promise<void> {
  try {
    (await client()).warmOptimiser();
  } catch {
    // The first run says what is wrong.
  }
}

export class OptimiserRun {
  #optimise: Optimiser;
  #result = $state.raw<OptimiseResult | undefined>();
  #for = $state.raw<Project | undefined>();
  #running = $state(false);
  #error = $state<string | undefined>();
  #progress = $state.raw<Progress | undefined>();
  #abort: AbortController | undefined;

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
  /** How far the run under way has gone (undefined when none is, or before its first report). */
  get progress(): Progress | undefined {
    return this.#progress;
  }
  /** True when `current` is not the project the result was found for. */
  staleFor(current: Project): boolean {
    return this.#result !== undefined && this.#for !== current;
  }

  /** Loads the solver ahead of the first run, when this run uses the app's worker. */
  warm(): void {
    if (this.#optimise === defaultOptimise) void warmDefaultOptimiser();
  }

  /** Stops the run under way; its error says it was cancelled and the earlier result stays. */
  cancel(): void {
    this.#abort?.abort();
  }

  /** Finds the cheapest compliant fleet for `project`. */
  async run(project: Project, options: OptimiseOptions): Promise<void> {
    this.#abort?.abort();
    const abort = new AbortController();
    this.#abort = abort;
    this.#running = true;
    this.#error = undefined;
    this.#progress = undefined;
    try {
      const result = await this.#optimise($state.snapshot(project) as Project, options, abort.signal, (p) => {
        if (this.#abort === abort) this.#progress = p;
      });
      if (this.#abort !== abort) return;
      this.#result = result;
      this.#for = project;
    } catch (error) {
      if (this.#abort !== abort) return;
      this.#error = error instanceof Error ? error.message : String(error);
      if (abort.signal.aborted) this.#forgetWarmUp();
    } finally {
      if (this.#abort === abort) {
        this.#running = false;
        this.#progress = undefined;
        this.#abort = undefined;
      }
    }
  }

  /** After a cancel stopped the worker: load the solver again in a fresh one, ready for the next run. */
  #forgetWarmUp(): void {
    if (this.#optimise !== defaultOptimise) return;
    void client().then(
      (c) => {
        c.forgetWarmUp();
        c.warmOptimiser();
      },
      () => undefined,
    );
  }
}
