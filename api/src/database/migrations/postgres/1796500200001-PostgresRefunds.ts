import type { MigrationInterface, QueryRunner } from "typeorm";

/** Money the office gives back to customers on an invoice: by hand, or to a card through the provider. */
export class PostgresRefunds1796500200001 implements MigrationInterface {
    name = 'PostgresRefunds1796500200001'

    public async up(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`CREATE TABLE "refund" ("id" character varying(36) NOT NULL, "createdAt" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "updatedAt" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "organisationId" character varying(36) NOT NULL, "invoiceId" character varying(36) NOT NULL, "amountMinor" integer NOT NULL, "method" character varying(20) NOT NULL, "paymentId" character varying(36), "refundedOn" character varying(10) NOT NULL, "reference" character varying(255), "note" character varying(500), "state" character varying(10) NOT NULL, "failure" character varying(500), "requestId" character varying(36), "recordedById" character varying(36) NOT NULL, CONSTRAINT "PK_f1cefa2e60d99b206c46c1116e5" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE INDEX "IDX_refund_invoice" ON "refund" ("invoiceId") `);
        await queryRunner.query(`CREATE UNIQUE INDEX "IDX_refund_request" ON "refund" ("organisationId", "requestId") `);
    }

    public async down(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`DROP INDEX "public"."IDX_refund_request"`);
        await queryRunner.query(`DROP INDEX "public"."IDX_refund_invoice"`);
        await queryRunner.query(`DROP TABLE "refund"`);
    }
}
