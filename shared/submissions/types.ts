/** The submissions' part of the API contract now lives in shared/api/submissions.ts; this name stays for existing imports. */
export * from '../api/submissions';
