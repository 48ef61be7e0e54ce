import { randomUUID } from 'node:crypto';
import type { AddressInfo } from 'node:net';
import { simpleParser, type AddressObject } from 'mailparser';
import { SMTPServer } from 'smtp-server';
import type { DevMailMessage } from '@sheaf/engine/api';
import type { Logger } from '../logger';

const KEEP_MESSAGES = 500;

function addressText(address: AddressObject | AddressObject[] | undefined): string {
  if (!address) return '';
  return (Array.isArray(address) ? address : [address]).map((a) => a.value.map((v) => v.address ?? '').join(', ')).join(', ');
}

/**
 * A local SMTP server for development and test that keeps every message it receives in memory,
 * so the dev inbox page and tests can read what Sheaf sent. No TLS and no authentication:
 * it listens on 127.0.0.1 only.
 */
export class SmtpInbox {
  private readonly messages: DevMailMessage[] = [];
  private readonly server: SMTPServer;
  private boundPort = 0;

  constructor(private readonly logger: Logger) {
    this.server = new SMTPServer({
      secure: false,
      authOptional: true,
      disabledCommands: ['STARTTLS', 'AUTH'],
      logger: false,
      size: 5 * 1024 * 1024,
      onData: (stream, _session, callback) => {
        simpleParser(stream)
          .then((parsed) => {
            this.messages.unshift({
              id: randomUUID(),
              to: addressText(parsed.to),
              from: addressText(parsed.from),
              subject: parsed.subject ?? '',
              text: parsed.text ?? '',
              html: typeof parsed.html === 'string' ? parsed.html : '',
              receivedAt: new Date().toISOString(),
            });
            this.messages.length = Math.min(this.messages.length, KEEP_MESSAGES);
            callback();
          })
          .catch((error: Error) => {
            this.logger.warn({ err: error }, 'fake SMTP could not parse a message');
            callback(error);
          });
      },
    });
  }

  /** Starts listening on 127.0.0.1 (port 0 picks a free one) and returns the port. */
  start(port: number): Promise<number> {
    return new Promise((resolve, reject) => {
      this.server.once('error', reject);
      this.server.listen(port, '127.0.0.1', () => {
        this.server.off('error', reject);
        this.boundPort = (this.server.server.address() as AddressInfo).port;
        resolve(this.boundPort);
      });
    });
  }

  get port(): number {
    return this.boundPort;
  }

  /** Received messages, newest first. */
  list(): DevMailMessage[] {
    return [...this.messages];
  }

  stop(): Promise<void> {
    return new Promise((resolve) => this.server.close(() => resolve()));
  }
}
