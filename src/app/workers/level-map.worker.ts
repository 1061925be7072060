/**
 * The level map off the main thread: a coarse grid first (every fourth point), then the full
 * grid, each by the ledger's engine (ledger/map/level-grid.ts). Progress is posted after each
 * block of points; the page stops a run by terminating the worker.
 */
import { levelGrid } from '../../ledger/map/level-grid.ts';
import type { LevelMapMessage, LevelMapReply } from '../services/level-map-client.ts';

const scope = self as unknown as {
  onmessage: ((event: MessageEvent<LevelMapMessage>) => void) | null;
  postMessage(message: LevelMapReply): void;
};

scope.onmessage = (event) => {
  const { id, project, request } = event.data;
  try {
    const started = performance.now();
    const coarseNx = Math.max(2, Math.ceil(request.nx / 4));
    const coarseNy = Math.max(2, Math.ceil(request.ny / 4));
    const coarse = levelGrid(project, { ...request, spacingM: request.spacingM * 4, nx: coarseNx, ny: coarseNy });
    scope.postMessage({ id, kind: 'grid', stage: 'coarse', grid: coarse, ms: performance.now() - started });
    const grid = levelGrid(project, request, (done, total) => {
      scope.postMessage({ id, kind: 'progress', done, total });
    });
    scope.postMessage({ id, kind: 'grid', stage: 'full', grid, ms: performance.now() - started });
  } catch (e) {
    scope.postMessage({ id, kind: 'error', message: e instanceof Error ? e.message : String(e) });
  }
};
