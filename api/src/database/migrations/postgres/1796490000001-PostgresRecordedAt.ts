import type { MigrationInterface, QueryRunner } from "typeorm";

const TABLES = ['note', 'circuit', 'cable_run', 'point_change', 'test_result', 'material_line'];

/** When each record was made on the phone, set once there (see the SQLite migration of the same name). */
export class PostgresRecordedAt1796490000001 implements MigrationInterface {
    name = 'PostgresRecordedAt1796490000001'

    public async up(queryRunner: QueryRunner): Promise<void> {
        for (const table of TABLES) await queryRunner.query(`ALTER TABLE "${table}" ADD "recordedAt" character varying(30)`);
    }

    public async down(queryRunner: QueryRunner): Promise<void> {
        for (const table of [...TABLES].reverse()) await queryRunner.query(`ALTER TABLE "${table}" DROP COLUMN "recordedAt"`);
    }
}
