/**
 * Steps of the editors' and moderators' workflows through the API, for tests that need an entry,
 * a draft or a submission in a given state: each test makes its own, so that it passes run alone
 * (`npx jest <file> -t '<name>'`) as well as with the rest of its file. Every step checks the status
 * it expects and throws naming the step otherwise.
 */
import { Client } from './app';

/** Throws naming `what` unless the answer has the expected status. */
export function expectStatus<T extends { status: number; body: unknown }>(what: string, res: T, status: number): T {
  if (res.status !== status) throw new Error(`${what} answered ${res.status} (expected ${status}): ${JSON.stringify(res.body)}`);
  return res;
}

export interface DraftRef {
  id: number;
  lockVersion: number;
}

/** A new draft by `author` (201). */
export async function createDraft(author: Client, slug: string, content: object): Promise<DraftRef> {
  const res = expectStatus(`a new draft "${slug}"`, await author.post('/api/drafts', { slug, content }), 201);
  return { id: res.body.draft.id, lockVersion: res.body.draft.lockVersion };
}

/** Submits a draft for review (200); returns its new lock version. */
export async function submitDraft(author: Client, draft: DraftRef): Promise<DraftRef> {
  const res = expectStatus(`submitting draft ${draft.id}`, await author.post(`/api/drafts/${draft.id}/submit`, { lockVersion: draft.lockVersion }), 200);
  return { id: draft.id, lockVersion: res.body.draft.lockVersion };
}

/** Approves a draft in review (200); returns the published version's number. */
export async function approveDraft(reviewer: Client, draft: DraftRef, changeNote = 'First published version.'): Promise<number> {
  const res = expectStatus(`approving draft ${draft.id}`, await reviewer.post(`/api/drafts/${draft.id}/approve`, { changeNote }), 200);
  return res.body.version.number;
}

/** A new entry published as version 1: written and submitted by `author`, approved by `reviewer`. */
export async function publishNewEntry(author: Client, reviewer: Client, slug: string, content: object, changeNote = 'First published version.'): Promise<void> {
  const draft = await submitDraft(author, await createDraft(author, slug, content));
  await approveDraft(reviewer, draft, changeNote);
}

/** A new draft of a published entry, started by `author` (201). */
export async function startRevision(author: Client, slug: string): Promise<DraftRef> {
  const res = expectStatus(`a new draft of "${slug}"`, await author.post(`/api/entries/${slug}/drafts`), 201);
  return { id: res.body.draft.id, lockVersion: res.body.draft.lockVersion };
}

/** A sighting as multipart fields (201 expected); returns its id. */
export async function submitSighting(submitter: Client, fields: Record<string, string | undefined>): Promise<number> {
  let req = submitter.agent.post('/api/sightings').set('X-CSRF-Token', submitter.csrf);
  for (const [k, v] of Object.entries(fields)) if (v !== undefined) req = req.field(k, v);
  const res = expectStatus(`a sighting "${fields.title}"`, await req, 201);
  return res.body.submission.id;
}

/** Claims a submission for `moderator` (200). */
export async function claimSubmission(moderator: Client, id: number): Promise<void> {
  expectStatus(`claiming submission ${id}`, await moderator.post(`/api/submissions/${id}/claim`), 200);
}

/** Gives the account with this e-mail address the editor role, as `admin` (200): for tests that need a third editor. */
export async function makeEditor(admin: Client, email: string): Promise<void> {
  const list = expectStatus(`finding the account ${email}`, await admin.get(`/api/admin/users?q=${encodeURIComponent(email)}`), 200);
  const user = (list.body.users as { id: number; email: string }[]).find((u) => u.email === email);
  if (!user) throw new Error(`no account ${email}`);
  expectStatus(`making ${email} an editor`, await admin.patch(`/api/admin/users/${user.id}/role`, { role: 'editor' }), 200);
}

/**
 * An entry with two published versions by two authors: `first` writes version 1, `second` writes
 * version 2 (a revision of it, with `revised` merged into its content), `reviewer` approves both.
 */
export async function publishTwoAuthorEntry(first: Client, second: Client, reviewer: Client, slug: string, content: object, revised: object = {}): Promise<void> {
  await publishNewEntry(first, reviewer, slug, content);
  const draft = await startRevision(second, slug);
  const current = expectStatus(`reading draft ${draft.id}`, await second.get(`/api/drafts/${draft.id}`), 200);
  const saved = expectStatus(
    `revising draft ${draft.id}`,
    await second.put(`/api/drafts/${draft.id}`, { content: { ...current.body.draft.content, ...revised }, lockVersion: draft.lockVersion }),
    200,
  );
  await approveDraft(reviewer, await submitDraft(second, { id: draft.id, lockVersion: saved.body.draft.lockVersion }), 'Second version.');
}

/** A client signed in as `email` on a running server (a browser test's harness at `base`), for steps through the API. */
export async function signedInAt(base: string, email: string, password: string): Promise<Client> {
  const client = await Client.start(base);
  expectStatus(`signing in as ${email}`, await client.post('/api/auth/sign-in', { email, password }), 200);
  await client.session();
  return client;
}

/** Saves a draft's content (200); returns its new lock version. */
export async function saveDraft(author: Client, draft: DraftRef, content: object): Promise<DraftRef> {
  const res = expectStatus(`saving draft ${draft.id}`, await author.put(`/api/drafts/${draft.id}`, { content, lockVersion: draft.lockVersion }), 200);
  return { id: draft.id, lockVersion: res.body.draft.lockVersion };
}
