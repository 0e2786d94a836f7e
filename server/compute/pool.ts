/**
 * The compute pool (issue 13, item 1): every job a reader's input can make slow (tasks.ts) runs in
 * a worker thread, so that the event loop stays free for health checks, reads and searches.
 *
 * Why piscina: it is the well-known pool for Node's worker_threads (MIT, engines node >= 20, no
 * dependencies and no install script; its one optional package, @napi-rs/nice, ships prebuilt
 * binaries and serves `niceIncrement`). It queues, restarts ended threads, and ends the thread that
 * runs a job when the job's AbortSignal fires, which is how a job that runs too long is stopped: a
 * worksheet can legally take many seconds inside one mathjs call, where no cooperative deadline is
 * checked. Node's own Worker would need all of that written here.
 *
 * The workers run at a lower CPU priority (nice +10, Linux threads have their own): on a small
 * machine the main thread, which answers health checks and reads, goes first.
 *
 * - A hard wall-clock limit per job (`timeoutMs`), counted from the moment a worker begins the job
 *   (the worker says so on a MessagePort), not from when it was queued: the thread is ended and the
 *   reader gets 422 `computation_too_long`.
 * - A bounded queue (`queueMax` jobs waiting): when full, 503 `compute_busy` with Retry-After.
 * - A worker whose heap exceeds `memoryMb` is ended too (422 `computation_too_large`).
 * - If the workers cannot start, the pool says so loudly (a fatal log line at start, 503
 *   `compute_unavailable` for each job); it never falls back to computing on the main thread.
 *   COMPUTE_INLINE=1 runs the jobs on the main thread on purpose, for debugging only.
 */
import path from 'node:path';
import { MessageChannel } from 'node:worker_threads';
import type { Response } from 'express';
import { Piscina } from 'piscina';
import type { Logger } from 'pino';
import { HttpError } from '../http/errors';
import { runJob, type ComputeJob, type ComputeResults, type JobAnswer } from './tasks';

export interface ComputeOptions {
  /** Worker threads. */
  threads: number;
  /** Hard wall-clock limit of one job, from its start in a worker (ms). */
  timeoutMs: number;
  /** Jobs that may wait for a free worker; one more is answered 503. */
  queueMax: number;
  /** Old-generation heap of each worker (MB); a job that needs more ends its worker. */
  memoryMb: number;
  /** Run jobs on the main thread (debugging only: no limit, no isolation). */
  inline: boolean;
  /** The worker entry; tests point it elsewhere to see a pool that cannot start. */
  filename?: string;
}

const WORKER = path.join(__dirname, 'worker.mjs');

const seconds = (ms: number) => `${+(ms / 1000).toFixed(1)} s`;

/** What the reader can do when a job of this kind runs too long. */
const simplerAdvice: Record<ComputeJob['kind'], string> = {
  ping: '',
  warm: '',
  worksheet: 'Use fewer steps or plot points, or expressions whose units stay small (a chain of steps that each multiply the one before by itself makes the units grow very fast), and try again.',
  check: 'Use fewer steps or particles, and try again.',
  claimRead: 'Paste only the part of the text that states the claim and its figures, and try again.',
  claimPlan: 'Give fewer figures, or narrower ranges, and try again.',
};

/** 503 `compute_busy`: the queue is full; `retryAfter` (seconds) goes into the Retry-After header. */
export class ComputeBusyError extends HttpError {
  constructor(
    readonly retryAfter: number,
    message: string,
  ) {
    super(503, 'compute_busy', message);
  }
}

export class ComputePool {
  private pool: Piscina | null = null;
  private failure: Error | null = null;
  private readyPromise: Promise<void> | null = null;
  /** Jobs accepted and not yet begun by a worker. */
  private waiting = 0;
  private closed = false;

  constructor(
    readonly opts: ComputeOptions,
    private readonly logger: Logger,
  ) {}

  /** Starts the worker threads and checks that one answers; a failure is logged as fatal. */
  start(): Promise<void> {
    if (this.readyPromise) return this.readyPromise;
    if (this.opts.inline) {
      this.logger.warn('COMPUTE_INLINE=1: computations run on the main thread, without a time limit (debugging only)');
      this.readyPromise = Promise.resolve();
      return this.readyPromise;
    }
    this.pool = new Piscina({
      filename: this.opts.filename ?? WORKER,
      minThreads: this.opts.threads,
      maxThreads: this.opts.threads,
      // Our own count bounds the queue (jobs not yet begun); piscina's must not refuse first.
      maxQueue: this.opts.queueMax + this.opts.threads + 1,
      // The same in every host process (tsx under npm start, jest): the worker entry loads tsx itself.
      execArgv: [],
      resourceLimits: { maxOldGenerationSizeMb: this.opts.memoryMb },
      niceIncrement: 10,
    });
    const pool = this.pool;
    let started = false;
    const fail = (err: Error) => {
      if (this.failure) return;
      this.failure = err;
      this.logger.fatal({ err }, 'the compute pool could not start: worksheets, checks and claim checks will answer 503 until the server is restarted');
      // Its workers fail while loading: piscina starts no more of them; end the pool.
      if (this.pool === pool) this.pool = null;
      void pool.destroy().catch(() => {});
    };
    // A worker that fails with no job of ours (while loading, or between jobs) is reported here.
    const failedStart = new Promise<void>((resolve) => {
      pool.on('error', (err: Error) => {
        if (!started) {
          fail(err);
          resolve();
        } else this.logger.error({ err }, 'a compute worker failed outside a job; the pool replaces it');
      });
    });
    const ping = pool.run({ job: { kind: 'ping' } satisfies ComputeJob }).then(
      () => {
        started = true;
      },
      (err: Error) => fail(err),
    );
    this.readyPromise = Promise.race([ping, failedStart]);
    return this.readyPromise;
  }

  /** Resolves when the workers have answered once (or failed to start; see `failure`). */
  ready(): Promise<void> {
    return this.start();
  }

  /** Why the pool could not start, if it could not. */
  get startError(): Error | null {
    return this.failure;
  }

  /** A rough wait before trying again when the queue is full (whole seconds, at least 1). */
  retryAfterSeconds(): number {
    return Math.max(1, Math.ceil(((this.waiting / Math.max(1, this.opts.threads) + 1) * this.opts.timeoutMs) / 1000));
  }

  /** Runs one job; its input errors are thrown as HttpError (4xx), as are a timeout and a full queue. */
  async run<K extends ComputeJob['kind']>(job: Extract<ComputeJob, { kind: K }>): Promise<ComputeResults[K]> {
    const answer = (await this.answer(job)) as JobAnswer<K>;
    if (answer.ok) return answer.value;
    const { status, code, message, fields } = answer.error;
    throw new HttpError(status, code, message, fields);
  }

  private async answer(job: ComputeJob): Promise<JobAnswer> {
    if (this.opts.inline) return runJob(job);
    if (this.closed) throw new HttpError(503, 'compute_unavailable', 'The server is shutting down; try again in a moment.');
    if (!this.pool) this.start();
    if (this.failure) throw this.unavailable();
    if (this.waiting >= this.opts.queueMax) {
      const wait = this.retryAfterSeconds();
      throw new ComputeBusyError(wait, `The server is busy with other computations (${this.waiting} waiting). Try again in ${wait} second${wait === 1 ? '' : 's'}.`);
    }
    const abort = new AbortController();
    const { port1, port2 } = new MessageChannel();
    let timer: NodeJS.Timeout | null = null;
    let begun = false;
    this.waiting++;
    const begin = () => {
      if (begun) return;
      begun = true;
      this.waiting--;
      timer = setTimeout(() => abort.abort(new Error('time limit')), this.opts.timeoutMs) as unknown as NodeJS.Timeout;
    };
    port1.once('message', begin);
    try {
      return (await this.pool!.run({ job, started: port2 }, { transferList: [port2], signal: abort.signal })) as JobAnswer;
    } catch (err) {
      const e = err as Error & { code?: string };
      if (e.name === 'AbortError') {
        throw new HttpError(422, 'computation_too_long', `The computation took longer than ${seconds(this.opts.timeoutMs)} and was stopped. ${simplerAdvice[job.kind]}`);
      }
      if (e.code === 'ERR_WORKER_OUT_OF_MEMORY') {
        throw new HttpError(422, 'computation_too_large', `The computation needed more than ${this.opts.memoryMb} MB of memory and was stopped. ${simplerAdvice[job.kind]}`);
      }
      if (this.closed || /Terminating worker thread|queue is being terminated/.test(e.message ?? '')) {
        throw new HttpError(503, 'compute_unavailable', 'The server is shutting down; try again in a moment.');
      }
      if (this.failure) throw this.unavailable();
      throw err;
    } finally {
      if (!begun) this.waiting--;
      begun = true;
      if (timer) clearTimeout(timer);
      port1.close();
    }
  }

  private unavailable(): HttpError {
    return new HttpError(503, 'compute_unavailable', 'Computations are not available on this server right now: its worker threads could not start. The operators have been told; try again later.');
  }

  /** Ends the worker threads; jobs still running or waiting are answered 503. */
  async close(): Promise<void> {
    this.closed = true;
    const pool = this.pool;
    this.pool = null;
    if (pool) await pool.destroy();
  }
}

/**
 * Runs a job for a route: as `pool.run`, and a full queue also sets Retry-After on the answer
 * (the error handler then sends the 503 in our error shape).
 */
export async function computeFor<K extends ComputeJob['kind']>(res: Response, pool: ComputePool, job: Extract<ComputeJob, { kind: K }>): Promise<ComputeResults[K]> {
  try {
    return await pool.run<K>(job);
  } catch (err) {
    if (err instanceof ComputeBusyError) res.set('Retry-After', String(err.retryAfter));
    throw err;
  }
}
