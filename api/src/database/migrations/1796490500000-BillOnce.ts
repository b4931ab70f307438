import type { MigrationInterface, QueryRunner } from "typeorm";

/**
 * The part uses a part line adds up, so a visit's parts are invoiced once. Written by hand as ADD COLUMN: a rebuild
 * of "invoice_line" would drop columns added beside this one.
 */
export class BillOnce1796490500000 implements MigrationInterface {
    name = 'BillOnce1796490500000'

    public async up(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`ALTER TABLE "invoice_line" ADD COLUMN "partUseIds" text`);
    }

    public async down(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`ALTER TABLE "invoice_line" DROP COLUMN "partUseIds"`);
    }
}
