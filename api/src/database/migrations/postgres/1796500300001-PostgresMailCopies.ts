import type { MigrationInterface, QueryRunner } from "typeorm";

/** A copy-to address on outgoing mail, and the several documents one e-mail can carry. */
export class PostgresMailCopies1796500300001 implements MigrationInterface {
    name = 'PostgresMailCopies1796500300001'

    public async up(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`ALTER TABLE "outgoing_mail" ADD COLUMN "ccAddress" character varying(254)`);
        await queryRunner.query(`ALTER TABLE "outgoing_mail" ADD COLUMN "subjectIds" text`);
    }

    public async down(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`ALTER TABLE "outgoing_mail" DROP COLUMN "subjectIds"`);
        await queryRunner.query(`ALTER TABLE "outgoing_mail" DROP COLUMN "ccAddress"`);
    }
}
