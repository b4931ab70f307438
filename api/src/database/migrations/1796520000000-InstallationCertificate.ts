import type { MigrationInterface, QueryRunner } from "typeorm";

/**
 * The electrical installation certificate: a circuit's type of wiring and breaking capacity, a visit's schedule of
 * inspections, and the particulars the office gave at issue. Added in place, so columns other changes add are kept.
 */
export class InstallationCertificate1796520000000 implements MigrationInterface {
    name = 'InstallationCertificate1796520000000'

    public async up(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`ALTER TABLE "circuit" ADD COLUMN "wiringType" varchar(40)`);
        await queryRunner.query(`ALTER TABLE "circuit" ADD COLUMN "deviceBreakingKa" float`);
        await queryRunner.query(`ALTER TABLE "visit" ADD COLUMN "inspectionMarks" text`);
        await queryRunner.query(`ALTER TABLE "document" ADD COLUMN "particulars" text`);
    }

    public async down(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`ALTER TABLE "document" DROP COLUMN "particulars"`);
        await queryRunner.query(`ALTER TABLE "visit" DROP COLUMN "inspectionMarks"`);
        await queryRunner.query(`ALTER TABLE "circuit" DROP COLUMN "deviceBreakingKa"`);
        await queryRunner.query(`ALTER TABLE "circuit" DROP COLUMN "wiringType"`);
    }
}
