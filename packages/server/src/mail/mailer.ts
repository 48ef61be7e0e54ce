import nodemailer, { type Transporter } from 'nodemailer';
import type { Logger } from '../logger';

/** One message in both forms every mail client can show. */
export interface OutgoingMail {
  to: string;
  subject: string;
  text: string;
  html: string;
}

/**
 * Sends mail over SMTP (nodemailer). `sendInBackground` is for answers that must not wait on, or
 * reveal, the mail (password resets); `close` waits for those before shutting the transport.
 */
export class Mailer {
  private readonly pending = new Set<Promise<void>>();

  constructor(
    private readonly transport: Transporter,
    private readonly from: string,
    private readonly logger: Logger,
  ) {}

  /** A transport to the given SMTP URL, or to the local fake inbox (no TLS there). */
  static create(options: { smtpUrl?: string; fakePort?: number; from: string; logger: Logger }): Mailer {
    const transport = options.smtpUrl
      ? nodemailer.createTransport(options.smtpUrl)
      : nodemailer.createTransport({ host: '127.0.0.1', port: options.fakePort, secure: false, ignoreTLS: true });
    return new Mailer(transport, options.from, options.logger);
  }

  async send(mail: OutgoingMail): Promise<void> {
    await this.transport.sendMail({ from: this.from, ...mail });
    this.logger.info({ to: mail.to, subject: mail.subject }, 'mail sent');
  }

  sendInBackground(mail: OutgoingMail): void {
    const sending = this.send(mail)
      .catch((error: unknown) => this.logger.error({ err: error, subject: mail.subject }, 'mail could not be sent'))
      .finally(() => this.pending.delete(sending));
    this.pending.add(sending);
  }

  async close(): Promise<void> {
    await Promise.allSettled([...this.pending]);
    this.transport.close();
  }
}
