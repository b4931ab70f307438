import type { MigrationInterface, QueryRunner } from "typeorm";

/** The PostgreSQL side of ../1796231000000-CertificateJudgment.ts. */
export class PostgresCertificateJudgment1796431000000 implements MigrationInterface {
    name = 'PostgresCertificateJudgment1796431000000'

    public async up(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`ALTER TABLE "circuit" ADD COLUMN "faultProtection" character varying(40)`);
        await queryRunner.query(`ALTER TABLE "circuit" ADD COLUMN "newOnVisitId" character varying(36)`);
        await queryRunner.query(`ALTER TABLE "board" ADD COLUMN "replacedOnVisitId" character varying(36)`);
        await queryRunner.query(`ALTER TABLE "visit" ADD COLUMN "departureEntries" text`);
    }

    public async down(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`ALTER TABLE "visit" DROP COLUMN "departureEntries"`);
        await queryRunner.query(`ALTER TABLE "board" DROP COLUMN "replacedOnVisitId"`);
        await queryRunner.query(`ALTER TABLE "circuit" DROP COLUMN "newOnVisitId"`);
        await queryRunner.query(`ALTER TABLE "circuit" DROP COLUMN "faultProtection"`);
    }
}
