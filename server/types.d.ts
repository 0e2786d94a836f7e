/** Type augmentations: the signed-in user on `req.user` and what our sessions hold. */
import type { User as UserModel } from './models/accounts';

declare global {
  namespace Express {
    // passport puts the deserialized user here: our User model instance.
    // eslint-disable-next-line @typescript-eslint/no-empty-object-type
    interface User extends UserModel {}
  }
}

declare module 'express-session' {
  interface SessionData {
    /** The synchronizer token that state-changing requests must send back in X-CSRF-Token. */
    csrfToken: string;
    passport: { user?: number };
  }
}

export {};
