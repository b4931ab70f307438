import type { MigrationInterface, QueryRunner } from "typeorm";

/**
 * Indexes where the query plans on five years of data showed whole-table scans (`npm run bench -- scale`): visits
 * and documents by job, jobs by status in date order, open conflicts, and issued invoices for the aged debt.
 */
export class ListIndexes1796550000010 implements MigrationInterface {
    name = 'ListIndexes1796550000010'

    public async up(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`CREATE INDEX "IDX_job_status_created" ON "job" ("organisationId", "status", "createdAt") `);
        await queryRunner.query(`CREATE INDEX "IDX_visit_job" ON "visit" ("jobId") `);
        await queryRunner.query(`CREATE INDEX "IDX_document_job" ON "document" ("jobId") `);
        await queryRunner.query(`CREATE INDEX "IDX_conflict_open" ON "conflict" ("organisationId", "resolvedAt", "version") `);
        await queryRunner.query(`CREATE INDEX "IDX_invoice_standing" ON "invoice" ("organisationId", "kind", "status") `);
    }

    public async down(queryRunner: QueryRunner): Promise<void> {
        for (const name of ['IDX_invoice_standing', 'IDX_conflict_open', 'IDX_document_job', 'IDX_visit_job', 'IDX_job_status_created']) {
            await queryRunner.query(`DROP INDEX "${name}"`);
        }
    }
}
