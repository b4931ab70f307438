import type { MigrationInterface, QueryRunner } from "typeorm";

/**
 * Sign-in limits counted in the database, shared by every instance; and the part of a card payment given back when
 * it arrived for more than was owed by then. Written by hand as ADD COLUMN: a rebuild of "payment" would drop
 * columns added beside this one.
 */
export class AttemptsAndRefunds1796481200000 implements MigrationInterface {
    name = 'AttemptsAndRefunds1796481200000'

    public async up(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`CREATE TABLE "attempt_count" ("key" varchar(300) PRIMARY KEY NOT NULL, "attempts" integer NOT NULL, "windowStartedAt" datetime NOT NULL)`);
        await queryRunner.query(`CREATE INDEX "IDX_3370888497071c40b05d4d2edb" ON "attempt_count" ("windowStartedAt") `);
        await queryRunner.query(`ALTER TABLE "payment" ADD COLUMN "refundMinor" integer NOT NULL DEFAULT (0)`);
        await queryRunner.query(`ALTER TABLE "payment" ADD COLUMN "refundedAt" datetime`);
        await queryRunner.query(`ALTER TABLE "payment" ADD COLUMN "refundReference" varchar(255)`);
    }

    public async down(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`ALTER TABLE "payment" DROP COLUMN "refundReference"`);
        await queryRunner.query(`ALTER TABLE "payment" DROP COLUMN "refundedAt"`);
        await queryRunner.query(`ALTER TABLE "payment" DROP COLUMN "refundMinor"`);
        await queryRunner.query(`DROP INDEX "IDX_3370888497071c40b05d4d2edb"`);
        await queryRunner.query(`DROP TABLE "attempt_count"`);
    }
}
