import type { INestApplication } from '@nestjs/common';
import type { NestExpressApplication } from '@nestjs/platform-express';
import { Test } from '@nestjs/testing';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import request from 'supertest';
import { DataSource } from 'typeorm';
import { hashPassword } from '../src/auth/password.js';
import { Person } from '../src/users/entities/person.entity.js';
import { databaseEnvFor, dropDatabaseFor } from './test-database.js';

export const DEMO_PASSWORD = 'wiretrail-demo';

export interface TestApp {
  app: INestApplication;
  http: ReturnType<typeof request>;
  dataSource: DataSource;
  /** Where its database and files are; another app given it starts on the same data, as after a restart. */
  directory: string;
  close: (options?: { keepFiles?: boolean }) => Promise<void>;
}

/**
 * Boots the real AppModule on a fresh database (a SQLite file, or a PostgreSQL database: test-database.ts), runs the real migrations and loads the demo scenario.
 * The environment is set before AppModule is imported because ConfigModule validates it at import.
 */
export async function createTestApp(env: Record<string, string> = {}, options: { directory?: string } = {}): Promise<TestApp> {
  const dir = options.directory ?? mkdtempSync(join(tmpdir(), 'wiretrail-api-'));
  Object.assign(process.env, {
    NODE_ENV: 'test',
    ...(await databaseEnvFor(dir)),
    JWT_SECRET: 'test-secret-that-is-long-enough-for-hs256-signing',
    // Suites that sign in and refresh hundreds of times from one address; sign-in-limits.e2e-spec.ts tests the real limits.
    SIGN_IN_RATE_LIMIT: '1000',
    REFRESH_RATE_LIMIT: '1000',
    ...env,
  });
  const { AppModule } = await import('../src/app.module.js');
  const { configureApp } = await import('../src/app.setup.js');
  const { seedDemoData } = await import('../src/database/seed.js');
  const moduleRef = await Test.createTestingModule({ imports: [AppModule] }).compile();
  const app = configureApp(moduleRef.createNestApplication<NestExpressApplication>({ logger: ['error'], rawBody: true }));
  await app.init();
  const dataSource = app.get(DataSource);
  await dataSource.runMigrations();
  await seedDemoData(dataSource);
  return {
    app,
    http: request(app.getHttpServer()),
    dataSource,
    directory: dir,
    close: async ({ keepFiles = false } = {}) => {
      await app.close();
      if (keepFiles) return;
      await dropDatabaseFor(dir);
      rmSync(dir, { recursive: true, force: true });
    },
  };
}

export type SignedIn = { accessToken: string; refreshToken: string; user: { id: string; organisationId: string; organisationName: string; role: string }; organisations: Array<{ id: string; name: string }> };

export const bearer = (s: { accessToken: string }) => ({ authorization: `Bearer ${s.accessToken}` });

export async function signIn(t: TestApp, email: string, password = DEMO_PASSWORD) {
  const res = await t.http.post('/api/auth/sign-in').send({ email, password }).expect(200);
  if (!res.body.accessToken) throw new Error(`${email} works for several organisations: sign in with signInTo`);
  return res.body as SignedIn;
}

/** Signs in someone who works for several organisations, choosing one by its name as the sign-in screen does. */
export async function signInTo(t: TestApp, email: string, organisationName: string, password = DEMO_PASSWORD) {
  const first = await t.http.post('/api/auth/sign-in').send({ email, password }).expect(200);
  const choice = (first.body.chooseOrganisation ?? []) as Array<{ id: string; name: string }>;
  const organisation = choice.find((o) => o.name === organisationName);
  if (!organisation) throw new Error(`${email} was not offered ${organisationName}`);
  const res = await t.http.post('/api/auth/sign-in').send({ email, password, organisationId: organisation.id }).expect(200);
  return res.body as SignedIn;
}

/**
 * Adds someone to the admin's team and gives them the password they would set from their welcome link (written
 * behind the server's back, for tests about something else than the link).
 */
export async function addPerson(t: TestApp, admin: { accessToken: string }, person: { email: string; name: string; role: string }, password: string) {
  const res = await t.http.post('/api/users').set(bearer(admin)).send(person);
  if (res.status !== 201) return res;
  await t.dataSource.getRepository(Person).update({ email: person.email.trim().toLowerCase() }, { passwordHash: await hashPassword(password) });
  return res;
}

/** Several people signed in at once, in the order named. */
export function signInAll(t: TestApp, ...emails: string[]) {
  return Promise.all(emails.map((e) => signIn(t, e)));
}


/** An error body's message as one line, whether Nest gave one message or a list. */
export const messagesOf = (body: { message: string | string[] }) => [body.message].flat().join(' | ');

/** Nest's error body, pinned here once: every error the API gives has this shape. */
export function expectErrorBody(body: unknown, statusCode: number): void {
  expect(body).toEqual(expect.objectContaining({ statusCode, message: expect.anything() }));
}

/** What is wrong with an answer, or null when it is one the API may give. */
export function badAnswer(res: { status: number; body: unknown; text: string }): string | null {
  if (res.status >= 500) return `answered ${res.status}: ${res.text.slice(0, 300)}`;
  if (res.status < 400) return null;
  const b = res.body as { statusCode?: unknown; message?: unknown; error?: unknown } | undefined;
  const messages = [b?.message].flat();
  const hasMessage = messages.length > 0 && messages.every((m) => typeof m === 'string' && m.trim() !== '');
  if (!b || b.statusCode !== res.status || typeof b.error !== 'string' || !hasMessage) return `answered ${res.status} without Nest's error body: ${res.text.slice(0, 300)}`;
  return null;
}

/** Waits for something the server does in the background (an e-mail, a retry), for up to `ms`. */
export async function until(done: () => boolean | Promise<boolean>, ms = 5000): Promise<void> {
  const deadline = Date.now() + ms;
  while (!(await done()) && Date.now() < deadline) await new Promise((r) => setTimeout(r, 50));
  expect(await done()).toBe(true);
}
