import { HttpException, HttpStatus, Inject, Injectable } from '@nestjs/common';
import type { ConfigType } from '@nestjs/config';
import { type EntityManager, LessThan } from 'typeorm';
import { appConfig } from '../config/app.config.js';
import { AttemptCount } from './entities/attempt-count.entity.js';

export type AttemptKind = 'address' | 'account' | 'refresh' | 'session';

/** One thing attempts are counted against, and how many its window allows. */
export interface Counter {
  kind: AttemptKind;
  key: string;
  limit: number;
  windowMs: number;
}

const REFUSALS: Record<AttemptKind, string> = {
  address: 'Too many sign-in attempts. Wait a minute and try again.',
  account: 'Too many failed sign-ins for this e-mail address. Wait a while and try again, or ask your admin for a password link.',
  refresh: 'Too many attempts to renew a session. Wait a minute and try again.',
  session: 'This session is being renewed too often. Wait a minute and try again.',
};

const keyOf = (kind: AttemptKind, subject: string) => `${kind}:${subject}`.slice(0, 300);
const minutes = (ms: number) => Math.max(1, Math.ceil(ms / 60_000));

/**
 * Limits on guessing, counted in the database inside the write queue (so instances share them and a count is never
 * lost to a race): failed sign-ins per address and per account, failed refreshes per address, and refreshes per
 * session. Successful sign-ins are not counted, so a whole office behind one address can sign in at once.
 */
@Injectable()
export class AttemptLimits {
  private lastSweep = 0;

  constructor(@Inject(appConfig.KEY) private readonly config: ConfigType<typeof appConfig>) {}

  address(address: string | undefined): Counter {
    return { kind: 'address', key: keyOf('address', address ?? 'unknown'), limit: this.config.signInRateLimit, windowMs: this.config.signInRateWindowMs };
  }

  account(email: string): Counter {
    return { kind: 'account', key: keyOf('account', email.trim().toLowerCase()), limit: this.config.signInAccountLimit, windowMs: this.config.signInAccountWindowMs };
  }

  refresh(address: string | undefined): Counter {
    return { kind: 'refresh', key: keyOf('refresh', address ?? 'unknown'), limit: this.config.refreshRateLimit, windowMs: this.config.signInRateWindowMs };
  }

  session(familyId: string): Counter {
    return { kind: 'session', key: keyOf('session', familyId), limit: this.config.refreshRateLimit, windowMs: this.config.signInRateWindowMs };
  }

  /** Throws 429 when any of these counters has used up its window. */
  async refuseIfSpent(em: EntityManager, counters: Counter[], now = new Date()): Promise<void> {
    for (const c of counters) {
      const row = await em.findOneBy(AttemptCount, { key: c.key });
      const left = row ? row.windowStartedAt.getTime() + c.windowMs - now.getTime() : 0;
      if (row && left > 0 && row.attempts >= c.limit) {
        const message = c.kind === 'account' ? REFUSALS.account.replace('a while', `${minutes(left)} minute${minutes(left) === 1 ? '' : 's'}`) : REFUSALS[c.kind];
        throw new HttpException({ statusCode: 429, message, error: 'Too Many Requests' }, HttpStatus.TOO_MANY_REQUESTS);
      }
    }
  }

  /** Counts one attempt against each; a window that has run out starts again. */
  async count(em: EntityManager, counters: Counter[], now = new Date()): Promise<void> {
    for (const c of counters) {
      const row = await em.findOneBy(AttemptCount, { key: c.key });
      if (!row) await em.insert(AttemptCount, { key: c.key, attempts: 1, windowStartedAt: now });
      else if (row.windowStartedAt.getTime() + c.windowMs <= now.getTime()) await em.update(AttemptCount, { key: row.key }, { attempts: 1, windowStartedAt: now });
      else await em.update(AttemptCount, { key: row.key }, { attempts: row.attempts + 1 });
    }
    await this.sweep(em, now);
  }

  /** Forgets a counter: an account's failures once its password has been given right. */
  async forget(em: EntityManager, counter: Counter): Promise<void> {
    await em.delete(AttemptCount, { key: counter.key });
  }

  /** Counters whose longest window has run out say nothing more; dropped at most once a minute per instance. */
  private async sweep(em: EntityManager, now: Date): Promise<void> {
    if (now.getTime() - this.lastSweep < 60_000) return;
    this.lastSweep = now.getTime();
    const longest = Math.max(this.config.signInRateWindowMs, this.config.signInAccountWindowMs);
    await em.delete(AttemptCount, { windowStartedAt: LessThan(new Date(now.getTime() - longest)) });
  }
}
