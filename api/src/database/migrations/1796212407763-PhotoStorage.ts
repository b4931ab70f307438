import type { MigrationInterface, QueryRunner } from "typeorm";

/**
 * Photo bytes: one photo_blob row per photo an organisation holds (by sha256), and the organisation's photo settings.
 * SQLite cannot alter a column list in place, so the organisation table is rebuilt; TypeORM turns foreign keys off
 * while migrations run, so its users are untouched.
 */

export class PhotoStorage1796212407763 implements MigrationInterface {
    name = 'PhotoStorage1796212407763'

    public async up(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`CREATE TABLE "photo_blob" ("organisationId" varchar(36) NOT NULL, "sha256" varchar(64) NOT NULL, "mime" varchar(40) NOT NULL, "bytes" integer NOT NULL, "width" integer NOT NULL, "height" integer NOT NULL, "createdAt" datetime NOT NULL DEFAULT (datetime('now')), PRIMARY KEY ("organisationId", "sha256"))`);
        await queryRunner.query(`CREATE TABLE "temporary_organisation" ("id" varchar(36) PRIMARY KEY NOT NULL, "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "updatedAt" datetime NOT NULL DEFAULT (datetime('now')), "name" varchar(200) NOT NULL, "address" varchar(500), "phone" varchar(50), "email" varchar(254), "photoTags" text NOT NULL DEFAULT ('[]'), "keepPhotoLocation" boolean NOT NULL DEFAULT (0))`);
        await queryRunner.query(`INSERT INTO "temporary_organisation"("id", "createdAt", "updatedAt", "name", "address", "phone", "email") SELECT "id", "createdAt", "updatedAt", "name", "address", "phone", "email" FROM "organisation"`);
        await queryRunner.query(`DROP TABLE "organisation"`);
        await queryRunner.query(`ALTER TABLE "temporary_organisation" RENAME TO "organisation"`);
    }

    public async down(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`ALTER TABLE "organisation" RENAME TO "temporary_organisation"`);
        await queryRunner.query(`CREATE TABLE "organisation" ("id" varchar(36) PRIMARY KEY NOT NULL, "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "updatedAt" datetime NOT NULL DEFAULT (datetime('now')), "name" varchar(200) NOT NULL, "address" varchar(500), "phone" varchar(50), "email" varchar(254))`);
        await queryRunner.query(`INSERT INTO "organisation"("id", "createdAt", "updatedAt", "name", "address", "phone", "email") SELECT "id", "createdAt", "updatedAt", "name", "address", "phone", "email" FROM "temporary_organisation"`);
        await queryRunner.query(`DROP TABLE "temporary_organisation"`);
        await queryRunner.query(`DROP TABLE "photo_blob"`);
    }
}
