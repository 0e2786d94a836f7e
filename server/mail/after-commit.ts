/**
 * Mail that follows a committed change: the messages are built inside the transaction (so that
 * they say what was committed) and sent after it, as work that runs after the answer has gone
 * (app.ts `later`): a mail failure is logged and never undoes the change.
 */
import type { Mailer, OutgoingMessage } from './mailer';

export interface MailAfterCommitDeps {
  mailer: Mailer;
  /** Runs work after the answer has gone, logging a failure under `what` (app.ts). */
  later: (what: string, job: () => Promise<void>) => void;
}

/** A function that sends `messages` (in order) once the answer has gone; nothing when there are none. */
export type SendAfterCommit = (what: string, messages: OutgoingMessage[]) => void;

export function mailAfterCommit({ mailer, later }: MailAfterCommitDeps): SendAfterCommit {
  return (what, messages) => {
    if (!messages.length) return;
    later(what, async () => {
      for (const m of messages) await mailer.send(m);
    });
  };
}
