/** Who is looking at the app, as far as the client needs to know: which sections to offer. */
export type Role = 'reader' | 'contributor' | 'editor' | 'moderator' | 'admin';

export interface Viewer {
  role: Role;
}

/**
 * Accounts do not exist yet, so everyone is a reader. A session hook replaces this; the server
 * checks rights on every route regardless of what the client shows.
 */
export function useViewer(): Viewer {
  return { role: 'reader' };
}
