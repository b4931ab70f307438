import type { MigrationInterface, QueryRunner } from "typeorm";

/**
 * What the minor works judgment needs recorded: a circuit's method of fault protection and the visit it was installed
 * new on, the visit a board was fitted as a replacement on, and a sign-off's structured departures. Added in place,
 * so columns other changes add to these tables are kept.
 */
export class CertificateJudgment1796231000000 implements MigrationInterface {
    name = 'CertificateJudgment1796231000000'

    public async up(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`ALTER TABLE "circuit" ADD COLUMN "faultProtection" varchar(40)`);
        await queryRunner.query(`ALTER TABLE "circuit" ADD COLUMN "newOnVisitId" varchar(36)`);
        await queryRunner.query(`ALTER TABLE "board" ADD COLUMN "replacedOnVisitId" varchar(36)`);
        await queryRunner.query(`ALTER TABLE "visit" ADD COLUMN "departureEntries" text`);
    }

    public async down(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`ALTER TABLE "visit" DROP COLUMN "departureEntries"`);
        await queryRunner.query(`ALTER TABLE "board" DROP COLUMN "replacedOnVisitId"`);
        await queryRunner.query(`ALTER TABLE "circuit" DROP COLUMN "newOnVisitId"`);
        await queryRunner.query(`ALTER TABLE "circuit" DROP COLUMN "faultProtection"`);
    }
}
