import type { MigrationInterface, QueryRunner } from "typeorm";

/** Checks before breaking into a circuit: a circuit's cable length, and a point change's inputs to the checks. Written by hand so no table is rebuilt. */

const POINT_CHANGE_COLUMNS = [
    `"supplies" varchar(40)`, `"location" varchar(40)`, `"dwelling" boolean`, `"joinR1R2Ohm" float`,
    `"ringPoints" integer`, `"ringUnfusedSpurs" integer`, `"spurFeeds" integer`, `"spurFromSpur" boolean`,
    `"designCurrentA" float`, `"installationMethod" varchar(40)`, `"ambientFactor" float`, `"groupingFactor" float`, `"insulationFactor" float`,
];

export class ChecksBeforeWork1796232000000 implements MigrationInterface {
    name = 'ChecksBeforeWork1796232000000'

    public async up(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`ALTER TABLE "circuit" ADD COLUMN "lengthM" float`);
        for (const column of POINT_CHANGE_COLUMNS) await queryRunner.query(`ALTER TABLE "point_change" ADD COLUMN ${column}`);
    }

    public async down(queryRunner: QueryRunner): Promise<void> {
        for (const column of [...POINT_CHANGE_COLUMNS].reverse()) await queryRunner.query(`ALTER TABLE "point_change" DROP COLUMN ${column.split(' ')[0]}`);
        await queryRunner.query(`ALTER TABLE "circuit" DROP COLUMN "lengthM"`);
    }
}
