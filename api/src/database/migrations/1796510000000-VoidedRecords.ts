import type { MigrationInterface, QueryRunner } from "typeorm";

const VOIDABLE = ['photo', 'note', 'cable_run', 'point_change', 'test_result'];

/**
 * Records made by mistake are voided with a reason, not deleted; an insulation reading may be over the tester's
 * range. Written by hand as ADD COLUMN: a rebuild of these tables would drop columns added beside these.
 */
export class VoidedRecords1796510000000 implements MigrationInterface {
    name = 'VoidedRecords1796510000000'

    public async up(queryRunner: QueryRunner): Promise<void> {
        for (const table of VOIDABLE) {
            await queryRunner.query(`ALTER TABLE "${table}" ADD COLUMN "voidedAt" varchar(30)`);
            await queryRunner.query(`ALTER TABLE "${table}" ADD COLUMN "voidReason" varchar(500)`);
        }
        await queryRunner.query(`ALTER TABLE "test_result" ADD COLUMN "irLiveLiveOverRange" boolean`);
        await queryRunner.query(`ALTER TABLE "test_result" ADD COLUMN "irLiveEarthOverRange" boolean`);
    }

    public async down(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`ALTER TABLE "test_result" DROP COLUMN "irLiveEarthOverRange"`);
        await queryRunner.query(`ALTER TABLE "test_result" DROP COLUMN "irLiveLiveOverRange"`);
        for (const table of [...VOIDABLE].reverse()) {
            await queryRunner.query(`ALTER TABLE "${table}" DROP COLUMN "voidReason"`);
            await queryRunner.query(`ALTER TABLE "${table}" DROP COLUMN "voidedAt"`);
        }
    }
}
