/**
 * A local fake SMTP server for development and tests (the smtp-server package): it listens on
 * loopback only, accepts every message, parses it with mailparser and stores it in the
 * development outbox (dev_outbox), where the admin Outbox screen and the tests read it.
 * Never used in production, where SMTP_URL names a real mail service.
 */
import type { AddressInfo } from 'node:net';
import { simpleParser, type AddressObject } from 'mailparser';
import { SMTPServer } from 'smtp-server';
import { OutboxMessage } from '../models';

export interface CaughtMessage {
  to: string;
  from: string;
  subject: string;
  text: string;
  html: string;
  receivedAt: Date;
}

export interface FakeSmtpOptions {
  /** 0 (the default): any free port. */
  port?: number;
  /** Where a parsed message goes; by default a row in dev_outbox. */
  store?: (message: CaughtMessage) => Promise<unknown>;
  /** Largest message accepted, in bytes. */
  maxBytes?: number;
}

const addresses = (a: AddressObject | AddressObject[] | undefined): string =>
  (Array.isArray(a) ? a : a ? [a] : []).map((x) => x.text).join(', ');

const isLoopback = (ip: string) => ip === '127.0.0.1' || ip === '::1' || ip === '::ffff:127.0.0.1';

export class FakeSmtpServer {
  private readonly server: SMTPServer;
  private readonly requestedPort: number;
  port = 0;

  constructor(opts: FakeSmtpOptions = {}) {
    this.requestedPort = opts.port ?? 0;
    const store = opts.store ?? ((m: CaughtMessage) => OutboxMessage.create(m));
    this.server = new SMTPServer({
      banner: 'Counterweight local mail catcher (development only)',
      logger: false,
      secure: false,
      // Plain SMTP on loopback: no TLS to negotiate, no credentials to check.
      disabledCommands: ['STARTTLS', 'AUTH'],
      authOptional: true,
      size: opts.maxBytes ?? 5 * 1024 * 1024,
      closeTimeout: 1000,
      onConnect(session, callback) {
        if (!isLoopback(session.remoteAddress)) return callback(new Error('Only local connections are accepted'));
        callback();
      },
      onData(stream, session, callback) {
        simpleParser(stream)
          .then(async (parsed) => {
            if ((stream as unknown as { sizeExceeded?: boolean }).sizeExceeded) {
              throw Object.assign(new Error('Message is larger than the mail catcher accepts'), { responseCode: 552 });
            }
            const envelopeTo = session.envelope.rcptTo.map((r) => r.address).join(', ');
            const envelopeFrom = session.envelope.mailFrom ? session.envelope.mailFrom.address : '';
            await store({
              to: addresses(parsed.to) || envelopeTo,
              from: addresses(parsed.from) || envelopeFrom,
              subject: parsed.subject ?? '',
              text: parsed.text ?? '',
              html: typeof parsed.html === 'string' ? parsed.html : '',
              receivedAt: new Date(),
            });
          })
          .then(() => callback())
          .catch((err: Error) => callback(err));
      },
    });
  }

  /** smtp://127.0.0.1:<port>, for nodemailer. */
  get url(): string {
    return `smtp://127.0.0.1:${this.port}`;
  }

  start(): Promise<this> {
    return new Promise((resolve, reject) => {
      const onError = (err: Error) => reject(err);
      this.server.once('error', onError);
      this.server.listen(this.requestedPort, '127.0.0.1', () => {
        this.server.off('error', onError);
        // Later errors (a client that misbehaves) must not crash the process.
        this.server.on('error', () => {});
        this.port = (this.server.server.address() as AddressInfo).port;
        resolve(this);
      });
    });
  }

  stop(): Promise<void> {
    return new Promise((resolve) => this.server.close(() => resolve()));
  }
}
