import { Inject, Injectable, UnauthorizedException } from '@nestjs/common';
import type { ConfigType } from '@nestjs/config';
import { JwtService } from '@nestjs/jwt';
import { InjectRepository } from '@nestjs/typeorm';
import { createHash, randomBytes, timingSafeEqual } from 'node:crypto';
import { type EntityManager, IsNull, Repository } from 'typeorm';
import { v7 as uuidv7 } from 'uuid';
import { WriteQueue } from '../common/write-queue.js';
import { authConfig } from '../config/app.config.js';
import type { OrganisationChoice, SessionTokens, SignInAnswer } from '@wiretrail/core';
import { Person } from '../users/entities/person.entity.js';
import { User } from '../users/entities/user.entity.js';
import { activeMemberships, type Membership, signedInUser } from '../users/memberships.js';
import { AttemptLimits } from './attempt-limits.js';
import { RefreshToken } from './entities/refresh-token.entity.js';
import type { AccessTokenPayload } from './jwt.strategy.js';
import { decoyHash, verifyPassword } from './password.js';

const BAD_CREDENTIALS = 'That e-mail and password do not match an active account.';
const SESSION_ENDED = 'Your session has ended. Please sign in again.';

const sha256 = (s: string) => createHash('sha256').update(s).digest('hex');

@Injectable()
export class AuthService {
  constructor(
    @Inject(authConfig.KEY) private readonly config: ConfigType<typeof authConfig>,
    @InjectRepository(Person) private readonly people: Repository<Person>,
    private readonly jwt: JwtService,
    private readonly queue: WriteQueue,
    private readonly limits: AttemptLimits,
  ) {}

  /**
   * Failures count against the address and the account, successes against neither. The account's attempt is
   * counted before its password is checked, so that guesses sent at once cannot all slip under its limit; the
   * address's only on failure, so that an office signing in together at 8 o'clock is never refused.
   *
   * A person who works for several organisations and has not chosen one (or chose one they cannot enter now) gets
   * the choice instead of a session, only once the password is right.
   */
  async signIn(email: string, password: string, address: string | undefined, userAgent?: string, organisationId?: string): Promise<SignInAnswer> {
    const from = this.limits.address(address);
    const account = this.limits.account(email);
    await this.queue.run(async (em) => {
      await this.limits.refuseIfSpent(em, [from, account]);
      await this.limits.count(em, [account]);
    });
    const person = await this.people.findOne({ where: { email: email.trim().toLowerCase() }, select: { id: true, passwordHash: true } });
    // Hash even when the e-mail is unknown (or its person has set no password yet), so the answer takes as long.
    const ok = await verifyPassword(password, person?.passwordHash || (await decoyHash()));
    const memberships = person && ok ? await this.queue.read((em) => activeMemberships(em, person.id)) : [];
    if (memberships.length === 0) {
      await this.countFailure(address);
      throw new UnauthorizedException(BAD_CREDENTIALS);
    }
    const chosen = memberships.length === 1 ? memberships[0] : memberships.find((m) => m.organisation.id === organisationId);
    return this.queue.run(async (em) => {
      await this.limits.forget(em, account);
      if (!chosen) return { chooseOrganisation: memberships.map((m) => m.organisation) } satisfies OrganisationChoice;
      await em.update(User, { id: chosen.user.id }, { lastSignInAt: new Date() });
      return this.issue(em, chosen, memberships, uuidv7(), userAgent);
    });
  }

  /** Refuses (429) an address that has used up its failed sign-ins for now. */
  refuseSpentAddress(address: string | undefined): Promise<void> {
    return this.queue.read((em) => this.limits.refuseIfSpent(em, [this.limits.address(address)]));
  }

  /** A failed sign-in or password link, counted against the address it came from. */
  countFailure(address: string | undefined): Promise<void> {
    return this.queue.run((em) => this.limits.count(em, [this.limits.address(address)]));
  }

  /**
   * Renews a session; with `organisationId` naming another organisation the person works for, ends this session and
   * begins one there, so a subcontractor changes contractor without typing the password again.
   */
  async refresh(presented: string, address: string | undefined, userAgent?: string, organisationId?: string): Promise<SessionTokens> {
    // In the write queue: two refreshes racing with one token see each other's rotation. A refusal comes back
    // as null rather than an exception, so that a revocation made on the way (reuse detected) is committed, and
    // counted against the address: a refresh token is guessed no faster than a password.
    const from = this.limits.refresh(address);
    const session = await this.queue.run(async (em) => {
      await this.limits.refuseIfSpent(em, [from]);
      const rotated = await this.rotate(em, presented, userAgent, organisationId);
      if (!rotated) await this.limits.count(em, [from]);
      return rotated;
    });
    if (!session) throw new UnauthorizedException(SESSION_ENDED);
    return session;
  }

  private async rotate(em: EntityManager, presented: string, userAgent?: string, organisationId?: string): Promise<SessionTokens | null> {
    const [id, secret] = presented.split('.');
    const token = await em.findOneBy(RefreshToken, { id });
    if (!token || !secret || !safeEqualHex(token.tokenHash, sha256(secret))) return null;
    if (token.rotatedAt || token.revokedAt) {
      // A rotated token came back: someone else may hold this session. End all of it.
      await this.revokeFamily(em, token.familyId);
      return null;
    }
    if (token.expiresAt.getTime() <= Date.now()) return null;
    const user = await em.findOneBy(User, { id: token.userId, organisationId: token.organisationId });
    if (!user || !user.active) {
      await this.revokeFamily(em, token.familyId);
      return null;
    }
    // A session renewed over and over is a script, not a phone: refused before anything is written.
    const session = this.limits.session(token.familyId);
    await this.limits.refuseIfSpent(em, [session]);
    await this.limits.count(em, [session]);
    await em.update(RefreshToken, { id: token.id }, { rotatedAt: new Date() });
    const memberships = await activeMemberships(em, user.personId);
    const current = memberships.find((m) => m.user.id === user.id);
    if (!current) return null;
    const target = organisationId ? memberships.find((m) => m.organisation.id === organisationId) : current;
    if (!target) return null;
    if (target === current) return this.issue(em, current, memberships, token.familyId, userAgent);
    // Another organisation is another session: this one ends, so its tokens open nothing there or here.
    await this.revokeFamily(em, token.familyId);
    await em.update(User, { id: target.user.id }, { lastSignInAt: new Date() });
    return this.issue(em, target, memberships, uuidv7(), userAgent);
  }

  signOut(presented: string): Promise<void> {
    const [id, secret] = presented.split('.');
    return this.queue.run(async (em) => {
      const token = await em.findOneBy(RefreshToken, { id });
      if (token && secret && safeEqualHex(token.tokenHash, sha256(secret))) await this.revokeFamily(em, token.familyId);
    });
  }

  private async revokeFamily(em: EntityManager, familyId: string): Promise<void> {
    await em.update(RefreshToken, { familyId, revokedAt: IsNull() }, { revokedAt: new Date() });
  }

  private async issue(em: EntityManager, membership: Membership, memberships: Membership[], familyId: string, userAgent?: string): Promise<SessionTokens> {
    const { user } = membership;
    const payload: AccessTokenPayload = { sub: user.id, org: user.organisationId, role: user.role, sid: familyId };
    const accessToken = await this.jwt.signAsync(payload, { expiresIn: this.config.accessTokenTtlSeconds });
    const secret = randomBytes(32).toString('base64url');
    const row = em.create(RefreshToken, {
      organisationId: user.organisationId,
      userId: user.id,
      familyId,
      tokenHash: sha256(secret),
      expiresAt: new Date(Date.now() + this.config.refreshTokenTtlDays * 86_400_000),
      rotatedAt: null,
      revokedAt: null,
      userAgent: userAgent?.slice(0, 300) ?? null,
    });
    await em.save(row);
    return { accessToken, refreshToken: `${row.id}.${secret}`, user: signedInUser(membership), organisations: memberships.map((m) => m.organisation) };
  }
}

function safeEqualHex(a: string, b: string): boolean {
  const x = Buffer.from(a, 'hex');
  const y = Buffer.from(b, 'hex');
  return x.length === y.length && timingSafeEqual(x, y);
}
