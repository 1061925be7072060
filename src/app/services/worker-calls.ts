/**
 * Calls to one long-lived module worker, each answered by its id. The worker is started on
 * first use and kept (so a library loaded in it is loaded once); a call that takes longer
 * than the time limit, a worker that fails, or an aborted call stops the worker and fails
 * every call still waiting on it with a message in words (the next call starts a fresh one).
 * A worker may send `{ id, progress }` messages before its reply; they go to the call's
 * progress callback. It may also send `{ id, part }` messages (a piece of the answer known early,
 * e.g. each point of a curve as it is found); they go to the call's part callback, in order.
 */

/** A reply carries the id of its request; `ok: false` carries the reason in words. */
export type WorkerReply = { id: number; ok: true } | { id: number; ok: false; message: string };

/** How far a call has gone, sent by the worker before its reply (any number of times). */
export interface WorkerProgress {
  id: number;
  progress: Progress;
}

/** What the worker is doing now, in words, and the share of the whole job done (0 to 1). */
export interface Progress {
  step: string;
  fraction: number;
}

/** A piece of a call's answer sent before its reply. */
export interface WorkerPart<P> {
  id: number;
  part: P;
}

interface Waiting<R, P> {
  resolve(reply: R): void;
  reject(error: Error): void;
  onProgress: ((progress: Progress) => void) | undefined;
  onPart: ((part: P) => void) | undefined;
  timer: ReturnType<typeof setTimeout>;
}

export interface WorkerCallsOptions {
  /** Starts the worker (a `new Worker(new URL(…), { type: 'module' })` the bundler can see). */
  start(): Worker;
  /** Longest a call may take, ms. */
  timeLimitMs: number;
  /** The message when the time limit stops a call. */
  timeLimitMessage: string;
  /** The message when the worker fails, given the browser's own words (may be empty). */
  failedMessage(detail: string): string;
}

export class WorkerCalls<Request extends object, Reply extends WorkerReply, Part = never> {
  private worker: Worker | undefined;
  private nextId = 1;
  private readonly waiting = new Map<number, Waiting<Reply & { ok: true }, Part>>();

  constructor(private readonly options: WorkerCallsOptions) {}

  /** Stops the worker and fails every call still waiting on it. */
  stop(message: string): void {
    this.worker?.terminate();
    this.worker = undefined;
    for (const [id, w] of this.waiting) {
      clearTimeout(w.timer);
      this.waiting.delete(id);
      w.reject(new Error(message));
    }
  }

  /** Sends one request; resolves with the worker's successful reply, rejects with its reason. */
  call(
    request: Request,
    abort?: { signal: AbortSignal; message: string },
    onProgress?: (progress: Progress) => void,
    onPart?: (part: Part) => void,
  ): Promise<Reply & { ok: true }> {
    // A call cancelled before it was sent (e.g. while its client module loaded) never starts.
    if (abort?.signal.aborted) return Promise.reject(new Error(abort.message));
    const w = (this.worker ??= this.begin());
    const id = this.nextId++;
    return new Promise((resolve, reject) => {
      const timer = setTimeout(() => this.stop(this.options.timeLimitMessage), this.options.timeLimitMs);
      this.waiting.set(id, { resolve, reject, onProgress, onPart, timer });
      abort?.signal.addEventListener('abort', () => this.waiting.has(id) && this.stop(abort.message), { once: true });
      w.postMessage({ ...request, id });
    });
  }

  private begin(): Worker {
    const w = this.options.start();
    w.onmessage = (event: MessageEvent<Reply | WorkerProgress | WorkerPart<Part>>) => {
      const reply = event.data;
      const waiting = this.waiting.get(reply.id);
      if (!waiting) return;
      if ('progress' in reply) {
        waiting.onProgress?.(reply.progress);
        return;
      }
      if ('part' in reply) {
        waiting.onPart?.(reply.part);
        return;
      }
      this.waiting.delete(reply.id);
      clearTimeout(waiting.timer);
      if (reply.ok) waiting.resolve(reply as Reply & { ok: true });
      else waiting.reject(new Error(reply.message));
    };
    w.onerror = (event) => {
      event.preventDefault();
      this.stop(this.options.failedMessage(event.message));
    };
    return w;
  }
}
