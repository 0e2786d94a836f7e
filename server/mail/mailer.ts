/**
 * Outgoing e-mail through nodemailer over SMTP: SMTP_URL in production, the local fake SMTP server
 * (fake-smtp.ts) in development and tests.
 */
import nodemailer, { type Transporter } from 'nodemailer';

export interface OutgoingMessage {
  to: string;
  subject: string;
  text: string;
  html: string;
}

export interface Mailer {
  readonly from: string;
  send(message: OutgoingMessage): Promise<void>;
  close(): void;
}

export class MailError extends Error {
  override readonly name = 'MailError';
}

/**
 * A mailer for `url` (smtp:// or smtps://). Without a URL, messages are rendered and dropped
 * (nodemailer's JSON transport): for apps in tests that send no mail they read.
 */
export function createMailer(opts: { url: string | null; from: string }): Mailer {
  const transport: Transporter = opts.url
    ? nodemailer.createTransport(opts.url, { from: opts.from })
    : nodemailer.createTransport({ jsonTransport: true });
  return {
    from: opts.from,
    async send(message) {
      try {
        await transport.sendMail({ from: opts.from, ...message });
      } catch (err) {
        throw new MailError(`could not send mail to ${message.to}: ${(err as Error).message}`, { cause: err });
      }
    },
    close: () => transport.close(),
  };
}
