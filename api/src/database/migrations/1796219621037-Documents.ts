import type { MigrationInterface, QueryRunner } from "typeorm";

/**
 * Issuing documents: each kind's numbering per organisation, the outbox that e-mails them, customers' share links,
 * and the contractor's registration number and time zone for what certificates print.
 */

export class Documents1796219621037 implements MigrationInterface {
    name = 'Documents1796219621037'

    public async up(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`CREATE TABLE "document_counter" ("organisationId" varchar(36) NOT NULL, "kind" varchar(40) NOT NULL, "value" integer NOT NULL, PRIMARY KEY ("organisationId", "kind"))`);
        await queryRunner.query(`CREATE TABLE "outgoing_mail" ("id" varchar(36) PRIMARY KEY NOT NULL, "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "updatedAt" datetime NOT NULL DEFAULT (datetime('now')), "organisationId" varchar(36) NOT NULL, "purpose" varchar(40) NOT NULL, "subjectId" varchar(36), "toAddress" varchar(254) NOT NULL, "subject" varchar(300) NOT NULL, "text" text, "html" text, "state" varchar(10) NOT NULL DEFAULT ('queued'), "attempts" integer NOT NULL DEFAULT (0), "nextAttemptAt" datetime NOT NULL, "claimedUntil" datetime, "lastError" varchar(500), "sentAt" datetime, "createdById" varchar(36) NOT NULL)`);
        await queryRunner.query(`CREATE INDEX "IDX_fd38b56ed4df340a64471d476e" ON "outgoing_mail" ("subjectId") `);
        await queryRunner.query(`CREATE INDEX "IDX_outgoing_mail_due" ON "outgoing_mail" ("state", "nextAttemptAt") `);
        await queryRunner.query(`CREATE TABLE "share_link" ("id" varchar(36) PRIMARY KEY NOT NULL, "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "updatedAt" datetime NOT NULL DEFAULT (datetime('now')), "organisationId" varchar(36) NOT NULL, "jobId" varchar(36) NOT NULL, "tokenHash" varchar(64) NOT NULL, "label" varchar(200), "expiresAt" datetime NOT NULL, "revokedAt" datetime, "revokedById" varchar(36), "createdById" varchar(36) NOT NULL, "lastOpenedAt" datetime, "openCount" integer NOT NULL DEFAULT (0))`);
        await queryRunner.query(`CREATE INDEX "IDX_2e73f9bf02ad6aab09658c7315" ON "share_link" ("jobId") `);
        await queryRunner.query(`CREATE UNIQUE INDEX "IDX_a5465a28f9b179b7f06d1fc3a2" ON "share_link" ("tokenHash") `);
        // Added in place: rebuilding the table would delete every user with it (their foreign key cascades).
        await queryRunner.query(`ALTER TABLE "organisation" ADD COLUMN "registrationNumber" varchar(60)`);
        await queryRunner.query(`ALTER TABLE "organisation" ADD COLUMN "timeZone" varchar(60) NOT NULL DEFAULT ('Europe/London')`);
    }

    public async down(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`ALTER TABLE "organisation" DROP COLUMN "timeZone"`);
        await queryRunner.query(`ALTER TABLE "organisation" DROP COLUMN "registrationNumber"`);
        await queryRunner.query(`DROP INDEX "IDX_a5465a28f9b179b7f06d1fc3a2"`);
        await queryRunner.query(`DROP INDEX "IDX_2e73f9bf02ad6aab09658c7315"`);
        await queryRunner.query(`DROP TABLE "share_link"`);
        await queryRunner.query(`DROP INDEX "IDX_outgoing_mail_due"`);
        await queryRunner.query(`DROP INDEX "IDX_fd38b56ed4df340a64471d476e"`);
        await queryRunner.query(`DROP TABLE "outgoing_mail"`);
        await queryRunner.query(`DROP TABLE "document_counter"`);
    }

}
