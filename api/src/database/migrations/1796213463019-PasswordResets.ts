import type { MigrationInterface, QueryRunner } from "typeorm";

/** One-time links for setting a new password, sent by an admin. */

export class PasswordResets1796213463019 implements MigrationInterface {
    name = 'PasswordResets1796213463019'

    public async up(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`CREATE TABLE "password_reset" ("id" varchar(36) PRIMARY KEY NOT NULL, "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "updatedAt" datetime NOT NULL DEFAULT (datetime('now')), "organisationId" varchar(36) NOT NULL, "userId" varchar(36) NOT NULL, "tokenHash" varchar(64) NOT NULL, "expiresAt" datetime NOT NULL, "usedAt" datetime, "requestedById" varchar(36) NOT NULL)`);
        await queryRunner.query(`CREATE INDEX "IDX_05baebe80e9f8fab8207eda250" ON "password_reset" ("userId") `);
    }

    public async down(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`DROP INDEX "IDX_05baebe80e9f8fab8207eda250"`);
        await queryRunner.query(`DROP TABLE "password_reset"`);
    }

}
