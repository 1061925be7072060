/**
 * Running the level map in a Web Worker (src/app/workers/level-map.worker.ts). One run at a
 * time: starting a run or cancelling stops the worker that is working, so a cancelled map
 * costs nothing more.
 */
import type { Project } from '../../ledger/model/model.ts';
import type { LevelGrid, MapRequest } from '../../ledger/map/level-grid.ts';

export interface LevelMapMessage {
  id: number;
  project: Project;
  request: MapRequest;
}

export type LevelMapReply =
  | { id: number; kind: 'grid'; stage: 'coarse' | 'full'; grid: LevelGrid; ms: number }
  | { id: number; kind: 'progress'; done: number; total: number }
  | { id: number; kind: 'error'; message: string };

export interface LevelMapHandlers {
  ongrid(grid: LevelGrid, stage: 'coarse' | 'full', ms: number): void;
  onprogress(done: number, total: number): void;
  onerror(message: string): void;
}

let worker: Worker | undefined;
let current = 0;

/** Stops the run in progress, if any. */
export function cancelLevelMap(): void {
  worker?.terminate();
  worker = undefined;
  current++;
}

/** Starts a map; a run already going is stopped first. */
export function startLevelMap(project: Project, request: MapRequest, handlers: LevelMapHandlers): void {
  cancelLevelMap();
  const id = ++current;
  const w = new Worker(new URL('../workers/level-map.worker.ts', import.meta.url), {
    type: 'module',
    name: 'level-map',
  });
  worker = w;
  w.onmessage = (event: MessageEvent<LevelMapReply>) => {
    const reply = event.data;
    if (reply.id !== current) return;
    if (reply.kind === 'grid') {
      handlers.ongrid(reply.grid, reply.stage, reply.ms);
      if (reply.stage === 'full') {
        w.terminate();
        if (worker === w) worker = undefined;
      }
    } else if (reply.kind === 'progress') handlers.onprogress(reply.done, reply.total);
    else handlers.onerror(reply.message);
  };
  w.onerror = (event) => {
    event.preventDefault();
    handlers.onerror(`The map stopped (${event.message || 'the worker failed'}); try again.`);
    cancelLevelMap();
  };
  // The project is plain data ($state.raw in the Workspace): it is cloned into the worker as it is, NaN kept.
  w.postMessage({ id, project, request } satisfies LevelMapMessage);
}
