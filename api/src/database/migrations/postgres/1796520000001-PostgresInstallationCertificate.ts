import type { MigrationInterface, QueryRunner } from "typeorm";

/** The electrical installation certificate's columns on PostgreSQL: see InstallationCertificate1796520000000. */
export class PostgresInstallationCertificate1796520000001 implements MigrationInterface {
    name = 'PostgresInstallationCertificate1796520000001'

    public async up(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`ALTER TABLE "circuit" ADD COLUMN "wiringType" character varying(40)`);
        await queryRunner.query(`ALTER TABLE "circuit" ADD COLUMN "deviceBreakingKa" double precision`);
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
