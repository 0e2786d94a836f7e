/**
 * Screen tests wait for what a screen shows with findBy… and waitFor. Testing Library's default of one
 * second is a bound on hanging, not a speed check, and a loaded 2-core machine (the browser tests'
 * Chromium beside jest) can pass it while a screen renders on a cold transform cache: ten seconds here,
 * as the top-level testTimeout is raised for the same reason.
 */
import { configure } from '@testing-library/react';

configure({ asyncUtilTimeout: 10_000 });
