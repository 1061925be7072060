/**
 * Worker calls with progress and cancel, against a stand-in worker that answers when told:
 * progress messages reach the call's callback and do not end it; a cancel stops the worker
 * and fails the call with its message; a call cancelled before it is sent never starts one.
 */
import { describe, expect, it } from 'vitest';
import { WorkerCalls, type WorkerReply } from '../../../src/app/services/worker-calls.ts';

class StandInWorker {
  onmessage: ((event: MessageEvent) => void) | null = null;
  onerror: ((event: ErrorEvent) => void) | null = null;
  sent: { id: number }[] = [];
  terminated = false;
  postMessage(message: { id: number }) {
    this.sent.push(message);
  }
  terminate() {
    this.terminated = true;
  }
  reply(data: unknown) {
    this.onmessage?.({ data } as MessageEvent);
  }
}

function calls() {
  const started: StandInWorker[] = [];
  const c = new WorkerCalls<{ ask: string }, WorkerReply & { answer?: string }>({
    start: () => {
      const w = new StandInWorker();
      started.push(w);
      return w as unknown as Worker;
    },
    timeLimitMs: 60_000,
    timeLimitMessage: 'too long',
    failedMessage: (d) => `failed ${d}`,
  });
  return { c, started };
}

describe('worker calls', () => {
  it('hands progress to the callback and resolves with the reply', async () => {
    const { c, started } = calls();
    const heard: number[] = [];
    const answer = c.call({ ask: 'a' }, undefined, (p) => heard.push(p.fraction));
    const w = started[0]!;
    const id = w.sent[0]!.id;
    w.reply({ id, progress: { step: 'half', fraction: 0.5 } });
    w.reply({ id, ok: true, answer: 'done' });
    expect((await answer).answer).toBe('done');
    expect(heard).toEqual([0.5]);
  });

  it('a cancel stops the worker and fails the call with the cancel message', async () => {
    const { c, started } = calls();
    const abort = new AbortController();
    const answer = c.call({ ask: 'a' }, { signal: abort.signal, message: 'cancelled' });
    abort.abort();
    await expect(answer).rejects.toThrow('cancelled');
    expect(started[0]!.terminated).toBe(true);
  });

  it('a call cancelled before it is sent starts no worker', async () => {
    const { c, started } = calls();
    const abort = new AbortController();
    abort.abort();
    await expect(c.call({ ask: 'a' }, { signal: abort.signal, message: 'cancelled early' })).rejects.toThrow(
      'cancelled early',
    );
    expect(started).toHaveLength(0);
  });
});
