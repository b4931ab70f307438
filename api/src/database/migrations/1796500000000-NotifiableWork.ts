import type { MigrationInterface, QueryRunner } from "typeorm";

/**
 * The office's record of notifying work under the Building Regulations, and the nation and scheme the contractor works
 * under. Written by hand: an ADD COLUMN leaves alone columns other changes add to "organisation".
 */
export class NotifiableWork1796500000000 implements MigrationInterface {
    name = 'NotifiableWork1796500000000'

    public async up(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`CREATE TABLE "building_notification" ("id" varchar(36) PRIMARY KEY NOT NULL, "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "updatedAt" datetime NOT NULL DEFAULT (datetime('now')), "organisationId" varchar(36) NOT NULL, "jobId" varchar(36) NOT NULL, "state" varchar(30) NOT NULL DEFAULT ('to-notify'), "schemeRef" varchar(60), "notifiedOn" varchar(10), "certificateReceivedOn" varchar(10), "updatedByUserId" varchar(36))`);
        await queryRunner.query(`CREATE UNIQUE INDEX "IDX_building_notification_organisation_job" ON "building_notification" ("organisationId", "jobId") `);
        await queryRunner.query(`ALTER TABLE "organisation" ADD COLUMN "nation" varchar(30) NOT NULL DEFAULT ('england')`);
        await queryRunner.query(`ALTER TABLE "organisation" ADD COLUMN "competentPersonScheme" varchar(100)`);
    }

    public async down(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`ALTER TABLE "organisation" DROP COLUMN "competentPersonScheme"`);
        await queryRunner.query(`ALTER TABLE "organisation" DROP COLUMN "nation"`);
        await queryRunner.query(`DROP INDEX "IDX_building_notification_organisation_job"`);
        await queryRunner.query(`DROP TABLE "building_notification"`);
    }
}
