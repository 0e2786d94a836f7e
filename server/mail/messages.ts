/** The messages we send, in plain text and HTML, in our own words. */
import type { OutgoingMessage } from './mailer';

const escapeHtml = (s: string) =>
  s.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;').replace(/"/g, '&quot;').replace(/'/g, '&#39;');

/** One paragraph per string; the link on a line of its own, as a button-like link in HTML. */
function render(to: string, subject: string, greeting: string, before: string[], link: { href: string; label: string }, after: string[]): OutgoingMessage {
  const text = [greeting, '', ...before.flatMap((p) => [p, '']), link.href, '', ...after.flatMap((p) => [p, '']), '— Counterweight', ''].join('\n');
  const p = (s: string) => `<p style="margin:0 0 16px">${escapeHtml(s)}</p>`;
  const html = `<!doctype html>
<html lang="en"><head><meta charset="utf-8"><title>${escapeHtml(subject)}</title></head>
<body style="margin:0;padding:24px;background:#F7F4EE;color:#1E232B;font-family:Georgia,'Source Serif 4',serif;font-size:16px;line-height:1.5">
<div style="max-width:560px;margin:0 auto">
${p(greeting)}
${before.map(p).join('\n')}
<p style="margin:0 0 16px"><a href="${escapeHtml(link.href)}" style="display:inline-block;padding:10px 16px;background:#1F6F6B;color:#F7F4EE;text-decoration:none;border-radius:4px;font-family:'IBM Plex Sans',Arial,sans-serif">${escapeHtml(link.label)}</a></p>
<p style="margin:0 0 16px;font-size:14px">If the button does not open, copy this address into your browser:<br><span style="font-family:'IBM Plex Mono',monospace;word-break:break-all">${escapeHtml(link.href)}</span></p>
${after.map(p).join('\n')}
<p style="margin:24px 0 0;color:#A8782B">— Counterweight</p>
</div></body></html>`;
  return { to, subject, text, html };
}

export function verificationMessage(to: string, displayName: string, link: string): OutgoingMessage {
  return render(
    to,
    'Confirm your e-mail address for Counterweight',
    `Hello ${displayName},`,
    [
      'An account on Counterweight was opened with this e-mail address. To confirm that the address is yours, open this link within 24 hours:',
    ],
    { href: link, label: 'Confirm my address' },
    [
      'The link works once. Once the address is confirmed you can sign in, submit sightings and corrections, and keep your claim checks.',
      'If you did not open an account, ignore this message: an account cannot be used until its address is confirmed.',
    ],
  );
}

export function resetMessage(to: string, displayName: string, link: string): OutgoingMessage {
  return render(
    to,
    'Choose a new Counterweight password',
    `Hello ${displayName},`,
    ['Someone asked to choose a new password for the Counterweight account with this e-mail address. To choose one, open this link within an hour:'],
    { href: link, label: 'Choose a new password' },
    [
      'The link works once. Choosing a new password signs the account out everywhere.',
      'If you did not ask for this, ignore this message: your password stays as it is.',
    ],
  );
}

/** To the other editors: a draft waits for review. */
export function reviewRequestedMessage(to: string, displayName: string, authorName: string, title: string, link: string): OutgoingMessage {
  return render(
    to,
    `Waiting for review: ${title}`,
    `Hello ${displayName},`,
    [`${authorName} has submitted the draft “${title}” for review. Any editor other than its author may approve it or send it back with a reason.`],
    { href: link, label: 'Open the draft' },
    ['You receive this because you are an editor on Counterweight.'],
  );
}

/** To the author: the draft was approved and is now published as version N. */
export function draftApprovedMessage(to: string, displayName: string, reviewerName: string, title: string, version: number, link: string): OutgoingMessage {
  return render(
    to,
    `Published: ${title}, version ${version}`,
    `Hello ${displayName},`,
    [`${reviewerName} has approved your draft “${title}”. It is now published as version ${version}, and this address will show that version for good:`],
    { href: link, label: `Read version ${version}` },
    ['Readers see this version until a newer one is approved.'],
  );
}

/** To the author: the draft was sent back with a reason. */
export function draftSentBackMessage(to: string, displayName: string, reviewerName: string, title: string, reason: string, link: string): OutgoingMessage {
  return render(
    to,
    `Sent back for changes: ${title}`,
    `Hello ${displayName},`,
    [`${reviewerName} has sent your draft “${title}” back for changes, with this reason:`, reason, 'The draft is editable again; submit it once more when it is ready.'],
    { href: link, label: 'Open the draft' },
    [],
  );
}

// ---------------------------------------------------------------------------------------------
// Submissions (issue 7)

const kindWord = (kind: 'sighting' | 'correction') => (kind === 'sighting' ? 'sighting' : 'correction');

/** To the submitter: a moderator decided their submission. */
export function submissionDecidedMessage(
  to: string,
  displayName: string,
  s: { kind: 'sighting' | 'correction'; title: string },
  decision: 'accept' | 'draft' | 'ask' | 'reject',
  note: string | null,
  entries: string[],
  link: string,
): OutgoingMessage {
  const what = kindWord(s.kind);
  const said: Record<typeof decision, { subject: string; lines: string[] }> = {
    accept: {
      subject: `Accepted: your ${what} “${s.title}”`,
      lines:
        s.kind === 'sighting'
          ? [`Your ${what} “${s.title}” was accepted. It now shows as seen in the wild on: ${entries.join('; ')}.`]
          : [`Your ${what} “${s.title}” was accepted and passed to the editors of the entry, who will revise it.`],
    },
    draft: {
      subject: `A new entry will be written from your ${what} “${s.title}”`,
      lines: [`Your ${what} “${s.title}” describes a device the library does not cover yet. It was turned into a draft entry for an editor to write; the sighting is attached to it.`],
    },
    ask: {
      subject: `A question about your ${what} “${s.title}”`,
      lines: [`A moderator needs more before deciding your ${what} “${s.title}”:`, note ?? '', 'Answer on the page of your submission; it goes back to the queue when you do.'],
    },
    reject: {
      subject: `Not accepted: your ${what} “${s.title}”`,
      lines: [`Your ${what} “${s.title}” was not accepted. The moderator's reason:`, note ?? ''],
    },
  };
  const m = said[decision];
  return render(to, m.subject, `Hello ${displayName},`, m.lines, { href: link, label: 'Open your submission' }, [
    'You receive this because you sent this submission to Counterweight.',
  ]);
}

/** To each moderator: new submissions arrived (one message for all that arrived since the last). */
export function queueDigestMessage(to: string, displayName: string, items: { kind: 'sighting' | 'correction'; title: string }[], link: string): OutgoingMessage {
  const n = items.length;
  const shown = items.slice(0, 20).map((i) => `• ${i.kind === 'sighting' ? 'Sighting' : 'Correction'}: ${i.title}`);
  if (n > shown.length) shown.push(`… and ${n - shown.length} more.`);
  return render(
    to,
    n === 1 ? `New in the queue: ${items[0].title}` : `${n} new submissions in the queue`,
    `Hello ${displayName},`,
    [n === 1 ? 'A new submission waits for a moderator to pick it up:' : `${n} new submissions wait for a moderator to pick them up:`, ...shown],
    { href: link, label: 'Open the queue' },
    ['You receive this because you are a moderator on Counterweight. New items are gathered into one message at a time.'],
  );
}

/** To an editor of the entry: a reader reported an error in it and a moderator passed it on. */
export function correctionForwardedMessage(to: string, displayName: string, entryTitle: string, version: number, section: string, link: string): OutgoingMessage {
  return render(
    to,
    `A correction to “${entryTitle}”`,
    `Hello ${displayName},`,
    [`A reader reported an error in version ${version} of “${entryTitle}” (section: ${section}), and a moderator has passed it to the entry's editors.`],
    { href: link, label: 'Read the correction' },
    ['You receive this because you wrote or reviewed a version of this entry. It is listed on your Desk too.'],
  );
}
