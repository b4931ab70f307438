import { Inject, Injectable, Logger } from '@nestjs/common';
import type { ConfigType } from '@nestjs/config';
import nodemailer, { type Transporter } from 'nodemailer';
import { mailConfig } from '../config/app.config.js';

export interface MailAttachment {
  filename: string;
  content: Buffer;
  contentType: string;
}

export interface OutgoingMail {
  to: string;
  /** Who gets a copy. */
  cc?: string;
  /** Whose mail it is: shown as the sender's name, with the configured address, and answered to their own. */
  sender?: { name: string; replyTo: string | null };
  subject: string;
  text: string;
  html?: string;
  attachments?: MailAttachment[];
}

/** The bare address of "Name <address>" or of an address alone. */
export function addressOf(from: string): string {
  return /<([^>]+)>/.exec(from)?.[1] ?? from.trim();
}

/**
 * Sends mail over SMTP: the local fake in development and tests, the organisation's provider in production.
 * Which one is configuration only (host, port, TLS, sign-in; see api/.env.example).
 */
@Injectable()
export class MailService {
  private readonly transport: Transporter;
  private readonly logger = new Logger('Mail');

  constructor(@Inject(mailConfig.KEY) private readonly config: ConfigType<typeof mailConfig>) {
    this.transport = nodemailer.createTransport({
      host: config.host,
      port: config.port,
      secure: config.secure,
      requireTLS: config.requireTls,
      auth: config.user ? { user: config.user, pass: config.password ?? '' } : undefined,
      // A provider that does not answer is a failed attempt the outbox retries, not a request left hanging.
      connectionTimeout: 15_000,
      greetingTimeout: 15_000,
      socketTimeout: 60_000,
    });
  }

  async send({ sender, ...mail }: OutgoingMail): Promise<void> {
    // Sent from the address the provider lets us use, under the contractor's name, with replies going to their office.
    const from = sender ? { name: sender.name, address: addressOf(this.config.from) } : this.config.from;
    await this.transport.sendMail({ from, ...(sender?.replyTo ? { replyTo: sender.replyTo } : {}), ...mail });
    this.logger.log(`Sent "${mail.subject}" to ${mail.to}`);
  }
}
