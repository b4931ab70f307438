import type { MigrationInterface, QueryRunner } from "typeorm";

/** The change log's tombstones compacted after a retention period (see the SQLite migration of the same name). */
export class PostgresChangeLogCompaction1796550000001 implements MigrationInterface {
    name = 'PostgresChangeLogCompaction1796550000001'

    public async up(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`ALTER TABLE "sync_change" ADD "changedAt" TIMESTAMP WITH TIME ZONE`);
        await queryRunner.query(`UPDATE "sync_change" SET "changedAt" = now()`);
        await queryRunner.query(`CREATE INDEX "IDX_sync_change_tombstone" ON "sync_change" ("deleted", "changedAt") `);
        await queryRunner.query(`CREATE INDEX "IDX_applied_mutation_applied" ON "applied_mutation" ("appliedAt") `);
        await queryRunner.query(`CREATE TABLE "sync_compaction" ("organisationId" character varying(36) NOT NULL, "throughSeq" integer NOT NULL, "compactedAt" TIMESTAMP WITH TIME ZONE NOT NULL, CONSTRAINT "PK_0c9e3edc603135888346fff0e77" PRIMARY KEY ("organisationId"))`);
    }

    public async down(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`DROP TABLE "sync_compaction"`);
        await queryRunner.query(`DROP INDEX "public"."IDX_applied_mutation_applied"`);
        await queryRunner.query(`DROP INDEX "public"."IDX_sync_change_tombstone"`);
        await queryRunner.query(`ALTER TABLE "sync_change" DROP COLUMN "changedAt"`);
    }
}
