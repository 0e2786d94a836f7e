/**
 * can(): the shared policy table read the same way by the server's guard, its services and the
 * app. The expectations are written out by hand from the roles in DESIGN.md §2 (who may do what),
 * not derived from the table, so that a change to the table shows here.
 */
import { allActions, can, policies, rolesOf } from './policies';

describe('can()', () => {
  it('lets anyone do a public action, signed in or not', () => {
    expect(can(null, 'entries.read')).toBe(true);
    expect(can(undefined, 'search.query')).toBe(true);
    expect(can('reader', 'claimChecks.run')).toBe(true);
  });

  it('asks for an account where one is needed, whatever the role', () => {
    expect(can('reader', 'submissions.sighting')).toBe(false);
    expect(can(null, 'account.updateProfile')).toBe(false);
    for (const role of ['contributor', 'editor', 'moderator', 'admin'] as const) expect(can(role, 'submissions.sighting')).toBe(true);
  });

  it('keeps role actions to their roles (admins may do what editors and moderators do)', () => {
    expect(can('contributor', 'drafts.approve')).toBe(false);
    expect(can('moderator', 'drafts.approve')).toBe(false);
    expect(can('editor', 'drafts.approve')).toBe(true);
    expect(can({ role: 'admin' }, 'drafts.approve')).toBe(true);
    expect(can('editor', 'queue.decide')).toBe(false);
    expect(can('moderator', 'queue.decide')).toBe(true);
    expect(can('moderator', 'users.setRole')).toBe(false);
    expect(can('admin', 'users.setRole')).toBe(true);
  });

  it('lets the owner of a record in for an owner rule, and nobody else by that path', () => {
    // queue.releaseHeld: the moderator holding the submission, or an admin.
    expect(can('moderator', 'queue.releaseHeld', { userId: 7, ownerId: 7 })).toBe(true);
    expect(can('moderator', 'queue.releaseHeld', { userId: 7, ownerId: 8 })).toBe(false);
    expect(can('moderator', 'queue.releaseHeld', { userId: 7, ownerId: null })).toBe(false);
    expect(can('moderator', 'queue.releaseHeld')).toBe(false);
    expect(can('admin', 'queue.releaseHeld', { userId: 1, ownerId: 8 })).toBe(true);
    // submissions.see: the submitter, or moderators and admins.
    expect(can('contributor', 'submissions.see', { userId: 3, ownerId: 3 })).toBe(true);
    expect(can('contributor', 'submissions.see', { userId: 3, ownerId: 4 })).toBe(false);
    expect(can('reader', 'submissions.see', { userId: null, ownerId: null })).toBe(false);
  });

  it('names the roles of a rule and lists every route action', () => {
    expect([...rolesOf('drafts.own')].sort()).toEqual(['admin', 'editor']);
    expect(rolesOf('entries.read')).toEqual([]);
    const count = Object.values(policies).reduce((n, verbs) => n + Object.keys(verbs).length, 0);
    expect(allActions()).toHaveLength(count);
    expect(allActions()).toContain('queue.release');
    expect(allActions()).not.toContain('queue.releaseHeld');
  });

  it('refuses an action the table does not have', () => {
    expect(() => can('admin', 'entries.nothing' as 'entries.read')).toThrow(/no policy/);
  });
});
