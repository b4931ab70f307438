import type { MigrationInterface, QueryRunner } from "typeorm";

const TABLES = ['note', 'circuit', 'cable_run', 'point_change', 'test_result', 'material_line'];

/**
 * When each record was made on the phone, set once there, so that a trail keeps the order of the day after a sync.
 * Written by hand as ADD COLUMN: a rebuild of these tables would drop columns added beside this one.
 */
export class RecordedAt1796490000000 implements MigrationInterface {
    name = 'RecordedAt1796490000000'

    public async up(queryRunner: QueryRunner): Promise<void> {
        for (const table of TABLES) await queryRunner.query(`ALTER TABLE "${table}" ADD COLUMN "recordedAt" varchar(30)`);
    }

    public async down(queryRunner: QueryRunner): Promise<void> {
        for (const table of [...TABLES].reverse()) await queryRunner.query(`ALTER TABLE "${table}" DROP COLUMN "recordedAt"`);
    }
}
