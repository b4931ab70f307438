import { UK_VAT_RATES } from "@wiretrail/core";
import type { MigrationInterface, QueryRunner } from "typeorm";
import { v7 as uuidv7 } from "uuid";

/** SQLite's Billing migration (1796223023465) on PostgreSQL: rates, terms, quotes, invoices, credit notes, payments. */

export class PostgresBilling1796424218562 implements MigrationInterface {
    name = 'PostgresBilling1796424218562'

    public async up(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`CREATE TABLE "card_checkout" ("id" character varying(36) NOT NULL, "createdAt" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "updatedAt" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "organisationId" character varying(36) NOT NULL, "invoiceId" character varying(36) NOT NULL, "sessionId" character varying(255) NOT NULL, "amountMinor" integer NOT NULL, "state" character varying(10) NOT NULL, "shareLinkId" character varying(36) NOT NULL, CONSTRAINT "PK_aad1fed42f941c41ff01ddd118c" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE INDEX "IDX_8e1f780d45579e431246a5f387" ON "card_checkout"  ("invoiceId") `);
        await queryRunner.query(`CREATE UNIQUE INDEX "IDX_546a15a5bd89539cf2bcdfebc5" ON "card_checkout"  ("sessionId") `);
        await queryRunner.query(`CREATE TABLE "payment_event" ("eventId" character varying(255) NOT NULL, "type" character varying(100) NOT NULL, "organisationId" character varying(36), "outcome" character varying(300) NOT NULL, "receivedAt" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "PK_d3c49b781c2bdd347d6412cc3d0" PRIMARY KEY ("eventId"))`);
        await queryRunner.query(`CREATE TABLE "invoice" ("id" character varying(36) NOT NULL, "createdAt" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "updatedAt" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "organisationId" character varying(36) NOT NULL, "jobId" character varying(36) NOT NULL, "kind" character varying(20) NOT NULL, "status" character varying(10) NOT NULL DEFAULT 'draft', "number" character varying(40), "creditsInvoiceId" character varying(36), "fromQuoteId" character varying(36), "termDays" integer NOT NULL, "notes" character varying(2000), "issueDate" character varying(10), "dueDate" character varying(10), "issuedAt" TIMESTAMP WITH TIME ZONE, "issuedById" character varying(36), "netMinor" integer NOT NULL DEFAULT '0', "vatMinor" integer NOT NULL DEFAULT '0', "grossMinor" integer NOT NULL DEFAULT '0', "vatNumber" character varying(20), "terms" character varying(1000), "paymentInstructions" character varying(1000), "pdfSha256" character varying(64), "pdfBytes" integer, "emailState" character varying(10), "emailedTo" character varying(254), "emailedAt" TIMESTAMP WITH TIME ZONE, "emailError" character varying(500), "createdById" character varying(36) NOT NULL, CONSTRAINT "PK_15d25c200d9bcd8a33f698daf18" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE INDEX "IDX_9fe86a806dc73698bad2b39c52" ON "invoice"  ("creditsInvoiceId") `);
        await queryRunner.query(`CREATE UNIQUE INDEX "IDX_invoice_number" ON "invoice"  ("organisationId", "kind", "number") `);
        await queryRunner.query(`CREATE INDEX "IDX_invoice_job" ON "invoice"  ("organisationId", "jobId") `);
        await queryRunner.query(`CREATE TABLE "invoice_line" ("id" character varying(36) NOT NULL, "createdAt" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "updatedAt" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "organisationId" character varying(36) NOT NULL, "invoiceId" character varying(36) NOT NULL, "position" integer NOT NULL, "kind" character varying(20) NOT NULL, "description" character varying(300) NOT NULL, "quantity" character varying(16) NOT NULL, "unit" character varying(20), "unitPriceMinor" integer NOT NULL, "vatRateCode" character varying(20) NOT NULL, "vatBasisPoints" integer NOT NULL, "netMinor" integer NOT NULL, "vatMinor" integer NOT NULL, "grossMinor" integer NOT NULL, "visitId" character varying(36), "priceItemId" character varying(36), "labourRateId" character varying(36), CONSTRAINT "PK_112d67e85951a56ee5123e9c803" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE INDEX "IDX_d1abbe501a231d860de4e4eb59" ON "invoice_line"  ("invoiceId") `);
        await queryRunner.query(`CREATE TABLE "payment" ("id" character varying(36) NOT NULL, "createdAt" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "updatedAt" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "organisationId" character varying(36) NOT NULL, "invoiceId" character varying(36) NOT NULL, "amountMinor" integer NOT NULL, "method" character varying(20) NOT NULL, "receivedOn" character varying(10) NOT NULL, "reference" character varying(255), "note" character varying(500), "recordedById" character varying(36), "checkoutSessionId" character varying(255), CONSTRAINT "PK_fcaec7df5adf9cac408c686b2ab" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE INDEX "IDX_87223c7f1d4c2ca51cf6992784" ON "payment"  ("invoiceId") `);
        await queryRunner.query(`CREATE UNIQUE INDEX "IDX_payment_checkout_session" ON "payment"  ("checkoutSessionId") `);
        await queryRunner.query(`CREATE TABLE "labour_rate" ("id" character varying(36) NOT NULL, "createdAt" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "updatedAt" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "organisationId" character varying(36) NOT NULL, "name" character varying(100) NOT NULL, "hourlyMinor" integer NOT NULL, "vatRateCode" character varying(20) NOT NULL, "active" boolean NOT NULL DEFAULT true, "isDefault" boolean NOT NULL DEFAULT false, CONSTRAINT "PK_e773c58d4852364d5403abfdc58" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE TABLE "vat_rate" ("id" character varying(36) NOT NULL, "createdAt" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "updatedAt" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "organisationId" character varying(36) NOT NULL, "code" character varying(20) NOT NULL, "name" character varying(60) NOT NULL, "basisPoints" integer NOT NULL, "active" boolean NOT NULL DEFAULT true, CONSTRAINT "PK_e7a4f4bdee032b0c3e3f6450510" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE UNIQUE INDEX "IDX_vat_rate_organisation_code" ON "vat_rate"  ("organisationId", "code") `);
        await queryRunner.query(`ALTER TABLE "organisation" ADD COLUMN "vatNumber" character varying(20)`);
        await queryRunner.query(`ALTER TABLE "organisation" ADD COLUMN "paymentTermsDays" integer NOT NULL DEFAULT '30'`);
        await queryRunner.query(`ALTER TABLE "organisation" ADD COLUMN "quoteValidDays" integer NOT NULL DEFAULT '30'`);
        await queryRunner.query(`ALTER TABLE "organisation" ADD COLUMN "paymentTerms" character varying(1000)`);
        await queryRunner.query(`ALTER TABLE "organisation" ADD COLUMN "paymentInstructions" character varying(1000)`);
        // Organisations that already exist start with the UK's rates as data, as on SQLite.
        const organisations: Array<{ id: string }> = await queryRunner.query(`SELECT "id" FROM "organisation"`);
        const rates = organisations.flatMap(({ id }) => UK_VAT_RATES.map((r) => ({ id: uuidv7(), organisationId: id, code: r.code, name: r.name, basisPoints: r.basisPoints })));
        if (rates.length) await queryRunner.manager.createQueryBuilder().insert().into("vat_rate", ["id", "organisationId", "code", "name", "basisPoints"]).values(rates).execute();
    }

    public async down(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`ALTER TABLE "organisation" DROP COLUMN "paymentInstructions"`);
        await queryRunner.query(`ALTER TABLE "organisation" DROP COLUMN "paymentTerms"`);
        await queryRunner.query(`ALTER TABLE "organisation" DROP COLUMN "quoteValidDays"`);
        await queryRunner.query(`ALTER TABLE "organisation" DROP COLUMN "paymentTermsDays"`);
        await queryRunner.query(`ALTER TABLE "organisation" DROP COLUMN "vatNumber"`);
        await queryRunner.query(`DROP INDEX "public"."IDX_vat_rate_organisation_code"`);
        await queryRunner.query(`DROP TABLE "vat_rate"`);
        await queryRunner.query(`DROP TABLE "labour_rate"`);
        await queryRunner.query(`DROP INDEX "public"."IDX_payment_checkout_session"`);
        await queryRunner.query(`DROP INDEX "public"."IDX_87223c7f1d4c2ca51cf6992784"`);
        await queryRunner.query(`DROP TABLE "payment"`);
        await queryRunner.query(`DROP INDEX "public"."IDX_d1abbe501a231d860de4e4eb59"`);
        await queryRunner.query(`DROP TABLE "invoice_line"`);
        await queryRunner.query(`DROP INDEX "public"."IDX_invoice_job"`);
        await queryRunner.query(`DROP INDEX "public"."IDX_invoice_number"`);
        await queryRunner.query(`DROP INDEX "public"."IDX_9fe86a806dc73698bad2b39c52"`);
        await queryRunner.query(`DROP TABLE "invoice"`);
        await queryRunner.query(`DROP TABLE "payment_event"`);
        await queryRunner.query(`DROP INDEX "public"."IDX_546a15a5bd89539cf2bcdfebc5"`);
        await queryRunner.query(`DROP INDEX "public"."IDX_8e1f780d45579e431246a5f387"`);
        await queryRunner.query(`DROP TABLE "card_checkout"`);
    }

}
