import type { MigrationInterface, QueryRunner } from 'typeorm';

/** Organisations, their users and the refresh tokens of their sessions. */
export class Foundation1796208527258 implements MigrationInterface {
  name = 'Foundation1796208527258';

  public async up(q: QueryRunner): Promise<void> {
    await q.query(`CREATE TABLE "organisation" (
      "id" varchar(36) PRIMARY KEY NOT NULL,
      "createdAt" datetime NOT NULL DEFAULT (datetime('now')),
      "updatedAt" datetime NOT NULL DEFAULT (datetime('now')),
      "name" varchar(200) NOT NULL,
      "address" varchar(500),
      "phone" varchar(50),
      "email" varchar(254))`);
    await q.query(`CREATE TABLE "user" (
      "id" varchar(36) PRIMARY KEY NOT NULL,
      "createdAt" datetime NOT NULL DEFAULT (datetime('now')),
      "updatedAt" datetime NOT NULL DEFAULT (datetime('now')),
      "organisationId" varchar(36) NOT NULL,
      "email" varchar(254) NOT NULL,
      "name" varchar(200) NOT NULL,
      "role" varchar(20) NOT NULL,
      "passwordHash" varchar(300) NOT NULL,
      "active" boolean NOT NULL DEFAULT (1),
      "lastSignInAt" datetime,
      CONSTRAINT "FK_642763a1acbc9672d38429ea62a" FOREIGN KEY ("organisationId") REFERENCES "organisation" ("id") ON DELETE CASCADE)`);
    await q.query(`CREATE UNIQUE INDEX "IDX_e12875dfb3b1d92d7d7c5377e2" ON "user" ("email")`);
    await q.query(`CREATE TABLE "refresh_token" (
      "id" varchar(36) PRIMARY KEY NOT NULL,
      "createdAt" datetime NOT NULL DEFAULT (datetime('now')),
      "updatedAt" datetime NOT NULL DEFAULT (datetime('now')),
      "organisationId" varchar(36) NOT NULL,
      "userId" varchar(36) NOT NULL,
      "familyId" varchar(36) NOT NULL,
      "tokenHash" varchar(64) NOT NULL,
      "expiresAt" datetime NOT NULL,
      "rotatedAt" datetime,
      "revokedAt" datetime,
      "userAgent" varchar(300))`);
    await q.query(`CREATE INDEX "IDX_8e913e288156c133999341156a" ON "refresh_token" ("userId")`);
    await q.query(`CREATE INDEX "IDX_b803086815f2d539fe7a0349d1" ON "refresh_token" ("familyId")`);
  }

  public async down(q: QueryRunner): Promise<void> {
    await q.query(`DROP TABLE "refresh_token"`);
    await q.query(`DROP TABLE "user"`);
    await q.query(`DROP TABLE "organisation"`);
  }
}
