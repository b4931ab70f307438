import type { MigrationInterface, QueryRunner } from "typeorm";

/**
 * What a visit records on site: a column per test reading (instead of one readings blob), sign-off on the visit,
 * TDR and link details on cable runs, ring readings and concealed routes on point changes, and the documents' own
 * numbering, issue and e-mail fields.
 */

export class VisitRecords1796218834250 implements MigrationInterface {
    name = 'VisitRecords1796218834250'

    public async up(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`DROP INDEX "IDX_test_result_visit"`);
        await queryRunner.query(`DROP INDEX "IDX_test_result_site"`);
        await queryRunner.query(`DROP INDEX "IDX_test_result_organisation_version"`);
        await queryRunner.query(`CREATE TABLE "temporary_test_result" ("id" varchar(36) PRIMARY KEY NOT NULL, "organisationId" varchar(36) NOT NULL, "version" integer NOT NULL, "fieldMeta" text NOT NULL, "deletedAt" datetime, "createdById" varchar(36), "updatedById" varchar(36), "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "updatedAt" datetime NOT NULL DEFAULT (datetime('now')), "visitId" varchar(36) NOT NULL, "siteId" varchar(36) NOT NULL, "circuitId" varchar(36), "instrument" varchar(200), "verdicts" text)`);
        await queryRunner.query(`INSERT INTO "temporary_test_result"("id", "organisationId", "version", "fieldMeta", "deletedAt", "createdById", "updatedById", "createdAt", "updatedAt", "visitId", "siteId", "circuitId", "instrument", "verdicts") SELECT "id", "organisationId", "version", "fieldMeta", "deletedAt", "createdById", "updatedById", "createdAt", "updatedAt", "visitId", "siteId", "circuitId", "instrument", "verdicts" FROM "test_result"`);
        await queryRunner.query(`DROP TABLE "test_result"`);
        await queryRunner.query(`ALTER TABLE "temporary_test_result" RENAME TO "test_result"`);
        await queryRunner.query(`CREATE INDEX "IDX_test_result_visit" ON "test_result" ("visitId") `);
        await queryRunner.query(`CREATE INDEX "IDX_test_result_site" ON "test_result" ("siteId") `);
        await queryRunner.query(`CREATE INDEX "IDX_test_result_organisation_version" ON "test_result" ("organisationId", "version") `);
        await queryRunner.query(`DROP INDEX "IDX_visit_site"`);
        await queryRunner.query(`DROP INDEX "IDX_visit_organisation_version"`);
        await queryRunner.query(`CREATE TABLE "temporary_visit" ("id" varchar(36) PRIMARY KEY NOT NULL, "organisationId" varchar(36) NOT NULL, "version" integer NOT NULL, "fieldMeta" text NOT NULL, "deletedAt" datetime, "createdById" varchar(36), "updatedById" varchar(36), "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "updatedAt" datetime NOT NULL DEFAULT (datetime('now')), "jobId" varchar(36) NOT NULL, "siteId" varchar(36) NOT NULL, "technicianIds" text, "plannedStart" varchar(30), "plannedEnd" varchar(30), "actualStart" varchar(30), "actualEnd" varchar(30), "status" varchar(40), "cautionsReadAt" varchar(30), "workDescription" text, "observations" text, "departures" text, "signedByName" varchar(200), "signedAt" varchar(30), "signatureSvg" text)`);
        await queryRunner.query(`INSERT INTO "temporary_visit"("id", "organisationId", "version", "fieldMeta", "deletedAt", "createdById", "updatedById", "createdAt", "updatedAt", "jobId", "siteId", "technicianIds", "plannedStart", "plannedEnd", "actualStart", "actualEnd", "status") SELECT "id", "organisationId", "version", "fieldMeta", "deletedAt", "createdById", "updatedById", "createdAt", "updatedAt", "jobId", "siteId", "technicianIds", "plannedStart", "plannedEnd", "actualStart", "actualEnd", "status" FROM "visit"`);
        await queryRunner.query(`DROP TABLE "visit"`);
        await queryRunner.query(`ALTER TABLE "temporary_visit" RENAME TO "visit"`);
        await queryRunner.query(`CREATE INDEX "IDX_visit_site" ON "visit" ("siteId") `);
        await queryRunner.query(`CREATE INDEX "IDX_visit_organisation_version" ON "visit" ("organisationId", "version") `);
        await queryRunner.query(`DROP INDEX "IDX_cable_run_site"`);
        await queryRunner.query(`DROP INDEX "IDX_cable_run_organisation_version"`);
        await queryRunner.query(`CREATE TABLE "temporary_cable_run" ("id" varchar(36) PRIMARY KEY NOT NULL, "organisationId" varchar(36) NOT NULL, "version" integer NOT NULL, "fieldMeta" text NOT NULL, "deletedAt" datetime, "createdById" varchar(36), "updatedById" varchar(36), "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "updatedAt" datetime NOT NULL DEFAULT (datetime('now')), "siteId" varchar(36) NOT NULL, "label" varchar(100) NOT NULL, "medium" varchar(40), "endAAreaId" varchar(36), "endADescription" varchar(300), "endATermination" varchar(100), "endBAreaId" varchar(36), "endBDescription" varchar(300), "endBTermination" varchar(100), "status" varchar(40), "traceMethod" varchar(40), "lengthM" float, "nvp" float, "scheme" varchar(40), "wiremap" text, "verdict" varchar(40), "tdrNs" float, "linkKind" varchar(40), "testedAt" varchar(30), "lastVisitId" varchar(36))`);
        await queryRunner.query(`INSERT INTO "temporary_cable_run"("id", "organisationId", "version", "fieldMeta", "deletedAt", "createdById", "updatedById", "createdAt", "updatedAt", "siteId", "label", "medium", "endAAreaId", "endADescription", "endATermination", "endBAreaId", "endBDescription", "endBTermination", "status", "traceMethod", "lengthM", "nvp", "scheme", "wiremap", "verdict") SELECT "id", "organisationId", "version", "fieldMeta", "deletedAt", "createdById", "updatedById", "createdAt", "updatedAt", "siteId", "label", "medium", "endAAreaId", "endADescription", "endATermination", "endBAreaId", "endBDescription", "endBTermination", "status", "traceMethod", "lengthM", "nvp", "scheme", "wiremap", "verdict" FROM "cable_run"`);
        await queryRunner.query(`DROP TABLE "cable_run"`);
        await queryRunner.query(`ALTER TABLE "temporary_cable_run" RENAME TO "cable_run"`);
        await queryRunner.query(`CREATE INDEX "IDX_cable_run_site" ON "cable_run" ("siteId") `);
        await queryRunner.query(`CREATE INDEX "IDX_cable_run_organisation_version" ON "cable_run" ("organisationId", "version") `);
        await queryRunner.query(`DROP INDEX "IDX_point_change_visit"`);
        await queryRunner.query(`DROP INDEX "IDX_point_change_site"`);
        await queryRunner.query(`DROP INDEX "IDX_point_change_organisation_version"`);
        await queryRunner.query(`CREATE TABLE "temporary_point_change" ("id" varchar(36) PRIMARY KEY NOT NULL, "organisationId" varchar(36) NOT NULL, "version" integer NOT NULL, "fieldMeta" text NOT NULL, "deletedAt" datetime, "createdById" varchar(36), "updatedById" varchar(36), "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "updatedAt" datetime NOT NULL DEFAULT (datetime('now')), "visitId" varchar(36) NOT NULL, "siteId" varchar(36) NOT NULL, "circuitId" varchar(36), "action" varchar(40) NOT NULL, "accessoryKind" varchar(100), "fromAreaId" varchar(36), "fromDescription" varchar(300), "fromHeightMm" float, "toAreaId" varchar(36), "toDescription" varchar(300), "toHeightMm" float, "connection" varchar(40), "liveCsaMm2" float, "cpcCsaMm2" float, "addedRouteM" float, "fuseRatingA" float, "loadW" float, "beforeR1Ohm" float, "beforeRnOhm" float, "beforeR2Ohm" float, "concealedRoute" text)`);
        await queryRunner.query(`INSERT INTO "temporary_point_change"("id", "organisationId", "version", "fieldMeta", "deletedAt", "createdById", "updatedById", "createdAt", "updatedAt", "visitId", "siteId", "circuitId", "action", "accessoryKind", "fromAreaId", "fromDescription", "fromHeightMm", "toAreaId", "toDescription", "toHeightMm", "connection", "liveCsaMm2", "cpcCsaMm2", "addedRouteM", "fuseRatingA", "loadW") SELECT "id", "organisationId", "version", "fieldMeta", "deletedAt", "createdById", "updatedById", "createdAt", "updatedAt", "visitId", "siteId", "circuitId", "action", "accessoryKind", "fromAreaId", "fromDescription", "fromHeightMm", "toAreaId", "toDescription", "toHeightMm", "connection", "liveCsaMm2", "cpcCsaMm2", "addedRouteM", "fuseRatingA", "loadW" FROM "point_change"`);
        await queryRunner.query(`DROP TABLE "point_change"`);
        await queryRunner.query(`ALTER TABLE "temporary_point_change" RENAME TO "point_change"`);
        await queryRunner.query(`CREATE INDEX "IDX_point_change_visit" ON "point_change" ("visitId") `);
        await queryRunner.query(`CREATE INDEX "IDX_point_change_site" ON "point_change" ("siteId") `);
        await queryRunner.query(`CREATE INDEX "IDX_point_change_organisation_version" ON "point_change" ("organisationId", "version") `);
        await queryRunner.query(`DROP INDEX "IDX_test_result_visit"`);
        await queryRunner.query(`DROP INDEX "IDX_test_result_site"`);
        await queryRunner.query(`DROP INDEX "IDX_test_result_organisation_version"`);
        await queryRunner.query(`CREATE TABLE "temporary_test_result" ("id" varchar(36) PRIMARY KEY NOT NULL, "organisationId" varchar(36) NOT NULL, "version" integer NOT NULL, "fieldMeta" text NOT NULL, "deletedAt" datetime, "createdById" varchar(36), "updatedById" varchar(36), "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "updatedAt" datetime NOT NULL DEFAULT (datetime('now')), "visitId" varchar(36) NOT NULL, "siteId" varchar(36) NOT NULL, "circuitId" varchar(36), "instrument" varchar(200), "verdicts" text, "r1Ohm" float, "rnOhm" float, "r2Ohm" float, "r1r2Ohm" float, "irLiveLiveMOhm" float, "irLiveEarthMOhm" float, "irTestVoltageV" integer, "polarity" varchar(40), "zsOhm" float, "rcdTripMs" float, "rcdTripMs5x" float, "rcdButton" varchar(40), "testedAt" varchar(30))`);
        await queryRunner.query(`INSERT INTO "temporary_test_result"("id", "organisationId", "version", "fieldMeta", "deletedAt", "createdById", "updatedById", "createdAt", "updatedAt", "visitId", "siteId", "circuitId", "instrument", "verdicts") SELECT "id", "organisationId", "version", "fieldMeta", "deletedAt", "createdById", "updatedById", "createdAt", "updatedAt", "visitId", "siteId", "circuitId", "instrument", "verdicts" FROM "test_result"`);
        await queryRunner.query(`DROP TABLE "test_result"`);
        await queryRunner.query(`ALTER TABLE "temporary_test_result" RENAME TO "test_result"`);
        await queryRunner.query(`CREATE INDEX "IDX_test_result_visit" ON "test_result" ("visitId") `);
        await queryRunner.query(`CREATE INDEX "IDX_test_result_site" ON "test_result" ("siteId") `);
        await queryRunner.query(`CREATE INDEX "IDX_test_result_organisation_version" ON "test_result" ("organisationId", "version") `);
        await queryRunner.query(`DROP INDEX "IDX_document_site"`);
        await queryRunner.query(`DROP INDEX "IDX_document_organisation_version"`);
        await queryRunner.query(`CREATE TABLE "temporary_document" ("id" varchar(36) PRIMARY KEY NOT NULL, "organisationId" varchar(36) NOT NULL, "version" integer NOT NULL, "fieldMeta" text NOT NULL, "deletedAt" datetime, "createdById" varchar(36), "updatedById" varchar(36), "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "updatedAt" datetime NOT NULL DEFAULT (datetime('now')), "jobId" varchar(36) NOT NULL, "siteId" varchar(36) NOT NULL, "kind" varchar(40) NOT NULL, "number" varchar(40), "signerName" varchar(200), "pdfSha256" varchar(64), "issuedAt" varchar(30), "emailedAt" varchar(30), "visitId" varchar(36), "title" varchar(200), "pdfBytes" integer, "issuedById" varchar(36), "emailState" varchar(40), "emailedTo" varchar(254), "emailError" varchar(500))`);
        await queryRunner.query(`INSERT INTO "temporary_document"("id", "organisationId", "version", "fieldMeta", "deletedAt", "createdById", "updatedById", "createdAt", "updatedAt", "jobId", "siteId", "kind", "number", "signerName", "pdfSha256", "issuedAt", "emailedAt") SELECT "id", "organisationId", "version", "fieldMeta", "deletedAt", "createdById", "updatedById", "createdAt", "updatedAt", "jobId", "siteId", "kind", "number", "signerName", "pdfSha256", "issuedAt", "emailedAt" FROM "document"`);
        await queryRunner.query(`DROP TABLE "document"`);
        await queryRunner.query(`ALTER TABLE "temporary_document" RENAME TO "document"`);
        await queryRunner.query(`CREATE INDEX "IDX_document_site" ON "document" ("siteId") `);
        await queryRunner.query(`CREATE INDEX "IDX_document_organisation_version" ON "document" ("organisationId", "version") `);
    }

    public async down(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`DROP INDEX "IDX_document_organisation_version"`);
        await queryRunner.query(`DROP INDEX "IDX_document_site"`);
        await queryRunner.query(`ALTER TABLE "document" RENAME TO "temporary_document"`);
        await queryRunner.query(`CREATE TABLE "document" ("id" varchar(36) PRIMARY KEY NOT NULL, "organisationId" varchar(36) NOT NULL, "version" integer NOT NULL, "fieldMeta" text NOT NULL, "deletedAt" datetime, "createdById" varchar(36), "updatedById" varchar(36), "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "updatedAt" datetime NOT NULL DEFAULT (datetime('now')), "jobId" varchar(36) NOT NULL, "siteId" varchar(36) NOT NULL, "kind" varchar(40) NOT NULL, "number" varchar(40), "signerName" varchar(200), "pdfSha256" varchar(64), "issuedAt" varchar(30), "emailedAt" varchar(30))`);
        await queryRunner.query(`INSERT INTO "document"("id", "organisationId", "version", "fieldMeta", "deletedAt", "createdById", "updatedById", "createdAt", "updatedAt", "jobId", "siteId", "kind", "number", "signerName", "pdfSha256", "issuedAt", "emailedAt") SELECT "id", "organisationId", "version", "fieldMeta", "deletedAt", "createdById", "updatedById", "createdAt", "updatedAt", "jobId", "siteId", "kind", "number", "signerName", "pdfSha256", "issuedAt", "emailedAt" FROM "temporary_document"`);
        await queryRunner.query(`DROP TABLE "temporary_document"`);
        await queryRunner.query(`CREATE INDEX "IDX_document_organisation_version" ON "document" ("organisationId", "version") `);
        await queryRunner.query(`CREATE INDEX "IDX_document_site" ON "document" ("siteId") `);
        await queryRunner.query(`DROP INDEX "IDX_test_result_organisation_version"`);
        await queryRunner.query(`DROP INDEX "IDX_test_result_site"`);
        await queryRunner.query(`DROP INDEX "IDX_test_result_visit"`);
        await queryRunner.query(`ALTER TABLE "test_result" RENAME TO "temporary_test_result"`);
        await queryRunner.query(`CREATE TABLE "test_result" ("id" varchar(36) PRIMARY KEY NOT NULL, "organisationId" varchar(36) NOT NULL, "version" integer NOT NULL, "fieldMeta" text NOT NULL, "deletedAt" datetime, "createdById" varchar(36), "updatedById" varchar(36), "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "updatedAt" datetime NOT NULL DEFAULT (datetime('now')), "visitId" varchar(36) NOT NULL, "siteId" varchar(36) NOT NULL, "circuitId" varchar(36), "instrument" varchar(200), "verdicts" text)`);
        await queryRunner.query(`INSERT INTO "test_result"("id", "organisationId", "version", "fieldMeta", "deletedAt", "createdById", "updatedById", "createdAt", "updatedAt", "visitId", "siteId", "circuitId", "instrument", "verdicts") SELECT "id", "organisationId", "version", "fieldMeta", "deletedAt", "createdById", "updatedById", "createdAt", "updatedAt", "visitId", "siteId", "circuitId", "instrument", "verdicts" FROM "temporary_test_result"`);
        await queryRunner.query(`DROP TABLE "temporary_test_result"`);
        await queryRunner.query(`CREATE INDEX "IDX_test_result_organisation_version" ON "test_result" ("organisationId", "version") `);
        await queryRunner.query(`CREATE INDEX "IDX_test_result_site" ON "test_result" ("siteId") `);
        await queryRunner.query(`CREATE INDEX "IDX_test_result_visit" ON "test_result" ("visitId") `);
        await queryRunner.query(`DROP INDEX "IDX_point_change_organisation_version"`);
        await queryRunner.query(`DROP INDEX "IDX_point_change_site"`);
        await queryRunner.query(`DROP INDEX "IDX_point_change_visit"`);
        await queryRunner.query(`ALTER TABLE "point_change" RENAME TO "temporary_point_change"`);
        await queryRunner.query(`CREATE TABLE "point_change" ("id" varchar(36) PRIMARY KEY NOT NULL, "organisationId" varchar(36) NOT NULL, "version" integer NOT NULL, "fieldMeta" text NOT NULL, "deletedAt" datetime, "createdById" varchar(36), "updatedById" varchar(36), "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "updatedAt" datetime NOT NULL DEFAULT (datetime('now')), "visitId" varchar(36) NOT NULL, "siteId" varchar(36) NOT NULL, "circuitId" varchar(36), "action" varchar(40) NOT NULL, "accessoryKind" varchar(100), "fromAreaId" varchar(36), "fromDescription" varchar(300), "fromHeightMm" float, "toAreaId" varchar(36), "toDescription" varchar(300), "toHeightMm" float, "connection" varchar(40), "liveCsaMm2" float, "cpcCsaMm2" float, "addedRouteM" float, "fuseRatingA" float, "loadW" float)`);
        await queryRunner.query(`INSERT INTO "point_change"("id", "organisationId", "version", "fieldMeta", "deletedAt", "createdById", "updatedById", "createdAt", "updatedAt", "visitId", "siteId", "circuitId", "action", "accessoryKind", "fromAreaId", "fromDescription", "fromHeightMm", "toAreaId", "toDescription", "toHeightMm", "connection", "liveCsaMm2", "cpcCsaMm2", "addedRouteM", "fuseRatingA", "loadW") SELECT "id", "organisationId", "version", "fieldMeta", "deletedAt", "createdById", "updatedById", "createdAt", "updatedAt", "visitId", "siteId", "circuitId", "action", "accessoryKind", "fromAreaId", "fromDescription", "fromHeightMm", "toAreaId", "toDescription", "toHeightMm", "connection", "liveCsaMm2", "cpcCsaMm2", "addedRouteM", "fuseRatingA", "loadW" FROM "temporary_point_change"`);
        await queryRunner.query(`DROP TABLE "temporary_point_change"`);
        await queryRunner.query(`CREATE INDEX "IDX_point_change_organisation_version" ON "point_change" ("organisationId", "version") `);
        await queryRunner.query(`CREATE INDEX "IDX_point_change_site" ON "point_change" ("siteId") `);
        await queryRunner.query(`CREATE INDEX "IDX_point_change_visit" ON "point_change" ("visitId") `);
        await queryRunner.query(`DROP INDEX "IDX_cable_run_organisation_version"`);
        await queryRunner.query(`DROP INDEX "IDX_cable_run_site"`);
        await queryRunner.query(`ALTER TABLE "cable_run" RENAME TO "temporary_cable_run"`);
        await queryRunner.query(`CREATE TABLE "cable_run" ("id" varchar(36) PRIMARY KEY NOT NULL, "organisationId" varchar(36) NOT NULL, "version" integer NOT NULL, "fieldMeta" text NOT NULL, "deletedAt" datetime, "createdById" varchar(36), "updatedById" varchar(36), "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "updatedAt" datetime NOT NULL DEFAULT (datetime('now')), "siteId" varchar(36) NOT NULL, "label" varchar(100) NOT NULL, "medium" varchar(40), "endAAreaId" varchar(36), "endADescription" varchar(300), "endATermination" varchar(100), "endBAreaId" varchar(36), "endBDescription" varchar(300), "endBTermination" varchar(100), "status" varchar(40), "traceMethod" varchar(40), "lengthM" float, "nvp" float, "scheme" varchar(40), "wiremap" text, "verdict" varchar(40))`);
        await queryRunner.query(`INSERT INTO "cable_run"("id", "organisationId", "version", "fieldMeta", "deletedAt", "createdById", "updatedById", "createdAt", "updatedAt", "siteId", "label", "medium", "endAAreaId", "endADescription", "endATermination", "endBAreaId", "endBDescription", "endBTermination", "status", "traceMethod", "lengthM", "nvp", "scheme", "wiremap", "verdict") SELECT "id", "organisationId", "version", "fieldMeta", "deletedAt", "createdById", "updatedById", "createdAt", "updatedAt", "siteId", "label", "medium", "endAAreaId", "endADescription", "endATermination", "endBAreaId", "endBDescription", "endBTermination", "status", "traceMethod", "lengthM", "nvp", "scheme", "wiremap", "verdict" FROM "temporary_cable_run"`);
        await queryRunner.query(`DROP TABLE "temporary_cable_run"`);
        await queryRunner.query(`CREATE INDEX "IDX_cable_run_organisation_version" ON "cable_run" ("organisationId", "version") `);
        await queryRunner.query(`CREATE INDEX "IDX_cable_run_site" ON "cable_run" ("siteId") `);
        await queryRunner.query(`DROP INDEX "IDX_visit_organisation_version"`);
        await queryRunner.query(`DROP INDEX "IDX_visit_site"`);
        await queryRunner.query(`ALTER TABLE "visit" RENAME TO "temporary_visit"`);
        await queryRunner.query(`CREATE TABLE "visit" ("id" varchar(36) PRIMARY KEY NOT NULL, "organisationId" varchar(36) NOT NULL, "version" integer NOT NULL, "fieldMeta" text NOT NULL, "deletedAt" datetime, "createdById" varchar(36), "updatedById" varchar(36), "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "updatedAt" datetime NOT NULL DEFAULT (datetime('now')), "jobId" varchar(36) NOT NULL, "siteId" varchar(36) NOT NULL, "technicianIds" text, "plannedStart" varchar(30), "plannedEnd" varchar(30), "actualStart" varchar(30), "actualEnd" varchar(30), "status" varchar(40))`);
        await queryRunner.query(`INSERT INTO "visit"("id", "organisationId", "version", "fieldMeta", "deletedAt", "createdById", "updatedById", "createdAt", "updatedAt", "jobId", "siteId", "technicianIds", "plannedStart", "plannedEnd", "actualStart", "actualEnd", "status") SELECT "id", "organisationId", "version", "fieldMeta", "deletedAt", "createdById", "updatedById", "createdAt", "updatedAt", "jobId", "siteId", "technicianIds", "plannedStart", "plannedEnd", "actualStart", "actualEnd", "status" FROM "temporary_visit"`);
        await queryRunner.query(`DROP TABLE "temporary_visit"`);
        await queryRunner.query(`CREATE INDEX "IDX_visit_organisation_version" ON "visit" ("organisationId", "version") `);
        await queryRunner.query(`CREATE INDEX "IDX_visit_site" ON "visit" ("siteId") `);
        await queryRunner.query(`DROP INDEX "IDX_test_result_organisation_version"`);
        await queryRunner.query(`DROP INDEX "IDX_test_result_site"`);
        await queryRunner.query(`DROP INDEX "IDX_test_result_visit"`);
        await queryRunner.query(`ALTER TABLE "test_result" RENAME TO "temporary_test_result"`);
        await queryRunner.query(`CREATE TABLE "test_result" ("id" varchar(36) PRIMARY KEY NOT NULL, "organisationId" varchar(36) NOT NULL, "version" integer NOT NULL, "fieldMeta" text NOT NULL, "deletedAt" datetime, "createdById" varchar(36), "updatedById" varchar(36), "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "updatedAt" datetime NOT NULL DEFAULT (datetime('now')), "visitId" varchar(36) NOT NULL, "siteId" varchar(36) NOT NULL, "circuitId" varchar(36), "readings" text, "instrument" varchar(200), "verdicts" text)`);
        await queryRunner.query(`INSERT INTO "test_result"("id", "organisationId", "version", "fieldMeta", "deletedAt", "createdById", "updatedById", "createdAt", "updatedAt", "visitId", "siteId", "circuitId", "instrument", "verdicts") SELECT "id", "organisationId", "version", "fieldMeta", "deletedAt", "createdById", "updatedById", "createdAt", "updatedAt", "visitId", "siteId", "circuitId", "instrument", "verdicts" FROM "temporary_test_result"`);
        await queryRunner.query(`DROP TABLE "temporary_test_result"`);
        await queryRunner.query(`CREATE INDEX "IDX_test_result_organisation_version" ON "test_result" ("organisationId", "version") `);
        await queryRunner.query(`CREATE INDEX "IDX_test_result_site" ON "test_result" ("siteId") `);
        await queryRunner.query(`CREATE INDEX "IDX_test_result_visit" ON "test_result" ("visitId") `);
    }

}
