/**
 * The audit log as sentences: each event names the one who acted, what they did and the record by
 * its title ("Dmitri Havel accepted the sighting “…” onto *Resonant cavity thrusters*."), never a
 * dotted code or a row id. The names are joined here in a few queries per page; SENTENCES has one
 * sentence per action the services write (tests/server/audit-sentences.test.ts reads the services
 * and fails on an action without one).
 */
import { Op } from 'sequelize';
import type { AuditEventDto, AuditSentencePart } from '../../shared/api-types';
import { CORRECTION_SECTION_WORDS } from '../../shared/api/constants';
import { Entry, Submission, User, type AuditEvent } from '../models';

/** The names an event's sentence may need, joined from the database. */
interface Names {
  actor: string | null;
  /** Users by id (the subject of a user event, the editor of a drafted sighting). */
  users: Map<number, string>;
  /** Entries by id and by slug. */
  entriesById: Map<number, string>;
  entriesBySlug: Map<string, string>;
  /** Submissions by id: kind, title, the entry a correction is about. */
  submissions: Map<number, { kind: string; title: string; entryId: number | null }>;
}

type Rec = Record<string, unknown>;
const rec = (v: unknown): Rec => (typeof v === 'object' && v !== null && !Array.isArray(v) ? (v as Rec) : {});
const str = (v: unknown): string | null => (typeof v === 'string' && v !== '' ? v : null);
const num = (v: unknown): number | null => (typeof v === 'number' && Number.isFinite(v) ? v : typeof v === 'string' && /^\d+$/.test(v) ? Number(v) : null);

/** One event with what the sentence reads. */
interface Ev {
  subjectId: string;
  before: Rec;
  after: Rec;
  names: Names;
}

type Part = AuditSentencePart;
const title = (text: string): Part => ({ text, title: true });
const quoted = (text: string): Part => ({ text: `“${text}”` });

const ROLE_WORDS: Record<string, string> = {
  contributor: 'a contributor',
  moderator: 'a moderator',
  editor: 'an editor',
  admin: 'an administrator',
};
const role = (v: unknown) => ROLE_WORDS[String(v)] ?? 'a reader';

const termsText = (v: unknown) => (Array.isArray(v) ? v.map(String).join(', ') : '');

function userName(e: Ev): string {
  return e.names.users.get(Number(e.subjectId)) ?? 'a removed account';
}

function entryTitle(e: Ev): Part {
  const name = e.names.entriesById.get(Number(e.subjectId)) ?? str(e.after.slug) ?? str(e.before.slug);
  return name ? title(name) : { text: 'an entry no longer on file' };
}

/** "the sighting “…”" or "the correction to *Entry*". */
function submissionName(e: Ev): Part[] {
  const s = e.names.submissions.get(Number(e.subjectId));
  if (!s) return [{ text: 'a submission' }];
  if (s.kind === 'correction') {
    const entry = s.entryId !== null ? e.names.entriesById.get(s.entryId) : undefined;
    return entry ? [{ text: 'the correction to ' }, title(entry)] : [{ text: 'a correction' }];
  }
  return [{ text: 'the sighting ' }, quoted(s.title)];
}

const version = (v: unknown) => (num(v) !== null ? `version ${num(v)} of ` : '');

/** Titles of linked entries, joined as a list ("*A*, *B* and *C*"). */
function entryList(slugs: unknown, names: Names): Part[] {
  const list = Array.isArray(slugs) ? slugs.map(String) : [];
  const parts: Part[] = [];
  list.forEach((slug, i) => {
    if (i > 0) parts.push({ text: i === list.length - 1 ? ' and ' : ', ' });
    parts.push(title(names.entriesBySlug.get(slug) ?? slug));
  });
  return parts;
}

/** What follows the actor's name, one per action the services write. */
export const SENTENCES: Record<string, (e: Ev) => Part[]> = {
  'user.signed_up': () => [{ text: 'created an account' }],
  'user.email_verified': () => [{ text: 'confirmed their e-mail address' }],
  'user.password_reset': () => [{ text: 'set a new password from a reset link' }],
  'user.password_changed': (e) => {
    const ended = num(e.after.otherSessionsEnded) ?? 0;
    return [{ text: `changed their password${ended > 0 ? `, signing out ${ended === 1 ? 'one other session' : `${ended} other sessions`}` : ''}` }];
  },
  'user.display_name_changed': (e) => [{ text: 'changed their display name from ' }, quoted(str(e.before.displayName) ?? ''), { text: ' to ' }, quoted(str(e.after.displayName) ?? '')],
  'user.role_changed': (e) => [{ text: `made ${userName(e)} ${role(e.after.role)} (before: ${role(e.before.role)})` }],
  'synonyms.created': (e) => [{ text: 'added the search synonyms ' }, quoted(termsText(e.after.terms))],
  'synonyms.updated': (e) => [{ text: 'changed the search synonyms ' }, quoted(termsText(e.before.terms)), { text: ' to ' }, quoted(termsText(e.after.terms))],
  'synonyms.deleted': (e) => [{ text: 'removed the search synonyms ' }, quoted(termsText(e.before.terms))],
  'submission.created': (e) => {
    if (e.after.kind === 'correction') {
      const section = CORRECTION_SECTION_WORDS[String(e.after.section) as keyof typeof CORRECTION_SECTION_WORDS];
      return [{ text: 'sent in ' }, ...submissionName(e), { text: section ? ` (${section})` : '' }];
    }
    const files = num(e.after.attachments) ?? 0;
    return [{ text: 'reported ' }, ...submissionName(e), { text: files ? ` with ${files === 1 ? 'one file' : `${files} files`}` : '' }];
  },
  'submission.claimed': (e) => [{ text: 'picked up ' }, ...submissionName(e), { text: ' to decide it' }],
  'submission.released': (e) => [{ text: 'handed back ' }, ...submissionName(e), { text: ' for another moderator' }],
  'submission.answered': (e) => [{ text: 'answered the moderator’s question on ' }, ...submissionName(e)],
  'submission.accepted': (e) => {
    const linked = entryList(e.after.entries, e.names);
    if (linked.length) return [{ text: 'accepted ' }, ...submissionName(e), { text: ' onto ' }, ...linked];
    const forwarded = num(e.after.forwardedTo);
    return [{ text: 'accepted ' }, ...submissionName(e), { text: forwarded !== null ? ` and passed it on to ${forwarded === 1 ? 'one editor' : `${forwarded} editors`}` : '' }];
  },
  'submission.drafted': (e) => {
    const editor = num(e.after.editorId);
    const name = editor !== null ? e.names.users.get(editor) : undefined;
    return [{ text: 'turned ' }, ...submissionName(e), { text: ` into a draft entry${name ? ` for ${name}` : ''}` }];
  },
  'submission.asked': (e) => [{ text: 'asked the sender of ' }, ...submissionName(e), { text: ' a question' }],
  'submission.rejected': (e) => [{ text: 'turned down ' }, ...submissionName(e)],
  'entry.draft_created': (e) => [{ text: 'began a new entry, ' }, entryTitle(e)],
  'entry.draft_started': (e) => [{ text: `began a revision of ${num(e.before.version) !== null ? `version ${num(e.before.version)} of ` : ''}` }, entryTitle(e)],
  'entry.draft_submitted': (e) => [{ text: 'sent the draft of ' }, entryTitle(e), { text: ' for review' }],
  'entry.published': (e) => [{ text: `approved and published ${version(e.after.version)}` }, entryTitle(e)],
  'entry.sent_back': (e) => {
    const reason = str(e.after.reason);
    return [{ text: 'sent the draft of ' }, entryTitle(e), { text: ' back to its editor' }, ...(reason ? [{ text: ': ' }, quoted(reason)] : [])];
  },
  'entry.retired': (e) => {
    const successor = str(e.after.successor);
    return [
      { text: 'retired ' },
      entryTitle(e),
      ...(successor ? [{ text: ', pointing readers to ' }, title(e.names.entriesBySlug.get(successor) ?? successor)] : []),
    ];
  },
  'entry.imported': (e) => [{ text: `added ${version(e.after.version)}` }, entryTitle(e), { text: ' from the starter library' }],
};

/** The sentence of one event: the actor, then what they did; a plain fallback for an action without a sentence. */
export function auditSentence(action: string, subjectId: string, before: unknown, after: unknown, names: Names): Part[] {
  const e: Ev = { subjectId, before: rec(before), after: rec(after), names };
  // A reset link is used signed out: the account's owner acted.
  const who: Part = { text: names.actor ?? (action === 'user.password_reset' ? userName(e) : 'The system') };
  const make = SENTENCES[action];
  const rest: Part[] = make ? make(e) : [{ text: 'made a change that has no description yet' }];
  return [who, { text: ' ' }, ...rest.filter((p) => p.text !== ''), { text: '.' }];
}

const ids = (list: (number | null)[]) => [...new Set(list.filter((n): n is number => n !== null))];

/** A page of audit events with their sentences: the names they need are loaded in one query per table. */
export async function auditEvents(rows: AuditEvent[]): Promise<AuditEventDto[]> {
  const userIds: (number | null)[] = [];
  const entryIds: (number | null)[] = [];
  const entrySlugs: string[] = [];
  const submissionIds: (number | null)[] = [];
  for (const r of rows) {
    const after = rec(r.after);
    if (r.subjectType === 'user') userIds.push(num(r.subjectId));
    if (r.subjectType === 'entry') entryIds.push(num(r.subjectId));
    if (r.subjectType === 'submission') submissionIds.push(num(r.subjectId));
    userIds.push(num(after.editorId));
    if (Array.isArray(after.entries)) entrySlugs.push(...after.entries.map(String));
    if (str(after.successor)) entrySlugs.push(String(after.successor));
  }
  const submissions = await Submission.findAll({ where: { id: ids(submissionIds) }, attributes: ['id', 'kind', 'title', 'entryId'] });
  entryIds.push(...submissions.map((s) => s.entryId));
  const [users, entries] = await Promise.all([
    User.findAll({ where: { id: ids(userIds) }, attributes: ['id', 'displayName'] }),
    Entry.findAll({ where: { [Op.or]: [{ id: ids(entryIds) }, { slug: [...new Set(entrySlugs)] }] }, attributes: ['id', 'slug', 'title'] }),
  ]);
  const names: Omit<Names, 'actor'> = {
    users: new Map(users.map((u) => [u.id, u.displayName])),
    entriesById: new Map(entries.map((x) => [x.id, x.title])),
    entriesBySlug: new Map(entries.map((x) => [x.slug, x.title])),
    submissions: new Map(submissions.map((s) => [s.id, { kind: s.kind, title: s.title, entryId: s.entryId }])),
  };
  return rows.map((r) => {
    const dto = r.toDto();
    return { ...dto, sentence: auditSentence(r.action, r.subjectId, r.before, r.after, { ...names, actor: dto.actor?.displayName ?? null }) };
  });
}
