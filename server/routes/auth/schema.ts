/**
 * Requests of /api/auth: the forms' schemas are shared with the app (shared/schemas/auth.ts), so
 * that a field error shows beside the same field on both sides:
 *  - signUpSchema: `email`, `displayName`, `password` (POST /api/auth/sign-up);
 *  - verifySchema: `token` from the e-mailed link (POST /api/auth/verify);
 *  - emailOnlySchema: `email` (POST /api/auth/resend-verification, POST /api/auth/forgot);
 *  - signInSchema: `email`, `password` (POST /api/auth/sign-in);
 *  - resetSchema: `token`, the new `password` (POST /api/auth/reset).
 */
export { emailOnlySchema, resetSchema, signInSchema, signUpSchema, verifySchema } from '../../../shared/schemas/auth';
