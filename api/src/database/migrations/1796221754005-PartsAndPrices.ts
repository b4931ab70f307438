import type { MigrationInterface, QueryRunner } from "typeorm";

/** The organisation's price list, synced to phones, and the parts used on each visit. */

export class PartsAndPrices1796221754005 implements MigrationInterface {
    name = 'PartsAndPrices1796221754005'

    public async up(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`CREATE TABLE "price_item" ("id" varchar(36) PRIMARY KEY NOT NULL, "organisationId" varchar(36) NOT NULL, "version" integer NOT NULL, "fieldMeta" text NOT NULL, "deletedAt" datetime, "createdById" varchar(36), "updatedById" varchar(36), "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "updatedAt" datetime NOT NULL DEFAULT (datetime('now')), "name" varchar(200) NOT NULL, "unit" varchar(20) NOT NULL, "category" varchar(60), "code" varchar(40), "costMinor" integer, "sellMinor" integer, "vatRateCode" varchar(20), "active" boolean)`);
        await queryRunner.query(`CREATE INDEX "IDX_price_item_organisation_version" ON "price_item" ("organisationId", "version") `);
        await queryRunner.query(`CREATE TABLE "material_line" ("id" varchar(36) PRIMARY KEY NOT NULL, "organisationId" varchar(36) NOT NULL, "version" integer NOT NULL, "fieldMeta" text NOT NULL, "deletedAt" datetime, "createdById" varchar(36), "updatedById" varchar(36), "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "updatedAt" datetime NOT NULL DEFAULT (datetime('now')), "visitId" varchar(36) NOT NULL, "siteId" varchar(36) NOT NULL, "priceItemId" varchar(36), "description" varchar(200) NOT NULL, "quantity" float NOT NULL, "unit" varchar(20))`);
        await queryRunner.query(`CREATE INDEX "IDX_material_line_organisation_version" ON "material_line" ("organisationId", "version") `);
        await queryRunner.query(`CREATE INDEX "IDX_material_line_site" ON "material_line" ("siteId") `);
        await queryRunner.query(`CREATE INDEX "IDX_material_line_visit" ON "material_line" ("visitId") `);
    }

    public async down(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`DROP INDEX "IDX_material_line_visit"`);
        await queryRunner.query(`DROP INDEX "IDX_material_line_site"`);
        await queryRunner.query(`DROP INDEX "IDX_material_line_organisation_version"`);
        await queryRunner.query(`DROP TABLE "material_line"`);
        await queryRunner.query(`DROP INDEX "IDX_price_item_organisation_version"`);
        await queryRunner.query(`DROP TABLE "price_item"`);
    }

}
