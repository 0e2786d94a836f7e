/**
 * Mail in tests: a local fake SMTP server (server/mail/fake-smtp.ts) per test file, storing every
 * message it accepts in that file's dev_outbox; a nodemailer mailer pointed at it for createApp;
 * and helpers to wait for the next message to an address and pull the token out of its link.
 */
import { Op } from 'sequelize';
import type { OutboxMessageDto } from '../../shared/api-types';
import { FakeSmtpServer } from '../../server/mail/fake-smtp';
import { createMailer, type Mailer } from '../../server/mail/mailer';
import { OutboxMessage } from '../../server/models';

export interface TestMail {
  smtp: FakeSmtpServer;
  /** smtp://127.0.0.1:<port> */
  url: string;
  mailer: Mailer;
  /** Every message caught so far, oldest first. */
  all(): Promise<OutboxMessageDto[]>;
  /** The next message to `to` not returned before, whose subject matches and whose text contains `text` (waits up to 10 s). */
  next(to: string, opts?: { subject?: RegExp; text?: string | RegExp; timeoutMs?: number }): Promise<OutboxMessageDto>;
  stop(): Promise<void>;
}

export async function startTestMail(from = 'Counterweight <no-reply@example.org>'): Promise<TestMail> {
  const smtp = await new FakeSmtpServer().start();
  const mailer = createMailer({ url: smtp.url, from });
  const seen = new Set<number>();
  return {
    smtp,
    url: smtp.url,
    mailer,
    async all() {
      return (await OutboxMessage.findAll({ order: [['id', 'ASC']] })).map((m) => m.toDto());
    },
    async next(to, { subject, text, timeoutMs = 10_000 } = {}) {
      const hasText = (body: string) => text === undefined || (typeof text === 'string' ? body.includes(text) : text.test(body));
      const deadline = Date.now() + timeoutMs;
      for (;;) {
        const rows = await OutboxMessage.findAll({
          where: { to: { [Op.like]: `%${to}%` }, ...(seen.size ? { id: { [Op.notIn]: [...seen] } } : {}) },
          order: [['id', 'ASC']],
        });
        const hit = rows.find((m) => (!subject || subject.test(m.subject)) && hasText(m.text));
        if (hit) {
          seen.add(hit.id);
          return hit.toDto();
        }
        if (Date.now() > deadline) throw new Error(`no mail to ${to}${subject ? ` with subject ${subject}` : ''}${text !== undefined ? ` containing ${text}` : ''} within ${timeoutMs} ms`);
        await new Promise((r) => setTimeout(r, 50));
      }
    },
    async stop() {
      mailer.close();
      await smtp.stop();
    },
  };
}

/** The token of the link `<origin>/<verify|reset>?token=…` in a message's plain text. */
export function linkToken(message: OutboxMessageDto, kind: 'verify' | 'reset'): string {
  const m = new RegExp(`/${kind}\\?token=([A-Za-z0-9_-]{43})`).exec(message.text);
  if (!m) throw new Error(`no ${kind} link in the message "${message.subject}":\n${message.text}`);
  return m[1];
}
