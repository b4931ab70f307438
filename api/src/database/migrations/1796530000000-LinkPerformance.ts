import type { MigrationInterface, QueryRunner } from "typeorm";

/**
 * Links' performance results (copper to a limit set, fibre to a loss budget), a cable's trace log, its separation
 * from power and fire class, and the tracing caution read once per visit. Written by hand as CREATE TABLE and
 * ADD COLUMN: a rebuild of cable_run or visit would drop columns added beside these.
 */
export class LinkPerformance1796530000000 implements MigrationInterface {
    name = 'LinkPerformance1796530000000'

    public async up(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`CREATE TABLE "link_test" ("id" varchar(36) PRIMARY KEY NOT NULL, "organisationId" varchar(36) NOT NULL, "version" integer NOT NULL, "fieldMeta" text NOT NULL, "deletedAt" datetime, "createdById" varchar(36), "updatedById" varchar(36), "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "updatedAt" datetime NOT NULL DEFAULT (datetime('now')), "visitId" varchar(36) NOT NULL, "siteId" varchar(36) NOT NULL, "cableRunId" varchar(36) NOT NULL, "medium" varchar(40) NOT NULL, "limitSet" varchar(40), "testerMake" varchar(100), "testerModel" varchar(100), "testerSerial" varchar(100), "calibratedOn" varchar(10), "adapter" varchar(100), "insertionLossDb" float, "insertionLossMarginDb" float, "nextDb" float, "nextMarginDb" float, "psNextDb" float, "psNextMarginDb" float, "acrFDb" float, "acrFMarginDb" float, "psAcrFDb" float, "psAcrFMarginDb" float, "returnLossDb" float, "returnLossMarginDb" float, "acrNDb" float, "acrNMarginDb" float, "psAcrNDb" float, "psAcrNMarginDb" float, "propagationDelayNs" float, "delaySkewNs" float, "dcLoopResistanceOhm" float, "unbalanceWithinPairOhm" float, "unbalanceWithinPairMarginOhm" float, "unbalanceBetweenPairsOhm" float, "unbalanceBetweenPairsMarginOhm" float, "pair12LengthM" float, "pair36LengthM" float, "pair45LengthM" float, "pair78LengthM" float, "withinAccuracy" text, "fibreMode" varchar(40), "fibreLengthM" float, "connectorPairs" integer, "splices" integer, "firstWavelengthNm" integer, "firstLossDb" float, "secondWavelengthNm" integer, "secondLossDb" float, "polarity" varchar(40), "endFaces" varchar(40), "testedAt" varchar(30), "recordedAt" varchar(30), "voidedAt" varchar(30), "voidReason" varchar(500))`);
        await queryRunner.query(`CREATE INDEX "IDX_link_test_organisation_version" ON "link_test" ("organisationId", "version") `);
        await queryRunner.query(`CREATE INDEX "IDX_link_test_site" ON "link_test" ("siteId") `);
        await queryRunner.query(`CREATE INDEX "IDX_link_test_visit" ON "link_test" ("visitId") `);
        await queryRunner.query(`ALTER TABLE "cable_run" ADD COLUMN "traceLog" text`);
        await queryRunner.query(`ALTER TABLE "cable_run" ADD COLUMN "besidePower" boolean`);
        await queryRunner.query(`ALTER TABLE "cable_run" ADD COLUMN "powerCableKind" varchar(40)`);
        await queryRunner.query(`ALTER TABLE "cable_run" ADD COLUMN "dataCableKind" varchar(40)`);
        await queryRunner.query(`ALTER TABLE "cable_run" ADD COLUMN "containment" varchar(40)`);
        await queryRunner.query(`ALTER TABLE "cable_run" ADD COLUMN "parallelRunM" float`);
        await queryRunner.query(`ALTER TABLE "cable_run" ADD COLUMN "separationMm" float`);
        await queryRunner.query(`ALTER TABLE "cable_run" ADD COLUMN "fireClass" varchar(40)`);
        await queryRunner.query(`ALTER TABLE "visit" ADD COLUMN "tracingCautionReadAt" varchar(30)`);
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
        await queryRunner.query(`DROP INDEX "IDX_link_test_visit"`);
        await queryRunner.query(`DROP INDEX "IDX_link_test_site"`);
        await queryRunner.query(`DROP INDEX "IDX_link_test_organisation_version"`);
        await queryRunner.query(`DROP TABLE "link_test"`);
    }
}
