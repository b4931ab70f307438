import type { MigrationInterface, QueryRunner } from "typeorm";

/** The part uses a part line adds up, so a visit's parts are invoiced once. */
export class PostgresBillOnce1796490500001 implements MigrationInterface {
    name = 'PostgresBillOnce1796490500001'

    public async up(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`ALTER TABLE "invoice_line" ADD COLUMN "partUseIds" text`);
    }

    public async down(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`ALTER TABLE "invoice_line" DROP COLUMN "partUseIds"`);
    }
}
