/**
 * The API contract, one file per resource under shared/api/ (requests, answers and the shared
 * constants); this index re-exports them all, so that `import type { … } from 'shared/api-types'`
 * keeps working on both sides. Free of runtime dependencies: imported by the server and the app.
 */
export * from './api/errors';
export * from './api/health';
export * from './api/taxonomy';
export * from './api/accounts';
export * from './api/entries';
export * from './api/drafts';
export * from './api/search';
export * from './api/worksheets';
export * from './api/checks';
export * from './api/claim-checks';
export * from './api/submissions';
export * from './api/synonyms';
export * from './api/constants';
