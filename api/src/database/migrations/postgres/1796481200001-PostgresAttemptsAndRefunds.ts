import type { MigrationInterface, QueryRunner } from "typeorm";

/** Sign-in limits counted in the database, and refunds of card payments that arrived for more than was owed. */
export class PostgresAttemptsAndRefunds1796481200001 implements MigrationInterface {
    name = 'PostgresAttemptsAndRefunds1796481200001'

    public async up(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`CREATE TABLE "attempt_count" ("key" character varying(300) NOT NULL, "attempts" integer NOT NULL, "windowStartedAt" TIMESTAMP WITH TIME ZONE NOT NULL, CONSTRAINT "PK_d55e0b78f2443485f32f9eb3f9e" PRIMARY KEY ("key"))`);
        await queryRunner.query(`CREATE INDEX "IDX_3370888497071c40b05d4d2edb" ON "attempt_count" ("windowStartedAt") `);
        await queryRunner.query(`ALTER TABLE "payment" ADD "refundMinor" integer NOT NULL DEFAULT '0'`);
        await queryRunner.query(`ALTER TABLE "payment" ADD "refundedAt" TIMESTAMP WITH TIME ZONE`);
        await queryRunner.query(`ALTER TABLE "payment" ADD "refundReference" character varying(255)`);
    }

    public async down(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`ALTER TABLE "payment" DROP COLUMN "refundReference"`);
        await queryRunner.query(`ALTER TABLE "payment" DROP COLUMN "refundedAt"`);
        await queryRunner.query(`ALTER TABLE "payment" DROP COLUMN "refundMinor"`);
        await queryRunner.query(`DROP INDEX "public"."IDX_3370888497071c40b05d4d2edb"`);
        await queryRunner.query(`DROP TABLE "attempt_count"`);
    }
}
