import type { MigrationInterface, QueryRunner } from "typeorm";

const VOIDABLE = ['photo', 'note', 'cable_run', 'point_change', 'test_result'];

/** Records voided with a reason, and insulation over the tester's range (see the SQLite migration of the same name). */
export class PostgresVoidedRecords1796510000001 implements MigrationInterface {
    name = 'PostgresVoidedRecords1796510000001'

    public async up(queryRunner: QueryRunner): Promise<void> {
        for (const table of VOIDABLE) {
            await queryRunner.query(`ALTER TABLE "${table}" ADD "voidedAt" character varying(30)`);
            await queryRunner.query(`ALTER TABLE "${table}" ADD "voidReason" character varying(500)`);
        }
        await queryRunner.query(`ALTER TABLE "test_result" ADD "irLiveLiveOverRange" boolean`);
        await queryRunner.query(`ALTER TABLE "test_result" ADD "irLiveEarthOverRange" boolean`);
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
