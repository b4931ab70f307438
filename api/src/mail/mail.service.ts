import { Inject, Injectable, Logger } from '@nestjs/common';
import type { ConfigType } from '@nestjs/config';
import nodemailer, { type Transporter } from 'nodemailer';
import { mailConfig } from '../config/app.config.js';

export interface OutgoingMail {
  to: string;
  subject: string;
  text: string;
  html?: string;
}

/** Sends mail over SMTP: the local fake in development and tests, the organisation's provider in production. */
@Injectable()
export class MailService {
  private readonly transport: Transporter;
  private readonly logger = new Logger('Mail');

  constructor(@Inject(mailConfig.KEY) private readonly config: ConfigType<typeof mailConfig>) {
    this.transport = nodemailer.createTransport({ host: config.host, port: config.port, secure: false, ignoreTLS: true });
  }

  async send(mail: OutgoingMail): Promise<void> {
    await this.transport.sendMail({ from: this.config.from, ...mail });
    this.logger.log(`Sent "${mail.subject}" to ${mail.to}`);
  }
}
