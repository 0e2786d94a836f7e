/**
 * Three jest projects, all run by `npm test` (through tests/run.mjs, which first starts a
 * throwaway MariaDB and builds the web app):
 *  - shared:  the computing core (worksheets, check kit) against outside references
 *  - server:  supertest against the real Express app and a real MariaDB
 *  - app:     component tests of the Expo app on the web target (jest-expo/web)
 *  - browser: the built web app served by the real server, driven in Debian's Chromium
 */
// ESM-only packages that jest must transform (unified/remark/rehype and friends join this list).
const esmOnly = [
  '((jest-)?react-native(-[a-z-]+)?|@react-native(-community)?)',
  'expo(nent)?',
  '@expo(nent)?/.*',
  '@expo-google-fonts/.*',
  'expo-router',
  'expo-modules-core',
  'react-navigation',
  '@react-navigation/.*',
  'react-native-svg',
  '@tanstack/.*',
  'd3-.*',
  'internmap',
  // The Markdown pipeline (shared/markdown.ts) and its dependencies, ESM only.
  'unified', 'bail', 'is-plain-obj', 'trough', 'vfile(-[a-z-]+)?', 'unist-util-[a-z-]+', 'mdast-util-[a-z-]+',
  'micromark(-[a-z-]+)?', 'decode-named-character-reference', 'character-entities(-[a-z0-9-]+)?',
  'remark-[a-z-]+', 'rehype-[a-z-]+', 'hast-util-[a-z0-9-]+', 'hastscript', 'property-information',
  'space-separated-tokens', 'comma-separated-tokens', 'zwitch', 'html-void-elements', 'ccount', 'markdown-table',
  'longest-streak', 'devlop', 'trim-lines', 'web-namespaces', 'stringify-entities', 'parse5', 'entities',
  '@ungap/structured-clone', 'escape-string-regexp',
  // file-type (server/uploads/attachments.ts) and its dependencies, ESM only.
  'file-type', 'strtok3', 'token-types', 'uint8array-extras', '@tokenizer/.*', '@borewit/.*',
];

const nodeProject = (name, testMatch, extra = {}) => ({
  displayName: name,
  testEnvironment: 'node',
  testMatch,
  transform: { '^.+\\.[cm]?[jt]sx?$': 'babel-jest' },
  transformIgnorePatterns: ['/node_modules/(?!(' + esmOnly.join('|') + ')/)'],
  moduleNameMapper: { '^@/(.*)$': '<rootDir>/$1' },
  ...extra,
});

module.exports = {
  // `npm test` asks for two workers for the projects without a browser and one for the browser tests
  // (tests/support/phases.ts). CW_TEST_WORKERS sets one number for everything, on a larger machine.
  ...(Number(process.env.CW_TEST_WORKERS) > 0 ? { maxWorkers: Number(process.env.CW_TEST_WORKERS) } : {}),
  // For every project (jest reads it from the top level only): a bound on hanging, not a speed check.
  // Creating and migrating a test database, or rendering a whole screen on a cold transform cache, can
  // pass jest's default of 5 s on a loaded 2-core machine. Files that set their own keep theirs.
  testTimeout: 30_000,
  projects: [
    nodeProject('shared', ['<rootDir>/shared/**/*.test.ts']),
    nodeProject('server', ['<rootDir>/tests/server/**/*.test.ts', '<rootDir>/server/**/*.test.ts']),
    {
      displayName: 'app',
      preset: 'jest-expo/web',
      // d3-scale and d3-shape ship ES modules as .mjs, which the preset does not transform.
      transform: { '\\.mjs$': ['babel-jest', { caller: { name: 'metro', bundler: 'metro', platform: 'web' } }] },
      testMatch: ['<rootDir>/components/**/*.test.tsx', '<rootDir>/tests/app/**/*.test.tsx'],
      setupFilesAfterEnv: ['<rootDir>/tests/support/app-timeouts.ts'],
      transformIgnorePatterns: ['/node_modules/(?!(' + esmOnly.join('|') + ')/)'],
      moduleNameMapper: { '^@/(.*)$': '<rootDir>/$1' },
    },
    nodeProject('browser', ['<rootDir>/tests/browser/**/*.test.ts']),
  ],
};
