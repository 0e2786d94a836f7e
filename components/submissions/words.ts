/**
 * The words the submission screens use for states, sections, kinds and events, and the age of an
 * item, in one place so the submitter's view, the account, the Desk and the queue say the same.
 */
import { CORRECTION_SECTION_LABEL } from '@/shared/api/constants';
import type { SubmissionKind, SubmissionStatus } from '@/shared/submissions/types';
import { ApiError, ApiUnreachableError } from '../http/client';
import { fieldWords, messageWords } from '../http/fieldErrors';

const capital = (s: string) => s.charAt(0).toUpperCase() + s.slice(1);

export const STATUS_WORDS: Record<SubmissionStatus, string> = {
  open: 'Waiting for a moderator',
  claimed: 'A moderator is deciding it',
  waiting: 'Waiting for your answer',
  accepted: 'Accepted',
  drafted: 'Turned into a draft entry',
  rejected: 'Not taken',
};

/**
 * The same states as a moderator reads them (the submitter is "them", not "you"), in plain words of
 * our own rather than a ticket system's: an item nobody has picked up yet, one in a moderator's hands.
 */
export const QUEUE_STATUS_WORDS: Record<SubmissionStatus, string> = {
  ...STATUS_WORDS,
  open: 'Not picked up yet',
  claimed: 'In hand',
  waiting: 'Waiting for the submitter',
};

/** What a moderator does with an item before deciding it, and after: the buttons, the history, the filters. */
export const HANDLING_WORDS = {
  pickUp: 'Pick it up',
  pickingUp: 'Picking it up…',
  handBack: 'Hand it back',
  handingBack: 'Handing it back…',
  handBackFor: (name: string) => `Hand it back from ${name}`,
  mine: 'In my hands',
  heldByMe: 'In your hands',
  heldBy: (name: string) => `In ${name}’s hands`,
  undecided: 'Everything undecided',
} as const;

export const KIND_WORDS: Record<SubmissionKind, string> = { sighting: 'Sighting', correction: 'Correction' };

/** A correction's section as a label (declared once in the API contract). */
export const SECTION_LABEL = CORRECTION_SECTION_LABEL;

const EVENT_WORDS: Record<string, string> = {
  submitted: 'Sent in',
  claimed: 'Picked up by a moderator',
  released: 'Handed back to the queue',
  asked: 'A question for the submitter',
  answered: 'The submitter answered',
  accepted: 'Accepted',
  drafted: 'Turned into a draft entry',
  rejected: 'Not taken',
};

export function eventWords(what: string): string {
  return EVENT_WORDS[what] ?? what;
}

/** How long ago: "under an hour", "5 hours", "1 day", "12 days". */
export function ageWords(iso: string, now: number = Date.now()): string {
  const ms = now - new Date(iso).getTime();
  if (!Number.isFinite(ms)) return '';
  const hours = Math.floor(ms / 3_600_000);
  if (hours < 1) return 'under an hour';
  if (hours < 24) return hours === 1 ? '1 hour' : `${hours} hours`;
  const days = Math.floor(hours / 24);
  return days === 1 ? '1 day' : `${days} days`;
}

export function bytesWords(bytes: number): string {
  if (bytes < 1024) return `${bytes} bytes`;
  if (bytes < 1024 * 1024) return `${(bytes / 1024).toFixed(bytes < 10 * 1024 ? 1 : 0)} KB`;
  return `${(bytes / (1024 * 1024)).toFixed(1)} MB`;
}

/** Our words for the errors a submission's actions can meet; the server's message otherwise. */
const CODE_WORDS: Record<string, string> = {
  claimed_by_other: 'Another moderator has picked this item up in the meantime. It is theirs to decide, unless they hand it back.',
  own_submission: 'You sent this item in yourself, so another moderator decides it.',
  already_decided: 'This item has been decided already; nothing more can be done with it here.',
  not_claimed: 'This item is no longer in your hands (it was handed back, or someone else picked it up). Pick it up again to decide it.',
  email_unverified: 'Your e-mail address is not confirmed yet. Confirm it with the link we sent, then send this again.',
  rate_limited: 'Too many submissions in a short time. Wait a little, then send it again.',
  file_too_large: 'A file is larger than 10 MB. Remove it or send a smaller copy.',
  too_many_files: 'At most 5 files go with one sighting. Remove the extra ones.',
};

export function problemWords(error: Error): string {
  if (error instanceof ApiUnreachableError) return "Counterweight's server could not be reached. Check the connection, then try again.";
  if (error instanceof ApiError) {
    const ours = CODE_WORDS[error.code];
    if (ours) return ours;
    if (error.code === 'validation_failed' && error.fields) {
      return Object.entries(error.fields)
        .map(([field, message]) => `${capital(fieldWords(field))}: ${messageWords(message)}.`.replace(/\.\.$/, '.'))
        .join(' ');
    }
    return messageWords(error.message);
  }
  return error.message;
}
