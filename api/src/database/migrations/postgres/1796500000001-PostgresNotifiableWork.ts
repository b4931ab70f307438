import type { MigrationInterface, QueryRunner } from "typeorm";

/** The office's record of notifying work under the Building Regulations, and the contractor's nation and scheme. */
export class PostgresNotifiableWork1796500000001 implements MigrationInterface {
    name = 'PostgresNotifiableWork1796500000001'

    public async up(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`CREATE TABLE "building_notification" ("id" character varying(36) NOT NULL, "createdAt" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "updatedAt" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "organisationId" character varying(36) NOT NULL, "jobId" character varying(36) NOT NULL, "state" character varying(30) NOT NULL DEFAULT 'to-notify', "schemeRef" character varying(60), "notifiedOn" character varying(10), "certificateReceivedOn" character varying(10), "updatedByUserId" character varying(36), CONSTRAINT "PK_building_notification" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE UNIQUE INDEX "IDX_building_notification_organisation_job" ON "building_notification" ("organisationId", "jobId") `);
        await queryRunner.query(`ALTER TABLE "organisation" ADD COLUMN "nation" character varying(30) NOT NULL DEFAULT 'england'`);
        await queryRunner.query(`ALTER TABLE "organisation" ADD COLUMN "competentPersonScheme" character varying(100)`);
    }

    public async down(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`ALTER TABLE "organisation" DROP COLUMN "competentPersonScheme"`);
        await queryRunner.query(`ALTER TABLE "organisation" DROP COLUMN "nation"`);
        await queryRunner.query(`DROP INDEX "IDX_building_notification_organisation_job"`);
        await queryRunner.query(`DROP TABLE "building_notification"`);
    }
}
