import type { MigrationInterface, QueryRunner } from "typeorm";

/**
 * SQLite's CertificateContent migration (1796471619935) on PostgreSQL.
 */

export class PostgresCertificateContent1796471619935 implements MigrationInterface {
    name = 'PostgresCertificateContent1796471619935'

    public async up(queryRunner: QueryRunner): Promise<void> {
        // Added in place, never by rebuilding a table, so that columns other changes add survive.
        await queryRunner.query(`ALTER TABLE "site" ADD COLUMN "earthingConductor" character varying(40)`);
        await queryRunner.query(`ALTER TABLE "site" ADD COLUMN "bondingWater" character varying(40)`);
        await queryRunner.query(`ALTER TABLE "site" ADD COLUMN "bondingGas" character varying(40)`);
        await queryRunner.query(`ALTER TABLE "site" ADD COLUMN "bondingOil" character varying(40)`);
        await queryRunner.query(`ALTER TABLE "site" ADD COLUMN "bondingSteel" character varying(40)`);
        await queryRunner.query(`ALTER TABLE "site" ADD COLUMN "bondingOther" character varying(40)`);
        await queryRunner.query(`ALTER TABLE "site" ADD COLUMN "bondingOtherWhat" character varying(100)`);
        await queryRunner.query(`ALTER TABLE "board" ADD COLUMN "zdbOhm" double precision`);
        await queryRunner.query(`ALTER TABLE "circuit" ADD COLUMN "deviceStandard" character varying(40)`);
        await queryRunner.query(`ALTER TABLE "circuit" ADD COLUMN "rcdStandard" character varying(40)`);
        await queryRunner.query(`ALTER TABLE "circuit" ADD COLUMN "rcdRatedCurrentA" double precision`);
        await queryRunner.query(`ALTER TABLE "circuit" ADD COLUMN "afddStandard" character varying(40)`);
        await queryRunner.query(`ALTER TABLE "circuit" ADD COLUMN "referenceMethod" character varying(20)`);
        await queryRunner.query(`ALTER TABLE "circuit" ADD COLUMN "pointsServed" integer`);
        await queryRunner.query(`ALTER TABLE "circuit" ADD COLUMN "maxDisconnectionS" double precision`);
        await queryRunner.query(`ALTER TABLE "test_result" ADD COLUMN "r2LeadOhm" double precision`);
        await queryRunner.query(`ALTER TABLE "test_result" ADD COLUMN "afddButton" character varying(40)`);
        await queryRunner.query(`ALTER TABLE "visit" ADD COLUMN "signedByPosition" character varying(100)`);
        await queryRunner.query(`ALTER TABLE "visit" ADD COLUMN "existingInstallationComments" text`);
        await queryRunner.query(`ALTER TABLE "visit" ADD COLUMN "permittedExceptions" text`);
        await queryRunner.query(`ALTER TABLE "visit" ADD COLUMN "riskAssessmentRef" character varying(200)`);
    }

    public async down(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`ALTER TABLE "visit" DROP COLUMN "riskAssessmentRef"`);
        await queryRunner.query(`ALTER TABLE "visit" DROP COLUMN "permittedExceptions"`);
        await queryRunner.query(`ALTER TABLE "visit" DROP COLUMN "existingInstallationComments"`);
        await queryRunner.query(`ALTER TABLE "visit" DROP COLUMN "signedByPosition"`);
        await queryRunner.query(`ALTER TABLE "test_result" DROP COLUMN "afddButton"`);
        await queryRunner.query(`ALTER TABLE "test_result" DROP COLUMN "r2LeadOhm"`);
        await queryRunner.query(`ALTER TABLE "circuit" DROP COLUMN "maxDisconnectionS"`);
        await queryRunner.query(`ALTER TABLE "circuit" DROP COLUMN "pointsServed"`);
        await queryRunner.query(`ALTER TABLE "circuit" DROP COLUMN "referenceMethod"`);
        await queryRunner.query(`ALTER TABLE "circuit" DROP COLUMN "afddStandard"`);
        await queryRunner.query(`ALTER TABLE "circuit" DROP COLUMN "rcdRatedCurrentA"`);
        await queryRunner.query(`ALTER TABLE "circuit" DROP COLUMN "rcdStandard"`);
        await queryRunner.query(`ALTER TABLE "circuit" DROP COLUMN "deviceStandard"`);
        await queryRunner.query(`ALTER TABLE "board" DROP COLUMN "zdbOhm"`);
        await queryRunner.query(`ALTER TABLE "site" DROP COLUMN "bondingOtherWhat"`);
        await queryRunner.query(`ALTER TABLE "site" DROP COLUMN "bondingOther"`);
        await queryRunner.query(`ALTER TABLE "site" DROP COLUMN "bondingSteel"`);
        await queryRunner.query(`ALTER TABLE "site" DROP COLUMN "bondingOil"`);
        await queryRunner.query(`ALTER TABLE "site" DROP COLUMN "bondingGas"`);
        await queryRunner.query(`ALTER TABLE "site" DROP COLUMN "bondingWater"`);
        await queryRunner.query(`ALTER TABLE "site" DROP COLUMN "earthingConductor"`);
    }
}
