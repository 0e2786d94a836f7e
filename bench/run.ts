/**
 * `npm run bench`: speed figures for the computing core, printed (never asserted in tests).
 * Each figure is printed beside the same work done naively in the same run, as a ratio.
 */
import os from 'node:os';
import { runBorisBench } from './boris';
import { benchComputePool } from './compute-pool';
import { benchFirstLoad } from './first-load';
import { runSearchBench } from './search';
import { benchWorksheets } from './worksheets';

async function main() {
  console.log(`Counterweight benchmarks — node ${process.version}, ${os.cpus()[0]?.model ?? 'unknown CPU'}, one core used\n`);
  await benchWorksheets();
  console.log('');
  await runBorisBench();
  console.log('');
  // Health and search while the compute pool is saturated (its own throwaway MariaDB and app process).
  await benchComputePool();
  console.log('');
  // A reader's first visit in Chromium: bytes of JavaScript, first paint, first section (its own throwaway MariaDB and app).
  await benchFirstLoad();
  console.log('');
  // Search at 10,000 entries beside MariaDB FULLTEXT, the index build, /api/search against
  // /api/health, and claim-check latency (also alone: `npm run bench:search`).
  await runSearchBench();
}

main().catch((e) => {
  console.error(e);
  process.exitCode = 1;
});
