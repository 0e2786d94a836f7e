/**
 * How `npm test` splits jest into runs (tests/support/phases.ts): the projects without a browser on two
 * workers, then the browser tests on one; a caller's own worker count or choice of projects is kept.
 */
import { testPhases } from '../support/phases';

const none = {} as NodeJS.ProcessEnv;

describe('npm test runs jest in phases', () => {
  it('runs shared, server and app on two workers, then the browser tests on one', () => {
    expect(testPhases([], 2, none)).toEqual([
      { name: 'shared+server+app', workers: 2, args: ['--selectProjects', 'shared', 'server', 'app', '-w', '2', '--passWithNoTests'] },
      { name: 'browser', workers: 1, args: ['--selectProjects', 'browser', '-w', '1', '--passWithNoTests'] },
    ]);
  });

  it('passes a file pattern to both phases, and one core gets one worker', () => {
    const [a, b] = testPhases(['shared/claims'], 1, none);
    expect(a.args).toEqual(['shared/claims', '--selectProjects', 'shared', 'server', 'app', '-w', '1', '--passWithNoTests']);
    expect(b.args).toEqual(['shared/claims', '--selectProjects', 'browser', '-w', '1', '--passWithNoTests']);
  });

  it('keeps a run of chosen projects as one run: two workers without a browser, one with', () => {
    expect(testPhases(['--selectProjects', 'shared', '-t', 'sprint'], 2, none)).toEqual([{ name: 'shared', workers: 2, args: ['-t', 'sprint', '--selectProjects', 'shared', '-w', '2'] }]);
    expect(testPhases(['--selectProjects', 'browser'], 2, none)).toEqual([{ name: 'browser', workers: 1, args: ['--selectProjects', 'browser', '-w', '1'] }]);
    // (A choice of both kinds is still split.)
    expect(testPhases(['--selectProjects', 'server', 'browser'], 2, none).map((p) => p.name)).toEqual(['server', 'browser']);
  });

  it("keeps the caller's worker count, in one run", () => {
    expect(testPhases(['-w', '3'], 2, none)).toEqual([{ name: 'shared+server+app+browser', workers: 0, args: ['-w', '3', '--selectProjects', 'shared', 'server', 'app', 'browser'] }]);
    expect(testPhases(['--runInBand'], 2, none)[0].workers).toBe(0);
    expect(testPhases([], 2, { CW_TEST_WORKERS: '4' } as unknown as NodeJS.ProcessEnv)).toHaveLength(1);
  });
});
