import type { MigrationInterface, QueryRunner } from "typeorm";

/** The domain model (one table per synced entity) and the sync bookkeeping: change order, applied mutations, devices. */

export class DomainAndSync1796210074350 implements MigrationInterface {
    name = 'DomainAndSync1796210074350'

    public async up(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`CREATE TABLE "sync_change" ("entity" varchar(40) NOT NULL, "rowId" varchar(36) NOT NULL, "organisationId" varchar(36) NOT NULL, "seq" integer NOT NULL, "siteId" varchar(36), "deleted" boolean NOT NULL DEFAULT (0), CONSTRAINT "UQ_63c1913b57844da882b34f0eaa4" UNIQUE ("seq"), PRIMARY KEY ("entity", "rowId"))`);
        await queryRunner.query(`CREATE INDEX "IDX_sync_change_site" ON "sync_change" ("siteId") `);
        await queryRunner.query(`CREATE INDEX "IDX_sync_change_org_seq" ON "sync_change" ("organisationId", "seq") `);
        await queryRunner.query(`CREATE TABLE "sync_counter" ("name" varchar(20) PRIMARY KEY NOT NULL, "value" integer NOT NULL)`);
        await queryRunner.query(`CREATE TABLE "applied_mutation" ("mutationId" varchar(64) PRIMARY KEY NOT NULL, "organisationId" varchar(36) NOT NULL, "userId" varchar(36) NOT NULL, "deviceId" varchar(64) NOT NULL, "result" text NOT NULL, "appliedAt" datetime NOT NULL DEFAULT ((datetime('now'))))`);
        await queryRunner.query(`CREATE TABLE "sync_device" ("deviceId" varchar(64) PRIMARY KEY NOT NULL, "organisationId" varchar(36) NOT NULL, "userId" varchar(36) NOT NULL, "checkpoint" integer NOT NULL DEFAULT (0), "scope" text, "previousCheckpoint" integer, "previousScope" text, "lastPullAt" datetime)`);
        await queryRunner.query(`CREATE TABLE "customer" ("id" varchar(36) PRIMARY KEY NOT NULL, "organisationId" varchar(36) NOT NULL, "version" integer NOT NULL, "fieldMeta" text NOT NULL, "deletedAt" datetime, "createdById" varchar(36), "updatedById" varchar(36), "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "updatedAt" datetime NOT NULL DEFAULT (datetime('now')), "name" varchar(200) NOT NULL, "email" varchar(254), "phone" varchar(50), "address" varchar(500), "notes" text)`);
        await queryRunner.query(`CREATE INDEX "IDX_customer_organisation_version" ON "customer" ("organisationId", "version") `);
        await queryRunner.query(`CREATE TABLE "site" ("id" varchar(36) PRIMARY KEY NOT NULL, "organisationId" varchar(36) NOT NULL, "version" integer NOT NULL, "fieldMeta" text NOT NULL, "deletedAt" datetime, "createdById" varchar(36), "updatedById" varchar(36), "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "updatedAt" datetime NOT NULL DEFAULT (datetime('now')), "customerId" varchar(36) NOT NULL, "name" varchar(200), "address" varchar(500) NOT NULL, "postcode" varchar(12), "accessNotes" text, "earthing" varchar(40), "zeOhm" float, "pfcKa" float)`);
        await queryRunner.query(`CREATE INDEX "IDX_site_organisation_version" ON "site" ("organisationId", "version") `);
        await queryRunner.query(`CREATE TABLE "area" ("id" varchar(36) PRIMARY KEY NOT NULL, "organisationId" varchar(36) NOT NULL, "version" integer NOT NULL, "fieldMeta" text NOT NULL, "deletedAt" datetime, "createdById" varchar(36), "updatedById" varchar(36), "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "updatedAt" datetime NOT NULL DEFAULT (datetime('now')), "siteId" varchar(36) NOT NULL, "name" varchar(200) NOT NULL, "level" varchar(50))`);
        await queryRunner.query(`CREATE INDEX "IDX_area_organisation_version" ON "area" ("organisationId", "version") `);
        await queryRunner.query(`CREATE INDEX "IDX_area_site" ON "area" ("siteId") `);
        await queryRunner.query(`CREATE TABLE "board" ("id" varchar(36) PRIMARY KEY NOT NULL, "organisationId" varchar(36) NOT NULL, "version" integer NOT NULL, "fieldMeta" text NOT NULL, "deletedAt" datetime, "createdById" varchar(36), "updatedById" varchar(36), "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "updatedAt" datetime NOT NULL DEFAULT (datetime('now')), "siteId" varchar(36) NOT NULL, "areaId" varchar(36), "name" varchar(200) NOT NULL, "description" varchar(500))`);
        await queryRunner.query(`CREATE INDEX "IDX_board_organisation_version" ON "board" ("organisationId", "version") `);
        await queryRunner.query(`CREATE INDEX "IDX_board_site" ON "board" ("siteId") `);
        await queryRunner.query(`CREATE TABLE "circuit" ("id" varchar(36) PRIMARY KEY NOT NULL, "organisationId" varchar(36) NOT NULL, "version" integer NOT NULL, "fieldMeta" text NOT NULL, "deletedAt" datetime, "createdById" varchar(36), "updatedById" varchar(36), "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "updatedAt" datetime NOT NULL DEFAULT (datetime('now')), "siteId" varchar(36) NOT NULL, "boardId" varchar(36) NOT NULL, "number" varchar(20) NOT NULL, "description" varchar(500), "kind" varchar(40), "deviceType" varchar(40), "deviceRatingA" float, "rcdRatingMa" float, "rcdType" varchar(20), "liveCsaMm2" float, "cpcCsaMm2" float)`);
        await queryRunner.query(`CREATE INDEX "IDX_circuit_organisation_version" ON "circuit" ("organisationId", "version") `);
        await queryRunner.query(`CREATE INDEX "IDX_circuit_site" ON "circuit" ("siteId") `);
        await queryRunner.query(`CREATE TABLE "job" ("id" varchar(36) PRIMARY KEY NOT NULL, "organisationId" varchar(36) NOT NULL, "version" integer NOT NULL, "fieldMeta" text NOT NULL, "deletedAt" datetime, "createdById" varchar(36), "updatedById" varchar(36), "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "updatedAt" datetime NOT NULL DEFAULT (datetime('now')), "siteId" varchar(36) NOT NULL, "customerId" varchar(36) NOT NULL, "reference" varchar(40), "title" varchar(200) NOT NULL, "status" varchar(40), "description" text)`);
        await queryRunner.query(`CREATE INDEX "IDX_job_organisation_version" ON "job" ("organisationId", "version") `);
        await queryRunner.query(`CREATE INDEX "IDX_job_site" ON "job" ("siteId") `);
        await queryRunner.query(`CREATE TABLE "visit" ("id" varchar(36) PRIMARY KEY NOT NULL, "organisationId" varchar(36) NOT NULL, "version" integer NOT NULL, "fieldMeta" text NOT NULL, "deletedAt" datetime, "createdById" varchar(36), "updatedById" varchar(36), "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "updatedAt" datetime NOT NULL DEFAULT (datetime('now')), "jobId" varchar(36) NOT NULL, "siteId" varchar(36) NOT NULL, "technicianIds" text, "plannedStart" varchar(30), "plannedEnd" varchar(30), "actualStart" varchar(30), "actualEnd" varchar(30), "status" varchar(40))`);
        await queryRunner.query(`CREATE INDEX "IDX_visit_organisation_version" ON "visit" ("organisationId", "version") `);
        await queryRunner.query(`CREATE INDEX "IDX_visit_site" ON "visit" ("siteId") `);
        await queryRunner.query(`CREATE TABLE "photo" ("id" varchar(36) PRIMARY KEY NOT NULL, "organisationId" varchar(36) NOT NULL, "version" integer NOT NULL, "fieldMeta" text NOT NULL, "deletedAt" datetime, "createdById" varchar(36), "updatedById" varchar(36), "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "updatedAt" datetime NOT NULL DEFAULT (datetime('now')), "visitId" varchar(36) NOT NULL, "siteId" varchar(36) NOT NULL, "areaId" varchar(36), "subjectType" varchar(40), "subjectId" varchar(36), "caption" varchar(500), "tags" text, "takenAt" varchar(30), "sha256" varchar(64), "sizeBytes" integer, "width" integer, "height" integer, "uploadState" varchar(20))`);
        await queryRunner.query(`CREATE INDEX "IDX_photo_organisation_version" ON "photo" ("organisationId", "version") `);
        await queryRunner.query(`CREATE INDEX "IDX_photo_site" ON "photo" ("siteId") `);
        await queryRunner.query(`CREATE INDEX "IDX_photo_visit" ON "photo" ("visitId") `);
        await queryRunner.query(`CREATE TABLE "note" ("id" varchar(36) PRIMARY KEY NOT NULL, "organisationId" varchar(36) NOT NULL, "version" integer NOT NULL, "fieldMeta" text NOT NULL, "deletedAt" datetime, "createdById" varchar(36), "updatedById" varchar(36), "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "updatedAt" datetime NOT NULL DEFAULT (datetime('now')), "visitId" varchar(36) NOT NULL, "siteId" varchar(36) NOT NULL, "text" text NOT NULL)`);
        await queryRunner.query(`CREATE INDEX "IDX_note_organisation_version" ON "note" ("organisationId", "version") `);
        await queryRunner.query(`CREATE INDEX "IDX_note_site" ON "note" ("siteId") `);
        await queryRunner.query(`CREATE INDEX "IDX_note_visit" ON "note" ("visitId") `);
        await queryRunner.query(`CREATE TABLE "cable_run" ("id" varchar(36) PRIMARY KEY NOT NULL, "organisationId" varchar(36) NOT NULL, "version" integer NOT NULL, "fieldMeta" text NOT NULL, "deletedAt" datetime, "createdById" varchar(36), "updatedById" varchar(36), "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "updatedAt" datetime NOT NULL DEFAULT (datetime('now')), "siteId" varchar(36) NOT NULL, "label" varchar(100) NOT NULL, "medium" varchar(40), "endAAreaId" varchar(36), "endADescription" varchar(300), "endATermination" varchar(100), "endBAreaId" varchar(36), "endBDescription" varchar(300), "endBTermination" varchar(100), "status" varchar(40), "traceMethod" varchar(40), "lengthM" float, "nvp" float, "scheme" varchar(40), "wiremap" text, "verdict" varchar(40))`);
        await queryRunner.query(`CREATE INDEX "IDX_cable_run_organisation_version" ON "cable_run" ("organisationId", "version") `);
        await queryRunner.query(`CREATE INDEX "IDX_cable_run_site" ON "cable_run" ("siteId") `);
        await queryRunner.query(`CREATE TABLE "point_change" ("id" varchar(36) PRIMARY KEY NOT NULL, "organisationId" varchar(36) NOT NULL, "version" integer NOT NULL, "fieldMeta" text NOT NULL, "deletedAt" datetime, "createdById" varchar(36), "updatedById" varchar(36), "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "updatedAt" datetime NOT NULL DEFAULT (datetime('now')), "visitId" varchar(36) NOT NULL, "siteId" varchar(36) NOT NULL, "circuitId" varchar(36), "action" varchar(40) NOT NULL, "accessoryKind" varchar(100), "fromAreaId" varchar(36), "fromDescription" varchar(300), "fromHeightMm" float, "toAreaId" varchar(36), "toDescription" varchar(300), "toHeightMm" float, "connection" varchar(40), "liveCsaMm2" float, "cpcCsaMm2" float, "addedRouteM" float, "fuseRatingA" float, "loadW" float)`);
        await queryRunner.query(`CREATE INDEX "IDX_point_change_organisation_version" ON "point_change" ("organisationId", "version") `);
        await queryRunner.query(`CREATE INDEX "IDX_point_change_site" ON "point_change" ("siteId") `);
        await queryRunner.query(`CREATE INDEX "IDX_point_change_visit" ON "point_change" ("visitId") `);
        await queryRunner.query(`CREATE TABLE "test_result" ("id" varchar(36) PRIMARY KEY NOT NULL, "organisationId" varchar(36) NOT NULL, "version" integer NOT NULL, "fieldMeta" text NOT NULL, "deletedAt" datetime, "createdById" varchar(36), "updatedById" varchar(36), "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "updatedAt" datetime NOT NULL DEFAULT (datetime('now')), "visitId" varchar(36) NOT NULL, "siteId" varchar(36) NOT NULL, "circuitId" varchar(36), "readings" text, "instrument" varchar(200), "verdicts" text)`);
        await queryRunner.query(`CREATE INDEX "IDX_test_result_organisation_version" ON "test_result" ("organisationId", "version") `);
        await queryRunner.query(`CREATE INDEX "IDX_test_result_site" ON "test_result" ("siteId") `);
        await queryRunner.query(`CREATE INDEX "IDX_test_result_visit" ON "test_result" ("visitId") `);
        await queryRunner.query(`CREATE TABLE "document" ("id" varchar(36) PRIMARY KEY NOT NULL, "organisationId" varchar(36) NOT NULL, "version" integer NOT NULL, "fieldMeta" text NOT NULL, "deletedAt" datetime, "createdById" varchar(36), "updatedById" varchar(36), "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "updatedAt" datetime NOT NULL DEFAULT (datetime('now')), "jobId" varchar(36) NOT NULL, "siteId" varchar(36) NOT NULL, "kind" varchar(40) NOT NULL, "number" varchar(40), "signerName" varchar(200), "pdfSha256" varchar(64), "issuedAt" varchar(30), "emailedAt" varchar(30))`);
        await queryRunner.query(`CREATE INDEX "IDX_document_organisation_version" ON "document" ("organisationId", "version") `);
        await queryRunner.query(`CREATE INDEX "IDX_document_site" ON "document" ("siteId") `);
        await queryRunner.query(`CREATE TABLE "conflict" ("id" varchar(36) PRIMARY KEY NOT NULL, "organisationId" varchar(36) NOT NULL, "version" integer NOT NULL, "fieldMeta" text NOT NULL, "deletedAt" datetime, "createdById" varchar(36), "updatedById" varchar(36), "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "updatedAt" datetime NOT NULL DEFAULT (datetime('now')), "entity" varchar(40) NOT NULL, "rowId" varchar(36) NOT NULL, "field" varchar(60) NOT NULL, "reason" varchar(30) NOT NULL, "baseVersion" integer NOT NULL, "keptValue" text, "keptById" varchar(36), "keptHlc" varchar(120), "discardedValue" text, "discardedById" varchar(36), "discardedHlc" varchar(120), "discardedDeviceId" varchar(64), "resolvedAt" datetime, "resolvedById" varchar(36), "resolution" text)`);
        await queryRunner.query(`CREATE INDEX "IDX_conflict_organisation_version" ON "conflict" ("organisationId", "version") `);
    }

    public async down(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`DROP INDEX "IDX_conflict_organisation_version"`);
        await queryRunner.query(`DROP TABLE "conflict"`);
        await queryRunner.query(`DROP INDEX "IDX_document_site"`);
        await queryRunner.query(`DROP INDEX "IDX_document_organisation_version"`);
        await queryRunner.query(`DROP TABLE "document"`);
        await queryRunner.query(`DROP INDEX "IDX_test_result_visit"`);
        await queryRunner.query(`DROP INDEX "IDX_test_result_site"`);
        await queryRunner.query(`DROP INDEX "IDX_test_result_organisation_version"`);
        await queryRunner.query(`DROP TABLE "test_result"`);
        await queryRunner.query(`DROP INDEX "IDX_point_change_visit"`);
        await queryRunner.query(`DROP INDEX "IDX_point_change_site"`);
        await queryRunner.query(`DROP INDEX "IDX_point_change_organisation_version"`);
        await queryRunner.query(`DROP TABLE "point_change"`);
        await queryRunner.query(`DROP INDEX "IDX_cable_run_site"`);
        await queryRunner.query(`DROP INDEX "IDX_cable_run_organisation_version"`);
        await queryRunner.query(`DROP TABLE "cable_run"`);
        await queryRunner.query(`DROP INDEX "IDX_note_visit"`);
        await queryRunner.query(`DROP INDEX "IDX_note_site"`);
        await queryRunner.query(`DROP INDEX "IDX_note_organisation_version"`);
        await queryRunner.query(`DROP TABLE "note"`);
        await queryRunner.query(`DROP INDEX "IDX_photo_visit"`);
        await queryRunner.query(`DROP INDEX "IDX_photo_site"`);
        await queryRunner.query(`DROP INDEX "IDX_photo_organisation_version"`);
        await queryRunner.query(`DROP TABLE "photo"`);
        await queryRunner.query(`DROP INDEX "IDX_visit_site"`);
        await queryRunner.query(`DROP INDEX "IDX_visit_organisation_version"`);
        await queryRunner.query(`DROP TABLE "visit"`);
        await queryRunner.query(`DROP INDEX "IDX_job_site"`);
        await queryRunner.query(`DROP INDEX "IDX_job_organisation_version"`);
        await queryRunner.query(`DROP TABLE "job"`);
        await queryRunner.query(`DROP INDEX "IDX_circuit_site"`);
        await queryRunner.query(`DROP INDEX "IDX_circuit_organisation_version"`);
        await queryRunner.query(`DROP TABLE "circuit"`);
        await queryRunner.query(`DROP INDEX "IDX_board_site"`);
        await queryRunner.query(`DROP INDEX "IDX_board_organisation_version"`);
        await queryRunner.query(`DROP TABLE "board"`);
        await queryRunner.query(`DROP INDEX "IDX_area_site"`);
        await queryRunner.query(`DROP INDEX "IDX_area_organisation_version"`);
        await queryRunner.query(`DROP TABLE "area"`);
        await queryRunner.query(`DROP INDEX "IDX_site_organisation_version"`);
        await queryRunner.query(`DROP TABLE "site"`);
        await queryRunner.query(`DROP INDEX "IDX_customer_organisation_version"`);
        await queryRunner.query(`DROP TABLE "customer"`);
        await queryRunner.query(`DROP TABLE "sync_device"`);
        await queryRunner.query(`DROP TABLE "applied_mutation"`);
        await queryRunner.query(`DROP TABLE "sync_counter"`);
        await queryRunner.query(`DROP INDEX "IDX_sync_change_org_seq"`);
        await queryRunner.query(`DROP INDEX "IDX_sync_change_site"`);
        await queryRunner.query(`DROP TABLE "sync_change"`);
    }

}
