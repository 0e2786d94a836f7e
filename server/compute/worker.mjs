// The entry of each compute worker thread (server/compute/pool.ts): plain JavaScript, so that Node
// loads it as it is under `npm start` (tsx) and under jest alike (jest's babel transform does not
// reach worker threads). It registers tsx's CommonJS hook, then loads the TypeScript jobs.
import { createRequire } from 'node:module';
import { parentPort, threadId } from 'node:worker_threads';
import { register } from 'tsx/cjs/api';

register();
const require = createRequire(import.meta.url);
const { runJob } = require('./tasks.ts');
// Before the pool hands this worker a job: first-use set-up (compromise's lexicon, mathjs's typed
// functions) would otherwise count against the first job's time limit.
runJob({ kind: 'warm' });
// The pool hands jobs to warmed threads first (its spare among them); piscina alone cannot tell: it
// counts the first threads ready before they have loaded.
parentPort?.postMessage({ computeWarm: threadId });

/**
 * One job. `started` (a MessagePort) is told the moment the job begins, and by which thread, so that
 * the pool's wall-clock limit counts the computation and not the time spent waiting in the queue.
 */
export default function run({ job, started }) {
  if (started) {
    started.postMessage(threadId);
    started.close();
  }
  return runJob(job);
}
