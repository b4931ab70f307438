import type { MigrationInterface, QueryRunner } from 'typeorm';

/** SQLite's DocumentRevisions migration (1796230000000) on PostgreSQL: revisions and the records a document prints. */
export class PostgresDocumentRevisions1796430000000 implements MigrationInterface {
  name = 'PostgresDocumentRevisions1796430000000';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE "document" ADD COLUMN "supersedesId" character varying(36)`);
    await queryRunner.query(`ALTER TABLE "document" ADD COLUMN "revisionReason" character varying(1000)`);
    await queryRunner.query(`ALTER TABLE "document" ADD COLUMN "supersededAt" character varying(30)`);
    await queryRunner.query(`ALTER TABLE "document" ADD COLUMN "supersededById" character varying(36)`);
    await queryRunner.query(`ALTER TABLE "document" ADD COLUMN "coverage" character varying(40)`);
    await queryRunner.query(
      `CREATE TABLE "printed_record" ("documentId" character varying(36) NOT NULL, "entity" character varying(40) NOT NULL, "rowId" character varying(36) NOT NULL, "organisationId" character varying(36) NOT NULL, CONSTRAINT "PK_19f178cd2b86a4be02859f28161" PRIMARY KEY ("documentId", "entity", "rowId"))`,
    );
    await queryRunner.query(`CREATE INDEX "IDX_printed_record_row" ON "printed_record" ("rowId") `);
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP INDEX "public"."IDX_printed_record_row"`);
    await queryRunner.query(`DROP TABLE "printed_record"`);
    for (const column of ['coverage', 'supersededById', 'supersededAt', 'revisionReason', 'supersedesId']) {
      await queryRunner.query(`ALTER TABLE "document" DROP COLUMN "${column}"`);
    }
  }
}
