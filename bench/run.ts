/**
 * `npm run bench`: speed figures for the computing core, printed (never asserted in tests).
 * Each figure is printed beside the same work done naively in the same run, as a ratio.
 */
import os from 'node:os';
import { runBorisBench } from './boris';
import { benchWorksheets } from './worksheets';

async function main() {
  console.log(`Counterweight benchmarks — node ${process.version}, ${os.cpus()[0]?.model ?? 'unknown CPU'}, one core used\n`);
  await benchWorksheets();
  console.log('');
  await runBorisBench();
}

main().catch((e) => {
  console.error(e);
  process.exitCode = 1;
});
