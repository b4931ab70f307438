import type { MigrationInterface, QueryRunner } from "typeorm";

/**
 * A copy-to address on outgoing mail, and the several documents one e-mail can carry. Written by hand as ADD COLUMN:
 * a rebuild of "outgoing_mail" would drop columns added beside these.
 */
export class MailCopies1796500300000 implements MigrationInterface {
    name = 'MailCopies1796500300000'

    public async up(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`ALTER TABLE "outgoing_mail" ADD COLUMN "ccAddress" varchar(254)`);
        await queryRunner.query(`ALTER TABLE "outgoing_mail" ADD COLUMN "subjectIds" text`);
    }

    public async down(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`ALTER TABLE "outgoing_mail" DROP COLUMN "subjectIds"`);
        await queryRunner.query(`ALTER TABLE "outgoing_mail" DROP COLUMN "ccAddress"`);
    }
}
