import { Injectable, Logger, type OnModuleDestroy } from '@nestjs/common';
import type { OutboxMessage } from '@tallyloom/core';
import { simpleParser, type AddressObject } from 'mailparser';
import { randomUUID } from 'node:crypto';
import type { AddressInfo } from 'node:net';
import { SMTPServer } from 'smtp-server';

const KEEP_LATEST = 200;

function addresses(value: AddressObject | AddressObject[] | undefined): string[] {
  const list = Array.isArray(value) ? value : value ? [value] : [];
  return list
    .flatMap((entry) => entry.value.map((address) => address.address ?? ''))
    .filter(Boolean);
}

/**
 * A real SMTP server inside the API process, on a free loopback port, that keeps the latest
 * messages in memory instead of delivering them. Used whenever no SMTP_URL is configured, so
 * invitations and resets can be followed in development, demos and tests.
 */
@Injectable()
export class DevMailCatcher implements OnModuleDestroy {
  private readonly logger = new Logger('DevMailCatcher');
  private readonly messages: OutboxMessage[] = [];
  private server: SMTPServer | null = null;
  private port: number | null = null;

  async start(): Promise<number> {
    if (this.port) return this.port;
    this.server = new SMTPServer({
      authOptional: true,
      disabledCommands: ['STARTTLS', 'AUTH'],
      logger: false,
      onData: (stream, _session, callback) => {
        simpleParser(stream)
          .then((parsed) => {
            const text = parsed.text ?? '';
            this.messages.unshift({
              id: randomUUID(),
              to: addresses(parsed.to),
              from: addresses(parsed.from)[0] ?? '',
              subject: parsed.subject ?? '',
              text,
              receivedAt: new Date().toISOString(),
              links: text.match(/https?:\/\/\S+/g) ?? [],
            });
            this.messages.splice(KEEP_LATEST);
            callback();
          })
          .catch((error: Error) => callback(error));
      },
    });
    const server = this.server;
    this.port = await new Promise<number>((resolve, reject) => {
      server.once('error', reject);
      server.listen(0, '127.0.0.1', () => resolve((server.server.address() as AddressInfo).port));
    });
    this.logger.log(`catching e-mail on 127.0.0.1:${this.port}`);
    return this.port;
  }

  /** Newest first. */
  list(): OutboxMessage[] {
    return [...this.messages];
  }

  async onModuleDestroy(): Promise<void> {
    const server = this.server;
    if (server) await new Promise<void>((resolve) => server.close(() => resolve()));
  }
}
