import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * Revisions of issued documents and the records each one prints, which its lock holds. Written by hand as ADD
 * COLUMN and CREATE TABLE: a generated rebuild of "document" would drop columns added beside these.
 */
export class DocumentRevisions1796230000000 implements MigrationInterface {
  name = 'DocumentRevisions1796230000000';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE "document" ADD COLUMN "supersedesId" varchar(36)`);
    await queryRunner.query(`ALTER TABLE "document" ADD COLUMN "revisionReason" varchar(1000)`);
    await queryRunner.query(`ALTER TABLE "document" ADD COLUMN "supersededAt" varchar(30)`);
    await queryRunner.query(`ALTER TABLE "document" ADD COLUMN "supersededById" varchar(36)`);
    await queryRunner.query(`ALTER TABLE "document" ADD COLUMN "coverage" varchar(40)`);
    await queryRunner.query(
      `CREATE TABLE "printed_record" ("documentId" varchar(36) NOT NULL, "entity" varchar(40) NOT NULL, "rowId" varchar(36) NOT NULL, "organisationId" varchar(36) NOT NULL, PRIMARY KEY ("documentId", "entity", "rowId"))`,
    );
    await queryRunner.query(`CREATE INDEX "IDX_printed_record_row" ON "printed_record" ("rowId") `);
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP INDEX "IDX_printed_record_row"`);
    await queryRunner.query(`DROP TABLE "printed_record"`);
    for (const column of ['coverage', 'supersededById', 'supersededAt', 'revisionReason', 'supersedesId']) {
      await queryRunner.query(`ALTER TABLE "document" DROP COLUMN "${column}"`);
    }
  }
}
