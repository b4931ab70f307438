import type { MigrationInterface, QueryRunner } from "typeorm";

/**
 * Links' performance results (copper to a limit set, fibre to a loss budget), a cable's trace log, its separation
 * from power and fire class, and the tracing caution read once per visit. Written by hand as CREATE TABLE and
 * ADD COLUMN: a rebuild of cable_run or visit would drop columns added beside these.
 */
export class PostgresLinkPerformance1796530000001 implements MigrationInterface {
    name = 'PostgresLinkPerformance1796530000001'

    public async up(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`CREATE TABLE "link_test" ("id" character varying(36) NOT NULL, "organisationId" character varying(36) NOT NULL, "version" integer NOT NULL, "fieldMeta" text NOT NULL, "deletedAt" TIMESTAMP WITH TIME ZONE, "createdById" character varying(36), "updatedById" character varying(36), "createdAt" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "updatedAt" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "visitId" character varying(36) NOT NULL, "siteId" character varying(36) NOT NULL, "cableRunId" character varying(36) NOT NULL, "medium" character varying(40) NOT NULL, "limitSet" character varying(40), "testerMake" character varying(100), "testerModel" character varying(100), "testerSerial" character varying(100), "calibratedOn" character varying(10), "adapter" character varying(100), "insertionLossDb" double precision, "insertionLossMarginDb" double precision, "nextDb" double precision, "nextMarginDb" double precision, "psNextDb" double precision, "psNextMarginDb" double precision, "acrFDb" double precision, "acrFMarginDb" double precision, "psAcrFDb" double precision, "psAcrFMarginDb" double precision, "returnLossDb" double precision, "returnLossMarginDb" double precision, "acrNDb" double precision, "acrNMarginDb" double precision, "psAcrNDb" double precision, "psAcrNMarginDb" double precision, "propagationDelayNs" double precision, "delaySkewNs" double precision, "dcLoopResistanceOhm" double precision, "unbalanceWithinPairOhm" double precision, "unbalanceWithinPairMarginOhm" double precision, "unbalanceBetweenPairsOhm" double precision, "unbalanceBetweenPairsMarginOhm" double precision, "pair12LengthM" double precision, "pair36LengthM" double precision, "pair45LengthM" double precision, "pair78LengthM" double precision, "withinAccuracy" text, "fibreMode" character varying(40), "fibreLengthM" double precision, "connectorPairs" integer, "splices" integer, "firstWavelengthNm" integer, "firstLossDb" double precision, "secondWavelengthNm" integer, "secondLossDb" double precision, "polarity" character varying(40), "endFaces" character varying(40), "testedAt" character varying(30), "recordedAt" character varying(30), "voidedAt" character varying(30), "voidReason" character varying(500), CONSTRAINT "PK_ebe6bf174321bc1acb15d3f3c40" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE INDEX "IDX_link_test_organisation_version" ON "link_test"  ("organisationId", "version") `);
        await queryRunner.query(`CREATE INDEX "IDX_link_test_site" ON "link_test"  ("siteId") `);
        await queryRunner.query(`CREATE INDEX "IDX_link_test_visit" ON "link_test"  ("visitId") `);
        await queryRunner.query(`ALTER TABLE "cable_run" ADD "traceLog" text`);
        await queryRunner.query(`ALTER TABLE "cable_run" ADD "besidePower" boolean`);
        await queryRunner.query(`ALTER TABLE "cable_run" ADD "powerCableKind" character varying(40)`);
        await queryRunner.query(`ALTER TABLE "cable_run" ADD "dataCableKind" character varying(40)`);
        await queryRunner.query(`ALTER TABLE "cable_run" ADD "containment" character varying(40)`);
        await queryRunner.query(`ALTER TABLE "cable_run" ADD "parallelRunM" double precision`);
        await queryRunner.query(`ALTER TABLE "cable_run" ADD "separationMm" double precision`);
        await queryRunner.query(`ALTER TABLE "cable_run" ADD "fireClass" character varying(40)`);
        await queryRunner.query(`ALTER TABLE "visit" ADD "tracingCautionReadAt" character varying(30)`);
    }

    public async down(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`ALTER TABLE "visit" DROP COLUMN "tracingCautionReadAt"`);
        await queryRunner.query(`ALTER TABLE "cable_run" DROP COLUMN "fireClass"`);
        await queryRunner.query(`ALTER TABLE "cable_run" DROP COLUMN "separationMm"`);
        await queryRunner.query(`ALTER TABLE "cable_run" DROP COLUMN "parallelRunM"`);
        await queryRunner.query(`ALTER TABLE "cable_run" DROP COLUMN "containment"`);
        await queryRunner.query(`ALTER TABLE "cable_run" DROP COLUMN "dataCableKind"`);
        await queryRunner.query(`ALTER TABLE "cable_run" DROP COLUMN "powerCableKind"`);
        await queryRunner.query(`ALTER TABLE "cable_run" DROP COLUMN "besidePower"`);
        await queryRunner.query(`ALTER TABLE "cable_run" DROP COLUMN "traceLog"`);
        await queryRunner.query(`DROP INDEX "public"."IDX_link_test_visit"`);
        await queryRunner.query(`DROP INDEX "public"."IDX_link_test_site"`);
        await queryRunner.query(`DROP INDEX "public"."IDX_link_test_organisation_version"`);
        await queryRunner.query(`DROP TABLE "link_test"`);
    }
}
