/**
 * An optimiser run that streams: the fleets are shown (and kept in the project) as soon as they are known,
 * each frontier point is added as it arrives, the end says the curve is complete with its count, and a stop
 * while tracing keeps the fleets and the points found so far. The optimiser here is a stand-in that sends
 * the invented result of ./results/fixtures.ts piece by piece, as the worker does.
 */
import { describe, expect, it } from 'vitest';
import { OptimiserRun, type Optimiser } from '../../../src/app/state/optimiser-run.svelte.ts';
import { Workspace } from '../../../src/app/state/workspace.svelte.ts';
import type { OptimisePart } from '../../../src/app/services/optimise-client.ts';
import type { OptimiseResult } from '../../../src/ledger/model/results.ts';
import { optimiseResult, smallProject } from '../results/fixtures.ts';
import { demoProject } from '../../../src/ledger/model/demo.ts';

/** A stand-in optimiser the test drives: `send` delivers a part, `finish` resolves, an abort rejects. */
function streamingOptimiser() {
  let sendPart: ((part: OptimisePart) => void) | undefined;
  let finish: ((result: OptimiseResult) => void) | undefined;
  const optimise: Optimiser = (_project, _options, signal, _onProgress, onPart) =>
    new Promise((resolve, reject) => {
      sendPart = onPart;
      finish = resolve;
      signal?.addEventListener('abort', () => reject(new Error('The optimiser run was cancelled.')));
    });
  return {
    optimise,
    send: (part: OptimisePart) => sendPart?.(part),
    finish: (result: OptimiseResult) => finish?.(result),
  };
}

const full = optimiseResult();
const head: OptimiseResult = { ...full, tradeOff: [] };
const tick = () => new Promise((r) => setTimeout(r, 0));

describe('OptimiserRun, streaming the frontier', () => {
  it('shows the fleets at once, adds each point as it comes, and ends complete with the count', async () => {
    const stand = streamingOptimiser();
    const run = new OptimiserRun(stand.optimise);
    const found: OptimiseResult[] = [];
    const done = run.run(smallProject(), {}, (r) => found.push(r));
    await tick();
    expect(run.result).toBeUndefined();
    stand.send({ kind: 'fleet', result: head });
    expect(run.result?.best.cost).toBe(10500);
    expect(run.frontier).toEqual({ state: 'tracing', count: 0 });
    expect(found).toHaveLength(1);
    stand.send({ kind: 'point', point: full.tradeOff[0]!, index: 0 });
    stand.send({ kind: 'point', point: full.tradeOff[1]!, index: 1 });
    expect(run.result?.tradeOff.map((p) => p.cost)).toEqual([9000, 10500]);
    expect(run.frontier).toEqual({ state: 'tracing', count: 2 });
    expect(run.running).toBe(true);
    stand.finish({ ...full, frontier: { complete: true } });
    await done;
    expect(run.running).toBe(false);
    expect(run.frontier).toEqual({ state: 'complete', count: 4 });
    expect(run.result?.tradeOff).toHaveLength(4);
    expect(found).toHaveLength(1);
    expect(run.error).toBeUndefined();
  });

  it('a stop while tracing keeps the fleets and the points found so far, and says it stopped', async () => {
    const stand = streamingOptimiser();
    const run = new OptimiserRun(stand.optimise);
    const done = run.run(smallProject(), {});
    await tick();
    stand.send({ kind: 'fleet', result: head });
    stand.send({ kind: 'point', point: full.tradeOff[0]!, index: 0 });
    run.cancel();
    await done;
    expect(run.running).toBe(false);
    expect(run.error).toBeUndefined();
    expect(run.result?.best.cost).toBe(10500);
    expect(run.result?.tradeOff.map((p) => p.cost)).toEqual([9000]);
    expect(run.result?.frontier).toEqual({ complete: false });
    expect(run.frontier).toEqual({ state: 'stopped', count: 1 });
  });

  it('a cancel before the fleets are known keeps the earlier result and says it was cancelled', async () => {
    const stand = streamingOptimiser();
    const run = new OptimiserRun(stand.optimise);
    const first = run.run(smallProject(), {});
    await tick();
    stand.send({ kind: 'fleet', result: head });
    stand.finish({ ...full, frontier: { complete: true } });
    await first;
    const second = run.run(smallProject(), {});
    await tick();
    run.cancel();
    await second;
    expect(run.error).toBe('The optimiser run was cancelled.');
    expect(run.result?.tradeOff).toHaveLength(4);
    expect(run.frontier).toEqual({ state: 'complete', count: 4 });
  });

  it('the Workspace keeps the fleet in the project as soon as it is known, while the curve is still traced', async () => {
    const project = demoProject();
    const choice = Object.fromEntries(project.duties.map((d) => [d.id, d.baselineCandidateId]));
    const stand = streamingOptimiser();
    const ws = new Workspace(project, { optimise: stand.optimise });
    const done = ws.runOptimiser();
    await tick();
    stand.send({ kind: 'fleet', result: { ...head, best: { ...head.best, fleet: choice } } });
    expect(ws.optimiserFleet?.choice).toEqual(choice);
    expect(ws.optimiserFrontier).toEqual({ state: 'tracing', count: 0 });
    ws.cancelOptimiser();
    await done;
    expect(ws.optimiserFleet?.choice).toEqual(choice);
    expect(ws.optimiserFrontier).toEqual({ state: 'stopped', count: 0 });
  });
});
