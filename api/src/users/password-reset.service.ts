import { BadRequestException, ForbiddenException, Inject, Injectable, NotFoundException, type OnModuleInit } from '@nestjs/common';
import type { ConfigType } from '@nestjs/config';
import { createHash, randomBytes, timingSafeEqual } from 'node:crypto';
import { type EntityManager, In, IsNull } from 'typeorm';
import { PasswordReset } from '../auth/entities/password-reset.entity.js';
import { RefreshToken } from '../auth/entities/refresh-token.entity.js';
import { hashPassword } from '../auth/password.js';
import type { AuthUser } from '../common/decorators/current-user.decorator.js';
import { WriteQueue } from '../common/write-queue.js';
import { mailConfig } from '../config/app.config.js';
import { MailOutbox } from '../mail/mail-outbox.service.js';
import { mailTemplate } from '../mail/mail-template.js';
import { Organisation } from '../organisations/entities/organisation.entity.js';
import { Person } from './entities/person.entity.js';
import { User } from './entities/user.entity.js';

const LINK_LIFETIME_MS = 60 * 60 * 1000;
/** Long enough to reach someone who is on site all week; the link still works once only. */
const WELCOME_LIFETIME_MS = 7 * 24 * 60 * 60 * 1000;
const LINK_REFUSED = 'This password link is not valid any more. Ask your admin to send a new one.';
const sha256 = (s: string) => createHash('sha256').update(s).digest('hex');
const PASSWORD_RESET_MAIL = 'password-reset';
const RESET_SUBJECT = 'Set a new Wiretrail password';
/** Both parts of the e-mail come from this one template. */
const RESET_LETTER = mailTemplate<{ name: string; caller: string; url: string }>(`Hello {{name}},

{{caller}} asked Wiretrail to let you set a new password. Open this link within an hour:

{{link url}}

If you did not expect this, ignore this e-mail; your password stays as it is.`);

const WELCOME_NEW = mailTemplate<{ name: string; caller: string; organisation: string; url: string }>(`Hello {{name}},

{{caller}} has added you to {{organisation}} on Wiretrail. Open this link within a week to set your password:

{{link url}}

Then sign in with this e-mail address and that password.`);
const WELCOME_KNOWN = mailTemplate<{ name: string; caller: string; organisation: string }>(`Hello {{name}},

{{caller}} has added you to {{organisation}} on Wiretrail. Sign in with this e-mail address and the password you already use, and choose {{organisation}}.

If you have forgotten your password, ask {{caller}} for a password link.`);

@Injectable()
export class PasswordResetService implements OnModuleInit {
  constructor(
    private readonly queue: WriteQueue,
    private readonly outbox: MailOutbox,
    @Inject(mailConfig.KEY) private readonly config: ConfigType<typeof mailConfig>,
  ) {}

  onModuleInit(): void {
    this.outbox.register(PASSWORD_RESET_MAIL, { attachments: async () => [], settled: async () => undefined });
  }

  /** An admin sends someone a one-hour link to set a new password; earlier unused links stop working. */
  async send(caller: AuthUser, userId: string): Promise<{ sentTo: string; expiresAt: string }> {
    const secret = randomBytes(32).toString('base64url');
    const { user, reset } = await this.queue.run(async (em) => {
      const user = await em.findOneBy(User, { id: userId, organisationId: caller.organisationId });
      if (!user) throw new NotFoundException('No such user.');
      if (!user.active) throw new ForbiddenException('That account is deactivated; reactivate it first.');
      await em.update(PasswordReset, { userId, usedAt: IsNull() }, { usedAt: new Date() });
      const reset = em.create(PasswordReset, {
        organisationId: caller.organisationId,
        userId,
        tokenHash: sha256(secret),
        expiresAt: new Date(Date.now() + LINK_LIFETIME_MS),
        usedAt: null,
        requestedById: caller.id,
      });
      await em.save(reset);
      // Through the outbox, in this transaction: a mail server that is down delays the link instead of failing the
      // request, and the outbox empties the text (it carries the link) once sent.
      const link = `${this.config.publicUrl}/reset-password?token=${encodeURIComponent(`${reset.id}.${secret}`)}`;
      await this.outbox.enqueue(em, {
        organisationId: caller.organisationId,
        purpose: PASSWORD_RESET_MAIL,
        subjectId: user.id,
        to: user.email,
        createdById: caller.id,
        subject: RESET_SUBJECT,
        ...RESET_LETTER(RESET_SUBJECT, { name: user.name, caller: caller.name, url: link }),
      });
      return { user, reset };
    });
    return { sentTo: user.email, expiresAt: reset.expiresAt.toISOString() };
  }

  /**
   * Tells someone just added to the team, in the caller's transaction: a person new to Wiretrail gets a week-long link
   * to set their password; one who already signs in for another organisation is told to sign in as they do and
   * choose this one. The office's answer is the same either way, so it learns nothing about other organisations.
   */
  async welcome(em: EntityManager, caller: AuthUser, user: User, newPerson: boolean): Promise<void> {
    const organisation = await em.findOneByOrFail(Organisation, { id: caller.organisationId });
    const subject = `You have been added to ${organisation.name} on Wiretrail`.slice(0, 200);
    const words = { name: user.name, caller: caller.name, organisation: organisation.name };
    let letter: ReturnType<typeof WELCOME_KNOWN>;
    if (newPerson) {
      const secret = randomBytes(32).toString('base64url');
      const reset = await em.save(em.create(PasswordReset, {
        organisationId: caller.organisationId,
        userId: user.id,
        tokenHash: sha256(secret),
        expiresAt: new Date(Date.now() + WELCOME_LIFETIME_MS),
        usedAt: null,
        requestedById: caller.id,
      }));
      const url = `${this.config.publicUrl}/reset-password?token=${encodeURIComponent(`${reset.id}.${secret}`)}`;
      letter = WELCOME_NEW(subject, { ...words, url });
    } else {
      letter = WELCOME_KNOWN(subject, words);
    }
    await this.outbox.enqueue(em, {
      organisationId: caller.organisationId,
      purpose: PASSWORD_RESET_MAIL,
      subjectId: user.id,
      to: user.email,
      createdById: caller.id,
      subject,
      ...letter,
    });
  }

  /**
   * Sets the new password and ends every session of that person, in every organisation they work for, so a lost
   * phone is signed out too.
   */
  async complete(token: string, password: string): Promise<void> {
    const [id, secret] = token.split('.');
    const passwordHash = await hashPassword(password);
    const ok = await this.queue.run(async (em) => {
      const reset = await em.findOneBy(PasswordReset, { id });
      if (!reset || !secret || reset.usedAt || reset.expiresAt.getTime() <= Date.now()) return false;
      const a = Buffer.from(reset.tokenHash, 'hex');
      const b = Buffer.from(sha256(secret), 'hex');
      if (a.length !== b.length || !timingSafeEqual(a, b)) return false;
      const user = await em.findOneBy(User, { id: reset.userId, organisationId: reset.organisationId });
      if (!user?.active) return false;
      await em.update(Person, { id: user.personId }, { passwordHash });
      await em.update(PasswordReset, { id: reset.id }, { usedAt: new Date() });
      const memberships = await em.find(User, { where: { personId: user.personId }, select: { id: true } });
      await em.update(RefreshToken, { userId: In(memberships.map((m) => m.id)), revokedAt: IsNull() }, { revokedAt: new Date() });
      return true;
    });
    if (!ok) throw new BadRequestException(LINK_REFUSED);
  }
}
