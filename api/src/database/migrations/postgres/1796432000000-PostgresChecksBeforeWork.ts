import type { MigrationInterface, QueryRunner } from "typeorm";

/** SQLite's ChecksBeforeWork migration (1796232000000) on PostgreSQL. Checks before breaking into a circuit: a circuit's cable length, and a point change's inputs to the checks. Written by hand so no table is rebuilt. */

const POINT_CHANGE_COLUMNS = [
    `"supplies" character varying(40)`, `"location" character varying(40)`, `"dwelling" boolean`, `"joinR1R2Ohm" double precision`,
    `"ringPoints" integer`, `"ringUnfusedSpurs" integer`, `"spurFeeds" integer`, `"spurFromSpur" boolean`,
    `"designCurrentA" double precision`, `"installationMethod" character varying(40)`, `"ambientFactor" double precision`, `"groupingFactor" double precision`, `"insulationFactor" double precision`,
];

export class PostgresChecksBeforeWork1796432000000 implements MigrationInterface {
    name = 'PostgresChecksBeforeWork1796432000000'

    public async up(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`ALTER TABLE "circuit" ADD COLUMN "lengthM" double precision`);
        for (const column of POINT_CHANGE_COLUMNS) await queryRunner.query(`ALTER TABLE "point_change" ADD COLUMN ${column}`);
    }

    public async down(queryRunner: QueryRunner): Promise<void> {
        for (const column of [...POINT_CHANGE_COLUMNS].reverse()) await queryRunner.query(`ALTER TABLE "point_change" DROP COLUMN ${column.split(' ')[0]}`);
        await queryRunner.query(`ALTER TABLE "circuit" DROP COLUMN "lengthM"`);
    }
}
