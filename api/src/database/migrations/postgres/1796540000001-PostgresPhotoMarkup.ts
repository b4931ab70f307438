import type { MigrationInterface, QueryRunner } from "typeorm";

/** Routes drawn over a photo of an open wall (see the SQLite migration of the same name). */
export class PostgresPhotoMarkup1796540000001 implements MigrationInterface {
    name = 'PostgresPhotoMarkup1796540000001'

    public async up(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`CREATE TABLE "photo_markup" ("id" character varying(36) NOT NULL, "organisationId" character varying(36) NOT NULL, "version" integer NOT NULL, "fieldMeta" text NOT NULL, "deletedAt" TIMESTAMP WITH TIME ZONE, "createdById" character varying(36), "updatedById" character varying(36), "createdAt" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "updatedAt" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "photoId" character varying(36) NOT NULL, "visitId" character varying(36) NOT NULL, "siteId" character varying(36) NOT NULL, "areaId" character varying(36), "wallName" character varying(100), "wallWidthMm" double precision, "wallHeightMm" double precision, "wallThicknessMm" double precision, "routes" text, "datums" text, "accessories" text, "recordedAt" character varying(30), "voidedAt" character varying(30), "voidReason" character varying(500), CONSTRAINT "PK_2a4967fea2c317ebfb74605af3e" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE INDEX "IDX_photo_markup_organisation_version" ON "photo_markup" ("organisationId", "version") `);
        await queryRunner.query(`CREATE INDEX "IDX_photo_markup_site" ON "photo_markup" ("siteId") `);
        await queryRunner.query(`CREATE INDEX "IDX_photo_markup_visit" ON "photo_markup" ("visitId") `);
    }

    public async down(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`DROP INDEX "public"."IDX_photo_markup_visit"`);
        await queryRunner.query(`DROP INDEX "public"."IDX_photo_markup_site"`);
        await queryRunner.query(`DROP INDEX "public"."IDX_photo_markup_organisation_version"`);
        await queryRunner.query(`DROP TABLE "photo_markup"`);
    }
}
