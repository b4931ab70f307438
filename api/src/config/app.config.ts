import { registerAs } from '@nestjs/config';

export const appConfig = registerAs('app', () => ({
  env: process.env.NODE_ENV ?? 'development',
  port: Number(process.env.PORT ?? 3000),
  host: process.env.HOST ?? '127.0.0.1',
  webDist: process.env.WEB_DIST || undefined,
  signInRateLimit: Number(process.env.SIGN_IN_RATE_LIMIT ?? 10),
  signInRateWindowMs: Number(process.env.SIGN_IN_RATE_WINDOW_MS ?? 60_000),
}));

export const authConfig = registerAs('auth', () => ({
  jwtSecret: process.env.JWT_SECRET as string,
  accessTokenTtlSeconds: Number(process.env.ACCESS_TOKEN_TTL_SECONDS ?? 900),
  refreshTokenTtlDays: Number(process.env.REFRESH_TOKEN_TTL_DAYS ?? 30),
}));

export const mailConfig = registerAs('mail', () => ({
  /** Where links in e-mails point: the address people open Wiretrail at. */
  publicUrl: (process.env.PUBLIC_URL ?? `http://localhost:${process.env.PORT ?? 3000}`).replace(/\/$/, ''),
  host: process.env.SMTP_HOST ?? '127.0.0.1',
  port: Number(process.env.SMTP_PORT ?? 1025),
  from: process.env.MAIL_FROM ?? 'Wiretrail <no-reply@wiretrail.local>',
}));
