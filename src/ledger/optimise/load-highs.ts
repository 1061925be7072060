/**
 * Loads HiGHS (WebAssembly, the `highs` package) as an {@link LpSolver}.
 * In Node the package finds its `.wasm` beside itself; a browser worker passes
 * `locateFile` returning the bundled asset's URL. Loading takes a few hundred
 * milliseconds; load once and reuse the solver for every solve.
 */
import type { LpSolver } from './solver.ts';

export interface HighsLoadOptions {
  /** Where the loader finds `highs.wasm` (browser bundles). */
  locateFile?: (file: string) => string;
}

/** Loads HiGHS once; the returned object solves LP-format text synchronously. */
export async function loadHighsSolver(options: HighsLoadOptions = {}): Promise<LpSolver> {
  const loadHighs = (await import('highs')).default;
  return await loadHighs(options.locateFile ? { locateFile: options.locateFile } : {});
}
