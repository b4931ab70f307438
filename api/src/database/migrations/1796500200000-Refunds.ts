import type { MigrationInterface, QueryRunner } from "typeorm";

/** Money the office gives back to customers on an invoice: by hand, or to a card through the provider. */
export class Refunds1796500200000 implements MigrationInterface {
    name = 'Refunds1796500200000'

    public async up(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`CREATE TABLE "refund" ("id" varchar(36) PRIMARY KEY NOT NULL, "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "updatedAt" datetime NOT NULL DEFAULT (datetime('now')), "organisationId" varchar(36) NOT NULL, "invoiceId" varchar(36) NOT NULL, "amountMinor" integer NOT NULL, "method" varchar(20) NOT NULL, "paymentId" varchar(36), "refundedOn" varchar(10) NOT NULL, "reference" varchar(255), "note" varchar(500), "state" varchar(10) NOT NULL, "failure" varchar(500), "requestId" varchar(36), "recordedById" varchar(36) NOT NULL)`);
        await queryRunner.query(`CREATE INDEX "IDX_refund_invoice" ON "refund" ("invoiceId") `);
        await queryRunner.query(`CREATE UNIQUE INDEX "IDX_refund_request" ON "refund" ("organisationId", "requestId") `);
    }

    public async down(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`DROP INDEX "IDX_refund_request"`);
        await queryRunner.query(`DROP INDEX "IDX_refund_invoice"`);
        await queryRunner.query(`DROP TABLE "refund"`);
    }
}
