import type { MigrationInterface, QueryRunner } from "typeorm";

/** Indexes where the query plans on five years of data showed scans (see the SQLite migration of the same name). */
export class PostgresListIndexes1796550000011 implements MigrationInterface {
    name = 'PostgresListIndexes1796550000011'

    public async up(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`CREATE INDEX "IDX_job_status_created" ON "job" ("organisationId", "status", "createdAt") `);
        await queryRunner.query(`CREATE INDEX "IDX_visit_job" ON "visit" ("jobId") `);
        await queryRunner.query(`CREATE INDEX "IDX_document_job" ON "document" ("jobId") `);
        await queryRunner.query(`CREATE INDEX "IDX_conflict_open" ON "conflict" ("organisationId", "resolvedAt", "version") `);
        await queryRunner.query(`CREATE INDEX "IDX_invoice_standing" ON "invoice" ("organisationId", "kind", "status") `);
    }

    public async down(queryRunner: QueryRunner): Promise<void> {
        for (const name of ['IDX_invoice_standing', 'IDX_conflict_open', 'IDX_document_job', 'IDX_visit_job', 'IDX_job_status_created']) {
            await queryRunner.query(`DROP INDEX "public"."${name}"`);
        }
    }
}
