/**
 * How `npm test` splits jest into runs (tests/support/run-all.ts): the projects without a browser on two
 * workers, then the browser tests on one.
 *
 * Measured on 2 cores: the shared, server and app projects took about 750 s on one worker and 400 s on
 * two (they wait on MariaDB and on sockets as much as on a core); the browser tests were no faster on
 * two (Chromium keeps both cores busy) and timed out more often.
 */
import os from 'node:os';

export const BROWSER = 'browser';
export const ALL_PROJECTS = ['shared', 'server', 'app', BROWSER] as const;

export interface TestPhase {
  name: string;
  /** Workers asked of jest; 0 leaves it to the caller's own option or CW_TEST_WORKERS (jest.config.js). */
  workers: number;
  args: string[];
}

/** The projects named after --selectProjects, or null when none are. */
export function selectedProjects(args: readonly string[]): string[] | null {
  const i = args.indexOf('--selectProjects');
  if (i < 0) return null;
  const names: string[] = [];
  for (const a of args.slice(i + 1)) {
    if (a.startsWith('-')) break;
    names.push(a);
  }
  return names;
}

/** Our arguments without --selectProjects and its names. */
function withoutProjects(args: readonly string[]): string[] {
  const i = args.indexOf('--selectProjects');
  if (i < 0) return [...args];
  let j = i + 1;
  while (j < args.length && !args[j].startsWith('-')) j++;
  return [...args.slice(0, i), ...args.slice(j)];
}

/**
 * The jest runs for our arguments. A worker count the caller gives (-w, --maxWorkers, --runInBand,
 * CW_TEST_WORKERS) is kept, in one run of everything asked for; so is a run of one kind of project.
 * Each of two phases passes with no tests, as a file pattern may match files of one phase only (the
 * caller counts the files run in all).
 */
export function testPhases(args: readonly string[], cores = os.cpus().length, env: NodeJS.ProcessEnv = process.env): TestPhase[] {
  const chosen = selectedProjects(args) ?? [...ALL_PROJECTS];
  const rest = withoutProjects(args);
  const own = Number(env.CW_TEST_WORKERS) > 0 || rest.some((a) => /^(?:-w|--maxWorkers|--runInBand|-i)(?:=|$)/.test(a));
  const headless = chosen.filter((p) => p !== BROWSER);
  const withBrowser = chosen.includes(BROWSER);
  const two = Math.max(1, Math.min(2, cores));
  if (own || headless.length === 0 || !withBrowser) {
    const workers = own ? 0 : withBrowser ? 1 : two;
    return [{ name: chosen.join('+'), workers, args: [...rest, '--selectProjects', ...chosen, ...(workers ? ['-w', String(workers)] : [])] }];
  }
  return [
    { name: headless.join('+'), workers: two, args: [...rest, '--selectProjects', ...headless, '-w', String(two), '--passWithNoTests'] },
    { name: BROWSER, workers: 1, args: [...rest, '--selectProjects', BROWSER, '-w', '1', '--passWithNoTests'] },
  ];
}
