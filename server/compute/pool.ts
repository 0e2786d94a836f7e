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
 * A warm spare: the pool keeps `threads` + 1 worker threads but hands piscina at most `threads` jobs
 * at a time (the rest wait here, in order), so one thread is always free. A worker takes seconds to
 * load (mathjs, compromise, citation-js, then a warm-up), and a thread ended at its time limit or by
 * a crash used to leave the next job waiting for its replacement to load; now the free thread, loaded
 * long before, takes that job at once while the replacement loads beside it. The spare is counted in
 * the pool (never more than `threads` + 1 threads; an ended thread is stopped as its replacement
 * starts), runs at the same priority and memory limit, and is ended with the others at `close`. Each
 * worker says when it has warmed up (worker.mjs), and a job goes to a warmed thread before one still
 * loading: piscina counts the first threads ready before they have loaded anything. Test apps go
 * without the spare unless they ask (`spare`, server/app.ts): on two cores, loading it added more than
 * half a second to each test file that computes, and only a test that ends threads gains from it.
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
import { EventEmitter, once } from 'node:events';
import path from 'node:path';
import { MessageChannel, receiveMessageOnPort, type Worker } from 'node:worker_threads';
import type { Response } from 'express';
import { Piscina } from 'piscina';
import type { Logger } from 'pino';
import { HttpError } from '../http/errors';
import type * as Tasks from './tasks';
import type { ComputeJob, ComputeResults, JobAnswer } from './tasks';

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
  /** Keep one thread more than `threads`, loaded and free, to take over from an ended one (default true). */
  spare?: boolean;
}

const WORKER = path.join(__dirname, 'worker.mjs');

type Balancer = NonNullable<NonNullable<ConstructorParameters<typeof Piscina>[0]>['loadBalancer']>;

/**
 * Picks a free thread for a job, a warmed one first. Piscina's own choice takes the first free thread
 * in its list, and threads still loading come first there: a job would wait seconds inside a loading
 * replacement while the warm spare stood idle.
 */
const warmFirst =
  (warm: ReadonlySet<number>): Balancer =>
  (_task, workers) => {
    let free: (typeof workers)[number] | null = null;
    for (const w of workers) {
      if (w.currentUsage !== 0) continue;
      if (warm.has(w.id)) return w;
      free ??= w;
    }
    return free;
  };

/** What the pool holds now: its threads by id, those loaded and warmed, those running a job, and jobs not yet begun. */
export interface ComputePoolState {
  /** The live worker threads: `threads` once started, + 1 with the spare; none once closed. */
  threads: number[];
  /** Threads that have loaded and warmed up, ready to begin a job at once. */
  warm: number[];
  /** Threads running a job. */
  busy: number[];
  /** Jobs accepted and not yet begun by a worker. */
  waiting: number;
}

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
  /** Jobs handed to piscina and not yet settled: at most `threads`, so that one thread stays free. */
  private running = 0;
  /** Jobs waiting for one of those `threads` places, first come first served. */
  private queue: { go: () => void; stop: (err: Error) => void }[] = [];
  /** Threads that said they have warmed up (ids of ended threads are never reused). */
  private readonly warm = new Set<number>();
  /** Threads running one of our jobs. */
  private readonly busy = new Set<number>();
  /** Exits of threads ended for their job: piscina forgets the threads at once, `close` waits for them. */
  private readonly exiting = new Set<Promise<unknown>>();
  /** The end of a pool that could not start, for `close` to wait on. */
  private failedEnd: Promise<void> | null = null;
  /**
   * What happens to the threads, for tests and diagnosis: 'warm' (threadId) when a thread has loaded
   * and warmed up, 'begin' (threadId) when a thread begins a job, 'ended' (threadId, 'time' |
   * 'memory') just after a thread was ended for its job (its replacement is already counted).
   */
  readonly events = new EventEmitter();

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
    // One more than may compute at once: the warm spare (see the top of this file, and `place`).
    const size = this.opts.threads + (this.opts.spare === false ? 0 : 1);
    this.pool = new Piscina({
      filename: this.opts.filename ?? WORKER,
      minThreads: size,
      maxThreads: size,
      loadBalancer: warmFirst(this.warm),
      // Our own count bounds the queue (jobs not yet begun); piscina's must not refuse first.
      maxQueue: this.opts.queueMax + this.opts.threads + 1,
      // The same in every host process (tsx under npm start, jest): the worker entry loads tsx itself.
      execArgv: [],
      resourceLimits: { maxOldGenerationSizeMb: this.opts.memoryMb },
      niceIncrement: 10,
    });
    const pool = this.pool;
    // worker.mjs posts { computeWarm: threadId } once it has loaded and warmed up.
    pool.on('message', (message: unknown) => {
      const id = (message as { computeWarm?: unknown } | null)?.computeWarm;
      if (typeof id !== 'number') return;
      const live = new Set(pool.threads.map((w) => w.threadId));
      for (const old of this.warm) if (!live.has(old)) this.warm.delete(old);
      this.warm.add(id);
      this.events.emit('warm', id);
    });
    let started = false;
    const fail = (err: Error) => {
      if (this.failure) return;
      this.failure = err;
      // A pool closed while its threads were still loading (a Ctrl-C soon after the start) did not fail.
      if (!this.closed) this.logger.fatal({ err }, 'the compute pool could not start: worksheets, checks and claim checks will answer 503 until the server is restarted');
      this.stopWaiting(this.unavailable());
      // Its workers fail while loading: piscina starts no more of them; end the pool.
      if (this.pool === pool) this.pool = null;
      this.failedEnd = pool.destroy().catch(() => {});
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

  /** The pool's threads and jobs now (see ComputePoolState). */
  state(): ComputePoolState {
    const threads = (this.pool?.threads ?? []).map((w) => w.threadId).filter((id) => id >= 0);
    return {
      threads,
      warm: threads.filter((id) => this.warm.has(id)),
      busy: threads.filter((id) => this.busy.has(id)),
      waiting: this.waiting,
    };
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
    if (this.opts.inline) {
      // Loaded here, not at the top: tasks.ts brings mathjs and the claim reader, which the main thread
      // needs only with COMPUTE_INLINE=1 (every test file that starts an app imports this module).
      // eslint-disable-next-line @typescript-eslint/no-require-imports
      const { runJob } = require('./tasks') as typeof Tasks;
      return runJob(job);
    }
    if (this.closed) throw this.shuttingDown();
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
    let placed = false;
    let thread = -1;
    let worker: Worker | undefined;
    this.waiting++;
    // The worker posts its threadId on the port as it begins the job.
    const begin = (id: number, settled = false) => {
      if (begun) return;
      begun = true;
      this.waiting--;
      thread = id;
      this.busy.add(id);
      this.events.emit('begin', id);
      if (settled) return;
      worker = this.pool?.threads.find((w) => w.threadId === id);
      timer = setTimeout(() => {
        this.awaitExit(worker);
        // Piscina ends the thread and starts its replacement before abort() returns.
        abort.abort(new Error('time limit'));
        this.events.emit('ended', id, 'time');
      }, this.opts.timeoutMs) as unknown as NodeJS.Timeout;
    };
    port1.once('message', begin);
    try {
      await this.place();
      placed = true;
      // Closed or failed while this job waited for its place: a destroyed piscina would start new threads.
      if (this.closed) throw this.shuttingDown();
      if (this.failure || !this.pool) throw this.unavailable();
      return (await this.pool.run({ job, started: port2 }, { transferList: [port2], signal: abort.signal })) as JobAnswer;
    } catch (err) {
      if (err instanceof HttpError) throw err;
      const e = err as Error & { code?: string };
      if (e.name === 'AbortError') {
        throw new HttpError(422, 'computation_too_long', `The computation took longer than ${seconds(this.opts.timeoutMs)} and was stopped. ${simplerAdvice[job.kind]}`);
      }
      if (e.code === 'ERR_WORKER_OUT_OF_MEMORY') {
        this.awaitExit(worker);
        if (thread >= 0) this.events.emit('ended', thread, 'memory');
        throw new HttpError(422, 'computation_too_large', `The computation needed more than ${this.opts.memoryMb} MB of memory and was stopped. ${simplerAdvice[job.kind]}`);
      }
      if (this.closed || /Terminating worker thread|queue is being terminated/.test(e.message ?? '')) throw this.shuttingDown();
      if (this.failure) throw this.unavailable();
      throw err;
    } finally {
      // Piscina reads answers synchronously, so a quick job can settle before the port's 'message'
      // event: its start is then already queued on the port.
      if (!begun) {
        const started = receiveMessageOnPort(port1);
        if (started) begin(started.message as number, true);
      }
      if (!begun) this.waiting--;
      begun = true;
      if (timer) clearTimeout(timer);
      this.busy.delete(thread);
      port1.close();
      if (placed) this.release();
    }
  }

  /**
   * Waits for one of the `threads` places. Piscina is handed no more jobs than that, so with the spare
   * one of its `threads` + 1 threads is always free: when a job's thread is ended, the next job goes
   * to that free (warm) thread at once instead of waiting in piscina for the replacement to load.
   */
  private place(): Promise<void> {
    if (this.running < this.opts.threads) {
      this.running++;
      return Promise.resolve();
    }
    return new Promise((go, stop) => this.queue.push({ go, stop }));
  }

  /** A job has settled: its place passes to the first job waiting, if any. */
  private release(): void {
    const next = this.queue.shift();
    if (next) next.go();
    else this.running--;
  }

  /** Keeps the exit of a thread ended for its job (if it has not exited yet) for `close` to wait on. */
  private awaitExit(worker: Worker | undefined): void {
    // Node sets threadId to -1 as the thread exits, before its 'exit' event.
    if (!worker || worker.threadId < 0) return;
    const exit = once(worker, 'exit').catch(() => {});
    this.exiting.add(exit);
    void exit.finally(() => this.exiting.delete(exit));
  }

  /** Answers every job still waiting for a place with `err`. */
  private stopWaiting(err: Error): void {
    for (const w of this.queue.splice(0)) w.stop(err);
  }

  private shuttingDown(): HttpError {
    return new HttpError(503, 'compute_unavailable', 'The server is shutting down; try again in a moment.');
  }

  private unavailable(): HttpError {
    return new HttpError(503, 'compute_unavailable', 'Computations are not available on this server right now: its worker threads could not start. The operators have been told; try again later.');
  }

  /** Ends the worker threads, the spare too; jobs still running or waiting are answered 503. */
  async close(): Promise<void> {
    this.closed = true;
    this.stopWaiting(this.shuttingDown());
    // Threads ended for their job first: piscina answers a thread's exit by starting threads up to
    // its minimum, and after `destroy` that would start a new pool that nothing ends.
    while (this.exiting.size) await Promise.all(this.exiting);
    // Kept, not cleared, so that `state()` shows the threads gone; no job reaches it once closed.
    if (this.pool) await this.pool.destroy();
    await this.failedEnd;
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
