import type { MigrationInterface, QueryRunner } from "typeorm";

/**
 * The change log's tombstones are compacted after a retention period: each entry records when it was written, and
 * each organisation how far its log has been compacted. Entries already there count from today. Written by hand as
 * ADD COLUMN: a rebuild of sync_change would drop columns added beside this one.
 */
export class ChangeLogCompaction1796550000000 implements MigrationInterface {
    name = 'ChangeLogCompaction1796550000000'

    public async up(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`ALTER TABLE "sync_change" ADD COLUMN "changedAt" datetime`);
        await queryRunner.query(`UPDATE "sync_change" SET "changedAt" = datetime('now')`);
        await queryRunner.query(`CREATE INDEX "IDX_sync_change_tombstone" ON "sync_change" ("deleted", "changedAt") `);
        await queryRunner.query(`CREATE INDEX "IDX_applied_mutation_applied" ON "applied_mutation" ("appliedAt") `);
        await queryRunner.query(`CREATE TABLE "sync_compaction" ("organisationId" varchar(36) PRIMARY KEY NOT NULL, "throughSeq" integer NOT NULL, "compactedAt" datetime NOT NULL)`);
    }

    public async down(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`DROP TABLE "sync_compaction"`);
        await queryRunner.query(`DROP INDEX "IDX_applied_mutation_applied"`);
        await queryRunner.query(`DROP INDEX "IDX_sync_change_tombstone"`);
        await queryRunner.query(`ALTER TABLE "sync_change" DROP COLUMN "changedAt"`);
    }
}
