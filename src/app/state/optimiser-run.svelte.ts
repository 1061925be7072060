/**
 * One optimiser run at a time for the Workspace: the result, the project it was found
 * for (so the UI can say it is stale), whether a run is under way, how far it has gone,
 * and why it failed. A run can be cancelled; the solver can be loaded ahead of need.
 *
 * The run streams: once the fleets are known the result is shown (its trade-off points still empty) and
 * each frontier point is added as the worker finds it. Stopping then keeps the fleets and the points found
 * so far (every one of them a true frontier point, cheapest first); stopping before the fleets are known
 * keeps the earlier result.
 */
import type { Project } from '../../ledger/model/model.ts';
import type { OptimiseOptions, OptimiseResult } from '../../ledger/model/results.ts';
import type { OptimisePart } from '../services/optimise-client.ts';
import type { Progress } from '../services/worker-calls.ts';

/** Runs the optimiser (in a worker in the app; directly in tests). */
export type Optimiser = (
  project: Project,
  options: OptimiseOptions,
  signal?: AbortSignal,
  onProgress?: (progress: Progress) => void,
  onPart?: (part: OptimisePart) => void,
) => Promise<OptimiseResult>;

/**
 * Where the exact frontier of the shown result stands: being traced, complete, or stopped (by the user or
 * the time limit) with the points found so far. `count` is the number of fleets on it so far.
 */
export interface FrontierState {
  state: 'tracing' | 'complete' | 'stopped';
  count: number;
}

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
export const defaultOptimise: Optimiser = async (project, options, signal, onProgress, onPart) =>
  (await client()).optimiseInWorker(project, options, signal, onProgress, onPart);

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
  #frontier = $state.raw<FrontierState | undefined>();
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
  /** Where the shown result's exact frontier stands (undefined when the result has none). */
  get frontier(): FrontierState | undefined {
    return this.#frontier;
  }
  /** True when `current` is not the project the result was found for. */
  staleFor(current: Project): boolean {
    return this.#result !== undefined && this.#for !== current;
  }

  /** Loads the solver ahead of the first run, when this run uses the app's worker. */
  warm(): void {
    if (this.#optimise === defaultOptimise) void warmDefaultOptimiser();
  }

  /**
   * Stops the run under way. Before the fleets are known its error says it was cancelled and the earlier
   * result stays; once they are known the fleets and the frontier points found so far stay.
   */
  cancel(): void {
    this.#abort?.abort();
  }

  /**
   * Finds the cheapest compliant fleet for `project`. `onFound` hears the result once, as soon as its fleets
   * are known (before the frontier is traced, when the optimiser streams; else at the end).
   */
  async run(project: Project, options: OptimiseOptions, onFound?: (result: OptimiseResult) => void): Promise<void> {
    this.#abort?.abort();
    const abort = new AbortController();
    this.#abort = abort;
    this.#running = true;
    this.#error = undefined;
    this.#progress = undefined;
    let head: OptimiseResult | undefined;
    const points: OptimiseResult['tradeOff'] = [];
    const mine = () => this.#abort === abort;
    const show = (result: OptimiseResult, frontier: FrontierState | undefined) => {
      this.#result = result;
      this.#for = project;
      this.#frontier = frontier;
    };
    const onPart = (part: OptimisePart) => {
      if (!mine()) return;
      if (part.kind === 'fleet') {
        head = part.result;
        show(head, { state: 'tracing', count: 0 });
        onFound?.(head);
      } else if (head) {
        points[part.index] = part.point;
        show({ ...head, tradeOff: points.slice() }, { state: 'tracing', count: points.length });
      }
    };
    try {
      const result = await this.#optimise(
        $state.snapshot(project) as Project,
        options,
        abort.signal,
        (p) => {
          if (mine()) this.#progress = p;
        },
        onPart,
      );
      if (!mine()) return;
      show(
        result,
        result.frontier
          ? { state: result.frontier.complete ? 'complete' : 'stopped', count: result.tradeOff.length }
          : undefined,
      );
      if (!head) onFound?.(result);
    } catch (error) {
      if (!mine()) return;
      if (head) {
        // Stopped while tracing: the fleets and the points found so far stand.
        show(
          { ...head, tradeOff: points.slice(), frontier: { complete: false } },
          { state: 'stopped', count: points.length },
        );
        if (!abort.signal.aborted) this.#error = error instanceof Error ? error.message : String(error);
      } else {
        this.#error = error instanceof Error ? error.message : String(error);
      }
      if (abort.signal.aborted || head) this.#forgetWarmUp();
    } finally {
      if (mine()) {
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
