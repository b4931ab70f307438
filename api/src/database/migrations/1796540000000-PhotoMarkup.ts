import type { MigrationInterface, QueryRunner } from "typeorm";

/** Routes drawn over a photo of an open wall: a table of its own, so the photo's row never changes. */
export class PhotoMarkup1796540000000 implements MigrationInterface {
    name = 'PhotoMarkup1796540000000'

    public async up(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`CREATE TABLE "photo_markup" ("id" varchar(36) PRIMARY KEY NOT NULL, "organisationId" varchar(36) NOT NULL, "version" integer NOT NULL, "fieldMeta" text NOT NULL, "deletedAt" datetime, "createdById" varchar(36), "updatedById" varchar(36), "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "updatedAt" datetime NOT NULL DEFAULT (datetime('now')), "photoId" varchar(36) NOT NULL, "visitId" varchar(36) NOT NULL, "siteId" varchar(36) NOT NULL, "areaId" varchar(36), "wallName" varchar(100), "wallWidthMm" float, "wallHeightMm" float, "wallThicknessMm" float, "routes" text, "datums" text, "accessories" text, "recordedAt" varchar(30), "voidedAt" varchar(30), "voidReason" varchar(500))`);
        await queryRunner.query(`CREATE INDEX "IDX_photo_markup_organisation_version" ON "photo_markup" ("organisationId", "version") `);
        await queryRunner.query(`CREATE INDEX "IDX_photo_markup_site" ON "photo_markup" ("siteId") `);
        await queryRunner.query(`CREATE INDEX "IDX_photo_markup_visit" ON "photo_markup" ("visitId") `);
    }

    public async down(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`DROP INDEX "IDX_photo_markup_visit"`);
        await queryRunner.query(`DROP INDEX "IDX_photo_markup_site"`);
        await queryRunner.query(`DROP INDEX "IDX_photo_markup_organisation_version"`);
        await queryRunner.query(`DROP TABLE "photo_markup"`);
    }
}
