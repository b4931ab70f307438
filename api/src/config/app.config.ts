import { registerAs } from '@nestjs/config';

export const appConfig = registerAs('app', () => ({
  env: process.env.NODE_ENV ?? 'development',
  port: Number(process.env.PORT ?? 3000),
  host: process.env.HOST ?? '127.0.0.1',
  webDist: process.env.WEB_DIST || undefined,
  /** Failed sign-ins (and password links) allowed per client address per window; successful ones are not counted. */
  signInRateLimit: Number(process.env.SIGN_IN_RATE_LIMIT ?? 10),
  signInRateWindowMs: Number(process.env.SIGN_IN_RATE_WINDOW_MS ?? 60_000),
  /** Failed sign-ins allowed per account (e-mail address) per window, from whatever addresses they come. */
  signInAccountLimit: Number(process.env.SIGN_IN_ACCOUNT_LIMIT ?? 5),
  signInAccountWindowMs: Number(process.env.SIGN_IN_ACCOUNT_WINDOW_MS ?? 900_000),
  /** Failed refreshes per client address, and refreshes per session, allowed per sign-in window. */
  refreshRateLimit: Number(process.env.REFRESH_RATE_LIMIT ?? 30),
  /** Express's "trust proxy": which proxies' X-Forwarded-For names the client (unset: none, the peer is the client). */
  trustProxy: process.env.TRUST_PROXY || undefined,
  /** Requests per client address per window to the customers' share pages (a page of photos is one request a photo). */
  shareRateLimit: Number(process.env.SHARE_RATE_LIMIT ?? 300),
  shareRateWindowMs: Number(process.env.SHARE_RATE_WINDOW_MS ?? 60_000),
}));

export const authConfig = registerAs('auth', () => ({
  // Checked at boot (env.validation.ts): at least 32 characters.
  jwtSecret: process.env.JWT_SECRET ?? '',
  accessTokenTtlSeconds: Number(process.env.ACCESS_TOKEN_TTL_SECONDS ?? 900),
  refreshTokenTtlDays: Number(process.env.REFRESH_TOKEN_TTL_DAYS ?? 30),
}));

export const mailConfig = registerAs('mail', () => ({
  /** Where links in e-mails point: the address people open Wiretrail at. */
  publicUrl: (process.env.PUBLIC_URL ?? `http://localhost:${process.env.PORT ?? 3000}`).replace(/\/$/, ''),
  /** Whether PUBLIC_URL was given; without it, what answers a request is built from the address the request came to. */
  publicUrlGiven: !!process.env.PUBLIC_URL,
  host: process.env.SMTP_HOST ?? '127.0.0.1',
  port: Number(process.env.SMTP_PORT ?? 1025),
  /** TLS from the first byte (port 465); otherwise STARTTLS is used whenever the server offers it. */
  secure: process.env.SMTP_SECURE === 'true',
  /** Refuse to send unless STARTTLS succeeds: for a provider on port 587. */
  requireTls: process.env.SMTP_REQUIRE_TLS === 'true',
  user: process.env.SMTP_USER || undefined,
  password: process.env.SMTP_PASSWORD || undefined,
  from: process.env.MAIL_FROM ?? 'Wiretrail <no-reply@wiretrail.local>',
  /** The outbox: how often it looks for mail due, the first wait after a failed attempt (it grows fourfold), and when it gives up. */
  outboxPollMs: Number(process.env.MAIL_OUTBOX_POLL_MS ?? 5_000),
  retryBaseMs: Number(process.env.MAIL_RETRY_BASE_MS ?? 30_000),
  maxAttempts: Number(process.env.MAIL_MAX_ATTEMPTS ?? 6),
}));

export const syncConfig = registerAs('sync', () => ({
  /**
   * Days a deletion stays in the change log (and a mutation's replay record after its device has heard back). A
   * device that has not synced for longer starts again from nothing, keeping the changes it has not sent.
   */
  retentionDays: Number(process.env.SYNC_RETENTION_DAYS ?? 90),
  /** How often the API process compacts the change log; 0 leaves it to `POST /api/sync/compaction`. */
  compactionIntervalMinutes: Number(process.env.SYNC_COMPACTION_INTERVAL_MINUTES ?? 360),
}));
