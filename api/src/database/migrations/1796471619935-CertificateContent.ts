import type { MigrationInterface, QueryRunner } from "typeorm";

/**
 * What a minor works certificate states beyond the readings: the installation's earthing conductor and main bonding,
 * Zdb at each board, the circuit's device standards, AFDD, reference method, points served and disconnection time,
 * R2 by the long lead and the AFDD's button, and the signer's position, comments and permitted exceptions.
 */

export class CertificateContent1796471619935 implements MigrationInterface {
    name = 'CertificateContent1796471619935'

    public async up(queryRunner: QueryRunner): Promise<void> {
        // Added in place, never by rebuilding a table, so that columns other changes add survive.
        await queryRunner.query(`ALTER TABLE "site" ADD COLUMN "earthingConductor" varchar(40)`);
        await queryRunner.query(`ALTER TABLE "site" ADD COLUMN "bondingWater" varchar(40)`);
        await queryRunner.query(`ALTER TABLE "site" ADD COLUMN "bondingGas" varchar(40)`);
        await queryRunner.query(`ALTER TABLE "site" ADD COLUMN "bondingOil" varchar(40)`);
        await queryRunner.query(`ALTER TABLE "site" ADD COLUMN "bondingSteel" varchar(40)`);
        await queryRunner.query(`ALTER TABLE "site" ADD COLUMN "bondingOther" varchar(40)`);
        await queryRunner.query(`ALTER TABLE "site" ADD COLUMN "bondingOtherWhat" varchar(100)`);
        await queryRunner.query(`ALTER TABLE "board" ADD COLUMN "zdbOhm" float`);
        await queryRunner.query(`ALTER TABLE "circuit" ADD COLUMN "deviceStandard" varchar(40)`);
        await queryRunner.query(`ALTER TABLE "circuit" ADD COLUMN "rcdStandard" varchar(40)`);
        await queryRunner.query(`ALTER TABLE "circuit" ADD COLUMN "rcdRatedCurrentA" float`);
        await queryRunner.query(`ALTER TABLE "circuit" ADD COLUMN "afddStandard" varchar(40)`);
        await queryRunner.query(`ALTER TABLE "circuit" ADD COLUMN "referenceMethod" varchar(20)`);
        await queryRunner.query(`ALTER TABLE "circuit" ADD COLUMN "pointsServed" integer`);
        await queryRunner.query(`ALTER TABLE "circuit" ADD COLUMN "maxDisconnectionS" float`);
        await queryRunner.query(`ALTER TABLE "test_result" ADD COLUMN "r2LeadOhm" float`);
        await queryRunner.query(`ALTER TABLE "test_result" ADD COLUMN "afddButton" varchar(40)`);
        await queryRunner.query(`ALTER TABLE "visit" ADD COLUMN "signedByPosition" varchar(100)`);
        await queryRunner.query(`ALTER TABLE "visit" ADD COLUMN "existingInstallationComments" text`);
        await queryRunner.query(`ALTER TABLE "visit" ADD COLUMN "permittedExceptions" text`);
        await queryRunner.query(`ALTER TABLE "visit" ADD COLUMN "riskAssessmentRef" varchar(200)`);
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
