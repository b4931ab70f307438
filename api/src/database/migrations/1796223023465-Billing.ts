import { UK_VAT_RATES } from "@wiretrail/core";
import type { MigrationInterface, QueryRunner } from "typeorm";
import { v7 as uuidv7 } from "uuid";

/**
 * Getting paid: the organisation's VAT rates and labour rates, its VAT number and default terms; quotes, invoices
 * and credit notes with their lines; payments received; card checkouts and the provider's events already taken in.
 */

export class Billing1796223023465 implements MigrationInterface {
    name = 'Billing1796223023465'

    public async up(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`CREATE TABLE "card_checkout" ("id" varchar(36) PRIMARY KEY NOT NULL, "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "updatedAt" datetime NOT NULL DEFAULT (datetime('now')), "organisationId" varchar(36) NOT NULL, "invoiceId" varchar(36) NOT NULL, "sessionId" varchar(255) NOT NULL, "amountMinor" integer NOT NULL, "state" varchar(10) NOT NULL, "shareLinkId" varchar(36) NOT NULL)`);
        await queryRunner.query(`CREATE INDEX "IDX_8e1f780d45579e431246a5f387" ON "card_checkout" ("invoiceId") `);
        await queryRunner.query(`CREATE UNIQUE INDEX "IDX_546a15a5bd89539cf2bcdfebc5" ON "card_checkout" ("sessionId") `);
        await queryRunner.query(`CREATE TABLE "payment_event" ("eventId" varchar(255) PRIMARY KEY NOT NULL, "type" varchar(100) NOT NULL, "organisationId" varchar(36), "outcome" varchar(300) NOT NULL, "receivedAt" datetime NOT NULL DEFAULT (datetime('now')))`);
        await queryRunner.query(`CREATE TABLE "invoice" ("id" varchar(36) PRIMARY KEY NOT NULL, "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "updatedAt" datetime NOT NULL DEFAULT (datetime('now')), "organisationId" varchar(36) NOT NULL, "jobId" varchar(36) NOT NULL, "kind" varchar(20) NOT NULL, "status" varchar(10) NOT NULL DEFAULT ('draft'), "number" varchar(40), "creditsInvoiceId" varchar(36), "fromQuoteId" varchar(36), "termDays" integer NOT NULL, "notes" varchar(2000), "issueDate" varchar(10), "dueDate" varchar(10), "issuedAt" datetime, "issuedById" varchar(36), "netMinor" integer NOT NULL DEFAULT (0), "vatMinor" integer NOT NULL DEFAULT (0), "grossMinor" integer NOT NULL DEFAULT (0), "vatNumber" varchar(20), "terms" varchar(1000), "paymentInstructions" varchar(1000), "pdfSha256" varchar(64), "pdfBytes" integer, "emailState" varchar(10), "emailedTo" varchar(254), "emailedAt" datetime, "emailError" varchar(500), "createdById" varchar(36) NOT NULL)`);
        await queryRunner.query(`CREATE INDEX "IDX_9fe86a806dc73698bad2b39c52" ON "invoice" ("creditsInvoiceId") `);
        await queryRunner.query(`CREATE UNIQUE INDEX "IDX_invoice_number" ON "invoice" ("organisationId", "kind", "number") `);
        await queryRunner.query(`CREATE INDEX "IDX_invoice_job" ON "invoice" ("organisationId", "jobId") `);
        await queryRunner.query(`CREATE TABLE "invoice_line" ("id" varchar(36) PRIMARY KEY NOT NULL, "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "updatedAt" datetime NOT NULL DEFAULT (datetime('now')), "organisationId" varchar(36) NOT NULL, "invoiceId" varchar(36) NOT NULL, "position" integer NOT NULL, "kind" varchar(20) NOT NULL, "description" varchar(300) NOT NULL, "quantity" varchar(16) NOT NULL, "unit" varchar(20), "unitPriceMinor" integer NOT NULL, "vatRateCode" varchar(20) NOT NULL, "vatBasisPoints" integer NOT NULL, "netMinor" integer NOT NULL, "vatMinor" integer NOT NULL, "grossMinor" integer NOT NULL, "visitId" varchar(36), "priceItemId" varchar(36), "labourRateId" varchar(36))`);
        await queryRunner.query(`CREATE INDEX "IDX_d1abbe501a231d860de4e4eb59" ON "invoice_line" ("invoiceId") `);
        await queryRunner.query(`CREATE TABLE "payment" ("id" varchar(36) PRIMARY KEY NOT NULL, "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "updatedAt" datetime NOT NULL DEFAULT (datetime('now')), "organisationId" varchar(36) NOT NULL, "invoiceId" varchar(36) NOT NULL, "amountMinor" integer NOT NULL, "method" varchar(20) NOT NULL, "receivedOn" varchar(10) NOT NULL, "reference" varchar(255), "note" varchar(500), "recordedById" varchar(36), "checkoutSessionId" varchar(255))`);
        await queryRunner.query(`CREATE INDEX "IDX_87223c7f1d4c2ca51cf6992784" ON "payment" ("invoiceId") `);
        await queryRunner.query(`CREATE UNIQUE INDEX "IDX_payment_checkout_session" ON "payment" ("checkoutSessionId") `);
        await queryRunner.query(`CREATE TABLE "labour_rate" ("id" varchar(36) PRIMARY KEY NOT NULL, "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "updatedAt" datetime NOT NULL DEFAULT (datetime('now')), "organisationId" varchar(36) NOT NULL, "name" varchar(100) NOT NULL, "hourlyMinor" integer NOT NULL, "vatRateCode" varchar(20) NOT NULL, "active" boolean NOT NULL DEFAULT (1), "isDefault" boolean NOT NULL DEFAULT (0))`);
        await queryRunner.query(`CREATE TABLE "vat_rate" ("id" varchar(36) PRIMARY KEY NOT NULL, "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "updatedAt" datetime NOT NULL DEFAULT (datetime('now')), "organisationId" varchar(36) NOT NULL, "code" varchar(20) NOT NULL, "name" varchar(60) NOT NULL, "basisPoints" integer NOT NULL, "active" boolean NOT NULL DEFAULT (1))`);
        await queryRunner.query(`CREATE UNIQUE INDEX "IDX_vat_rate_organisation_code" ON "vat_rate" ("organisationId", "code") `);
        // Added in place: rebuilding the table would delete every user with it (their foreign key cascades).
        await queryRunner.query(`ALTER TABLE "organisation" ADD COLUMN "vatNumber" varchar(20)`);
        await queryRunner.query(`ALTER TABLE "organisation" ADD COLUMN "paymentTermsDays" integer NOT NULL DEFAULT (30)`);
        await queryRunner.query(`ALTER TABLE "organisation" ADD COLUMN "quoteValidDays" integer NOT NULL DEFAULT (30)`);
        await queryRunner.query(`ALTER TABLE "organisation" ADD COLUMN "paymentTerms" varchar(1000)`);
        await queryRunner.query(`ALTER TABLE "organisation" ADD COLUMN "paymentInstructions" varchar(1000)`);
        // Organisations that already exist start with the UK's rates as data; the office changes them from then on.
        const organisations: Array<{ id: string }> = await queryRunner.query(`SELECT "id" FROM "organisation"`);
        const rates = organisations.flatMap(({ id }) => UK_VAT_RATES.map((r) => ({ id: uuidv7(), organisationId: id, code: r.code, name: r.name, basisPoints: r.basisPoints })));
        // Through the query builder, so the parameters are written the way each database wants them.
        if (rates.length) await queryRunner.manager.createQueryBuilder().insert().into("vat_rate", ["id", "organisationId", "code", "name", "basisPoints"]).values(rates).execute();
    }

    public async down(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`ALTER TABLE "organisation" DROP COLUMN "paymentInstructions"`);
        await queryRunner.query(`ALTER TABLE "organisation" DROP COLUMN "paymentTerms"`);
        await queryRunner.query(`ALTER TABLE "organisation" DROP COLUMN "quoteValidDays"`);
        await queryRunner.query(`ALTER TABLE "organisation" DROP COLUMN "paymentTermsDays"`);
        await queryRunner.query(`ALTER TABLE "organisation" DROP COLUMN "vatNumber"`);
        await queryRunner.query(`DROP INDEX "IDX_vat_rate_organisation_code"`);
        await queryRunner.query(`DROP TABLE "vat_rate"`);
        await queryRunner.query(`DROP TABLE "labour_rate"`);
        await queryRunner.query(`DROP INDEX "IDX_payment_checkout_session"`);
        await queryRunner.query(`DROP INDEX "IDX_87223c7f1d4c2ca51cf6992784"`);
        await queryRunner.query(`DROP TABLE "payment"`);
        await queryRunner.query(`DROP INDEX "IDX_d1abbe501a231d860de4e4eb59"`);
        await queryRunner.query(`DROP TABLE "invoice_line"`);
        await queryRunner.query(`DROP INDEX "IDX_invoice_job"`);
        await queryRunner.query(`DROP INDEX "IDX_invoice_number"`);
        await queryRunner.query(`DROP INDEX "IDX_9fe86a806dc73698bad2b39c52"`);
        await queryRunner.query(`DROP TABLE "invoice"`);
        await queryRunner.query(`DROP TABLE "payment_event"`);
        await queryRunner.query(`DROP INDEX "IDX_546a15a5bd89539cf2bcdfebc5"`);
        await queryRunner.query(`DROP INDEX "IDX_8e1f780d45579e431246a5f387"`);
        await queryRunner.query(`DROP TABLE "card_checkout"`);
    }

}
