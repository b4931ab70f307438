import { Inject, Injectable, Logger, type OnApplicationBootstrap, type OnModuleDestroy } from '@nestjs/common';
import type { ConfigType } from '@nestjs/config';
import { Brackets, type EntityManager } from 'typeorm';
import { WriteQueue } from '../common/write-queue.js';
import { mailConfig } from '../config/app.config.js';
import { OutboxMessage } from './entities/outbox-message.entity.js';
import { type MailAttachment, MailService } from './mail.service.js';
import { Organisation } from '../organisations/entities/organisation.entity.js';

/** What a feature that queues mail tells the outbox about its messages. */
export interface OutboxPurpose {
  /** The files to attach, read when the message is about to go: they are not copied into the outbox. */
  attachments(message: OutboxMessage): Promise<MailAttachment[]>;
  /** Called inside the outbox's transaction after every attempt, with the message's new state. */
  settled(em: EntityManager, message: OutboxMessage): Promise<void>;
}

export interface NewOutboxMessage {
  organisationId: string;
  purpose: string;
  subjectId: string | null;
  /** When it is about several subjects at once, all of them (`subjectId` is the first). */
  subjectIds?: string[];
  to: string;
  cc?: string | null;
  subject: string;
  text: string;
  html?: string;
  createdById: string;
}

/** How long one worker may hold a message while it sends it; another takes it over after that. */
const CLAIM_MS = 2 * 60_000;

/** An SMTP reply in the 5xx range will not change by asking again (no such mailbox, refused as spam). */
const isPermanent = (err: unknown) => {
  const code = typeof err === 'object' && err !== null && 'responseCode' in err ? err.responseCode : undefined;
  return typeof code === 'number' && code >= 500 && code < 600;
};

const reasonOf = (err: unknown) => (err instanceof Error ? err.message : String(err)).replace(/\s+/g, ' ').trim().slice(0, 450);

/**
 * Mail that must not be lost goes through here: queued in the database in the caller's transaction, sent by the
 * API process in the background, retried with growing waits when the provider fails, and given up after the last
 * attempt. Several API instances can work one outbox: each message is claimed before it is sent.
 */
@Injectable()
export class MailOutbox implements OnApplicationBootstrap, OnModuleDestroy {
  private readonly purposes = new Map<string, OutboxPurpose>();
  private readonly logger = new Logger('MailOutbox');
  private timer: NodeJS.Timeout | null = null;
  private working: Promise<void> | null = null;
  private again = false;
  private stopped = false;

  constructor(
    private readonly queue: WriteQueue,
    private readonly mail: MailService,
    @Inject(mailConfig.KEY) private readonly config: ConfigType<typeof mailConfig>,
  ) {}

  register(purpose: string, handler: OutboxPurpose): void {
    this.purposes.set(purpose, handler);
  }

  onApplicationBootstrap(): void {
    // Messages left by a stopped or crashed process are picked up on the first round.
    this.timer = setInterval(() => this.kick(), this.config.outboxPollMs);
    this.timer.unref();
  }

  async onModuleDestroy(): Promise<void> {
    this.stopped = true;
    if (this.timer) clearInterval(this.timer);
    await this.working;
  }

  /** Queues a message inside the caller's transaction; it goes once that commits. */
  async enqueue(em: EntityManager, m: NewOutboxMessage): Promise<OutboxMessage> {
    const message = em.create(OutboxMessage, {
      organisationId: m.organisationId,
      purpose: m.purpose,
      subjectId: m.subjectId,
      toAddress: m.to,
      ccAddress: m.cc ?? null,
      subjectIds: m.subjectIds ?? null,
      subject: m.subject,
      text: m.text,
      html: m.html ?? null,
      state: 'queued',
      attempts: 0,
      nextAttemptAt: new Date(),
      claimedUntil: null,
      lastError: null,
      sentAt: null,
      createdById: m.createdById,
    });
    await em.save(message);
    // Queued behind the caller's transaction in the write queue, so the round sees the committed message.
    setImmediate(() => this.kick());
    return message;
  }

  /** Starts a round now, or right after the one under way. */
  kick(): void {
    if (this.stopped) return;
    if (this.working) {
      this.again = true;
      return;
    }
    this.working = this.round()
      .catch((err) => this.logger.warn(`Outbox round stopped: ${reasonOf(err)}`))
      .finally(() => {
        this.working = null;
        if (this.again && !this.stopped) {
          this.again = false;
          this.kick();
        }
      });
  }

  /** Sends every message that is due, one at a time. */
  private async round(): Promise<void> {
    for (let message = await this.claim(); message && !this.stopped; message = await this.claim()) {
      await this.attempt(message);
    }
  }

  private claim(): Promise<OutboxMessage | null> {
    return this.queue.run(async (em) => {
      const now = new Date();
      const next = await em
        .getRepository(OutboxMessage)
        .createQueryBuilder('m')
        .where('m.state = :queued', { queued: 'queued' })
        .andWhere('m.nextAttemptAt <= :now', { now })
        .andWhere(new Brackets((b) => b.where('m.claimedUntil IS NULL').orWhere('m.claimedUntil < :now', { now })))
        .orderBy('m.nextAttemptAt', 'ASC')
        .getOne();
      if (!next) return null;
      const claimed = await em
        .createQueryBuilder()
        .update(OutboxMessage)
        .set({ claimedUntil: new Date(now.getTime() + CLAIM_MS) })
        .where('id = :id', { id: next.id })
        .andWhere(new Brackets((b) => b.where('claimedUntil IS NULL').orWhere('claimedUntil < :now', { now })))
        .execute();
      return claimed.affected ? next : null;
    });
  }

  private async attempt(message: OutboxMessage): Promise<void> {
    const purpose = this.purposes.get(message.purpose);
    let failure: unknown = null;
    try {
      if (!purpose) throw new Error(`Nothing in this server sends "${message.purpose}" mail.`);
      const attachments = await purpose.attachments(message);
      const org = await this.queue.read((em) => em.findOne(Organisation, { where: { id: message.organisationId }, select: { id: true, name: true, email: true } }));
      const sender = org ? { name: org.name, replyTo: org.email } : undefined;
      await this.mail.send({ to: message.toAddress, cc: message.ccAddress ?? undefined, subject: message.subject, text: message.text ?? '', html: message.html ?? undefined, attachments, sender });
    } catch (err) {
      failure = err;
    }
    const attempts = message.attempts + 1;
    const giveUp = failure !== null && (isPermanent(failure) || attempts >= this.config.maxAttempts);
    const changes: Partial<OutboxMessage> =
      failure === null
        ? { state: 'sent', attempts, sentAt: new Date(), lastError: null, claimedUntil: null, text: null, html: null }
        : giveUp
          ? { state: 'failed', attempts, lastError: reasonOf(failure), claimedUntil: null, text: null, html: null }
          : { attempts, lastError: reasonOf(failure), claimedUntil: null, nextAttemptAt: new Date(Date.now() + this.config.retryBaseMs * 4 ** (attempts - 1)) };
    if (failure !== null) this.logger.warn(`Attempt ${attempts} to send "${message.subject}" to ${message.toAddress} failed: ${reasonOf(failure)}`);
    await this.queue.run(async (em) => {
      await em.update(OutboxMessage, { id: message.id }, changes);
      await purpose?.settled(em, Object.assign({}, message, changes));
    });
    // A retry falls due while no message is being sent: look again then, not only at the next poll.
    if (changes.nextAttemptAt && !this.stopped) setTimeout(() => this.kick(), changes.nextAttemptAt.getTime() - Date.now() + 5).unref();
  }
}
