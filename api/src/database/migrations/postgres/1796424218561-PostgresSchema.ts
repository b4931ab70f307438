import type { MigrationInterface, QueryRunner } from "typeorm";

/**
 * The PostgreSQL schema as SQLite's migrations left it before billing (Foundation to PartsAndPrices), generated
 * from the same entities. From here on every schema change is a migration in both sets.
 */

export class PostgresSchema1796424218561 implements MigrationInterface {
    name = 'PostgresSchema1796424218561'

    public async up(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`CREATE TABLE "password_reset" ("id" character varying(36) NOT NULL, "createdAt" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "updatedAt" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "organisationId" character varying(36) NOT NULL, "userId" character varying(36) NOT NULL, "tokenHash" character varying(64) NOT NULL, "expiresAt" TIMESTAMP WITH TIME ZONE NOT NULL, "usedAt" TIMESTAMP WITH TIME ZONE, "requestedById" character varying(36) NOT NULL, CONSTRAINT "PK_8515e60a2cc41584fa4784f52ce" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE INDEX "IDX_05baebe80e9f8fab8207eda250" ON "password_reset"  ("userId") `);
        await queryRunner.query(`CREATE TABLE "refresh_token" ("id" character varying(36) NOT NULL, "createdAt" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "updatedAt" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "organisationId" character varying(36) NOT NULL, "userId" character varying(36) NOT NULL, "familyId" character varying(36) NOT NULL, "tokenHash" character varying(64) NOT NULL, "expiresAt" TIMESTAMP WITH TIME ZONE NOT NULL, "rotatedAt" TIMESTAMP WITH TIME ZONE, "revokedAt" TIMESTAMP WITH TIME ZONE, "userAgent" character varying(300), CONSTRAINT "PK_b575dd3c21fb0831013c909e7fe" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE INDEX "IDX_8e913e288156c133999341156a" ON "refresh_token"  ("userId") `);
        await queryRunner.query(`CREATE INDEX "IDX_b803086815f2d539fe7a0349d1" ON "refresh_token"  ("familyId") `);
        await queryRunner.query(`CREATE TABLE "document_counter" ("organisationId" character varying(36) NOT NULL, "kind" character varying(40) NOT NULL, "value" integer NOT NULL, CONSTRAINT "PK_be0e75f2df649496e6b6be3c709" PRIMARY KEY ("organisationId", "kind"))`);
        await queryRunner.query(`CREATE TABLE "outgoing_mail" ("id" character varying(36) NOT NULL, "createdAt" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "updatedAt" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "organisationId" character varying(36) NOT NULL, "purpose" character varying(40) NOT NULL, "subjectId" character varying(36), "toAddress" character varying(254) NOT NULL, "subject" character varying(300) NOT NULL, "text" text, "html" text, "state" character varying(10) NOT NULL DEFAULT 'queued', "attempts" integer NOT NULL DEFAULT '0', "nextAttemptAt" TIMESTAMP WITH TIME ZONE NOT NULL, "claimedUntil" TIMESTAMP WITH TIME ZONE, "lastError" character varying(500), "sentAt" TIMESTAMP WITH TIME ZONE, "createdById" character varying(36) NOT NULL, CONSTRAINT "PK_ed85381cac829352bf9e8238ff8" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE INDEX "IDX_fd38b56ed4df340a64471d476e" ON "outgoing_mail"  ("subjectId") `);
        await queryRunner.query(`CREATE INDEX "IDX_outgoing_mail_due" ON "outgoing_mail"  ("state", "nextAttemptAt") `);
        await queryRunner.query(`CREATE TABLE "organisation" ("id" character varying(36) NOT NULL, "createdAt" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "updatedAt" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "name" character varying(200) NOT NULL, "address" character varying(500), "phone" character varying(50), "email" character varying(254), "registrationNumber" character varying(60), "timeZone" character varying(60) NOT NULL DEFAULT 'Europe/London', "photoTags" text NOT NULL DEFAULT '[]', "keepPhotoLocation" boolean NOT NULL DEFAULT false, CONSTRAINT "PK_c725ae234ef1b74cce43d2d00c1" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE TABLE "photo_blob" ("organisationId" character varying(36) NOT NULL, "sha256" character varying(64) NOT NULL, "mime" character varying(40) NOT NULL, "bytes" integer NOT NULL, "width" integer NOT NULL, "height" integer NOT NULL, "createdAt" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "PK_d8f0a1e2e882e41f5b784a064b1" PRIMARY KEY ("organisationId", "sha256"))`);
        await queryRunner.query(`CREATE TABLE "sync_change" ("entity" character varying(40) NOT NULL, "rowId" character varying(36) NOT NULL, "organisationId" character varying(36) NOT NULL, "seq" integer NOT NULL, "siteId" character varying(36), "deleted" boolean NOT NULL DEFAULT false, CONSTRAINT "UQ_63c1913b57844da882b34f0eaa4" UNIQUE ("seq"), CONSTRAINT "PK_beba315fba4575c3cf6006dfd56" PRIMARY KEY ("entity", "rowId"))`);
        await queryRunner.query(`CREATE INDEX "IDX_sync_change_site" ON "sync_change"  ("siteId") `);
        await queryRunner.query(`CREATE INDEX "IDX_sync_change_org_seq" ON "sync_change"  ("organisationId", "seq") `);
        await queryRunner.query(`CREATE TABLE "sync_counter" ("name" character varying(20) NOT NULL, "value" integer NOT NULL, CONSTRAINT "PK_89e8fbe518a63ff309b07b63697" PRIMARY KEY ("name"))`);
        await queryRunner.query(`CREATE TABLE "applied_mutation" ("mutationId" character varying(64) NOT NULL, "organisationId" character varying(36) NOT NULL, "userId" character varying(36) NOT NULL, "deviceId" character varying(64) NOT NULL, "result" text NOT NULL, "appliedAt" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "PK_e2671d0bd433e5680271204bffd" PRIMARY KEY ("mutationId"))`);
        await queryRunner.query(`CREATE TABLE "sync_device" ("deviceId" character varying(64) NOT NULL, "organisationId" character varying(36) NOT NULL, "userId" character varying(36) NOT NULL, "checkpoint" integer NOT NULL DEFAULT '0', "scope" text, "previousCheckpoint" integer, "previousScope" text, "lastPullAt" TIMESTAMP WITH TIME ZONE, CONSTRAINT "PK_46983c027562dee1b55f5522b75" PRIMARY KEY ("deviceId"))`);
        await queryRunner.query(`CREATE TABLE "share_link" ("id" character varying(36) NOT NULL, "createdAt" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "updatedAt" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "organisationId" character varying(36) NOT NULL, "jobId" character varying(36) NOT NULL, "tokenHash" character varying(64) NOT NULL, "label" character varying(200), "expiresAt" TIMESTAMP WITH TIME ZONE NOT NULL, "revokedAt" TIMESTAMP WITH TIME ZONE, "revokedById" character varying(36), "createdById" character varying(36) NOT NULL, "lastOpenedAt" TIMESTAMP WITH TIME ZONE, "openCount" integer NOT NULL DEFAULT '0', CONSTRAINT "PK_c20801720fbd00896c634d4aa94" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE INDEX "IDX_2e73f9bf02ad6aab09658c7315" ON "share_link"  ("jobId") `);
        await queryRunner.query(`CREATE UNIQUE INDEX "IDX_a5465a28f9b179b7f06d1fc3a2" ON "share_link"  ("tokenHash") `);
        await queryRunner.query(`CREATE TABLE "user" ("id" character varying(36) NOT NULL, "createdAt" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "updatedAt" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "organisationId" character varying(36) NOT NULL, "email" character varying(254) NOT NULL, "name" character varying(200) NOT NULL, "role" character varying(20) NOT NULL, "passwordHash" character varying(300) NOT NULL, "active" boolean NOT NULL DEFAULT true, "lastSignInAt" TIMESTAMP WITH TIME ZONE, CONSTRAINT "PK_cace4a159ff9f2512dd42373760" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE UNIQUE INDEX "IDX_e12875dfb3b1d92d7d7c5377e2" ON "user"  ("email") `);
        await queryRunner.query(`CREATE TABLE "customer" ("id" character varying(36) NOT NULL, "organisationId" character varying(36) NOT NULL, "version" integer NOT NULL, "fieldMeta" text NOT NULL, "deletedAt" TIMESTAMP WITH TIME ZONE, "createdById" character varying(36), "updatedById" character varying(36), "createdAt" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "updatedAt" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "name" character varying(200) NOT NULL, "email" character varying(254), "phone" character varying(50), "address" character varying(500), "notes" text, CONSTRAINT "PK_a7a13f4cacb744524e44dfdad32" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE INDEX "IDX_customer_organisation_version" ON "customer"  ("organisationId", "version") `);
        await queryRunner.query(`CREATE TABLE "site" ("id" character varying(36) NOT NULL, "organisationId" character varying(36) NOT NULL, "version" integer NOT NULL, "fieldMeta" text NOT NULL, "deletedAt" TIMESTAMP WITH TIME ZONE, "createdById" character varying(36), "updatedById" character varying(36), "createdAt" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "updatedAt" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "customerId" character varying(36) NOT NULL, "name" character varying(200), "address" character varying(500) NOT NULL, "postcode" character varying(12), "accessNotes" text, "earthing" character varying(40), "zeOhm" double precision, "pfcKa" double precision, CONSTRAINT "PK_635c0eeabda8862d5b0237b42b4" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE INDEX "IDX_site_organisation_version" ON "site"  ("organisationId", "version") `);
        await queryRunner.query(`CREATE TABLE "area" ("id" character varying(36) NOT NULL, "organisationId" character varying(36) NOT NULL, "version" integer NOT NULL, "fieldMeta" text NOT NULL, "deletedAt" TIMESTAMP WITH TIME ZONE, "createdById" character varying(36), "updatedById" character varying(36), "createdAt" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "updatedAt" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "siteId" character varying(36) NOT NULL, "name" character varying(200) NOT NULL, "level" character varying(50), CONSTRAINT "PK_39d5e4de490139d6535d75f42ff" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE INDEX "IDX_area_organisation_version" ON "area"  ("organisationId", "version") `);
        await queryRunner.query(`CREATE INDEX "IDX_area_site" ON "area"  ("siteId") `);
        await queryRunner.query(`CREATE TABLE "board" ("id" character varying(36) NOT NULL, "organisationId" character varying(36) NOT NULL, "version" integer NOT NULL, "fieldMeta" text NOT NULL, "deletedAt" TIMESTAMP WITH TIME ZONE, "createdById" character varying(36), "updatedById" character varying(36), "createdAt" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "updatedAt" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "siteId" character varying(36) NOT NULL, "areaId" character varying(36), "name" character varying(200) NOT NULL, "description" character varying(500), CONSTRAINT "PK_865a0f2e22c140d261b1df80eb1" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE INDEX "IDX_board_organisation_version" ON "board"  ("organisationId", "version") `);
        await queryRunner.query(`CREATE INDEX "IDX_board_site" ON "board"  ("siteId") `);
        await queryRunner.query(`CREATE TABLE "circuit" ("id" character varying(36) NOT NULL, "organisationId" character varying(36) NOT NULL, "version" integer NOT NULL, "fieldMeta" text NOT NULL, "deletedAt" TIMESTAMP WITH TIME ZONE, "createdById" character varying(36), "updatedById" character varying(36), "createdAt" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "updatedAt" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "siteId" character varying(36) NOT NULL, "boardId" character varying(36) NOT NULL, "number" character varying(20) NOT NULL, "description" character varying(500), "kind" character varying(40), "deviceType" character varying(40), "deviceRatingA" double precision, "rcdRatingMa" double precision, "rcdType" character varying(20), "liveCsaMm2" double precision, "cpcCsaMm2" double precision, CONSTRAINT "PK_16d20c94e486b3613872aa43cad" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE INDEX "IDX_circuit_organisation_version" ON "circuit"  ("organisationId", "version") `);
        await queryRunner.query(`CREATE INDEX "IDX_circuit_site" ON "circuit"  ("siteId") `);
        await queryRunner.query(`CREATE TABLE "job" ("id" character varying(36) NOT NULL, "organisationId" character varying(36) NOT NULL, "version" integer NOT NULL, "fieldMeta" text NOT NULL, "deletedAt" TIMESTAMP WITH TIME ZONE, "createdById" character varying(36), "updatedById" character varying(36), "createdAt" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "updatedAt" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "siteId" character varying(36) NOT NULL, "customerId" character varying(36) NOT NULL, "reference" character varying(40), "title" character varying(200) NOT NULL, "status" character varying(40), "description" text, CONSTRAINT "PK_98ab1c14ff8d1cf80d18703b92f" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE INDEX "IDX_job_organisation_version" ON "job"  ("organisationId", "version") `);
        await queryRunner.query(`CREATE INDEX "IDX_job_site" ON "job"  ("siteId") `);
        await queryRunner.query(`CREATE TABLE "visit" ("id" character varying(36) NOT NULL, "organisationId" character varying(36) NOT NULL, "version" integer NOT NULL, "fieldMeta" text NOT NULL, "deletedAt" TIMESTAMP WITH TIME ZONE, "createdById" character varying(36), "updatedById" character varying(36), "createdAt" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "updatedAt" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "jobId" character varying(36) NOT NULL, "siteId" character varying(36) NOT NULL, "technicianIds" text, "plannedStart" character varying(30), "plannedEnd" character varying(30), "actualStart" character varying(30), "actualEnd" character varying(30), "status" character varying(40), "cautionsReadAt" character varying(30), "workDescription" text, "observations" text, "departures" text, "signedByName" character varying(200), "signedAt" character varying(30), "signatureSvg" text, CONSTRAINT "PK_c9919ef5a07627657c535d8eb88" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE INDEX "IDX_visit_organisation_version" ON "visit"  ("organisationId", "version") `);
        await queryRunner.query(`CREATE INDEX "IDX_visit_site" ON "visit"  ("siteId") `);
        await queryRunner.query(`CREATE TABLE "photo" ("id" character varying(36) NOT NULL, "organisationId" character varying(36) NOT NULL, "version" integer NOT NULL, "fieldMeta" text NOT NULL, "deletedAt" TIMESTAMP WITH TIME ZONE, "createdById" character varying(36), "updatedById" character varying(36), "createdAt" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "updatedAt" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "visitId" character varying(36) NOT NULL, "siteId" character varying(36) NOT NULL, "areaId" character varying(36), "subjectType" character varying(40), "subjectId" character varying(36), "caption" character varying(500), "tags" text, "takenAt" character varying(30), "sha256" character varying(64), "sizeBytes" integer, "width" integer, "height" integer, "uploadState" character varying(20), CONSTRAINT "PK_723fa50bf70dcfd06fb5a44d4ff" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE INDEX "IDX_photo_organisation_version" ON "photo"  ("organisationId", "version") `);
        await queryRunner.query(`CREATE INDEX "IDX_photo_site" ON "photo"  ("siteId") `);
        await queryRunner.query(`CREATE INDEX "IDX_photo_visit" ON "photo"  ("visitId") `);
        await queryRunner.query(`CREATE TABLE "note" ("id" character varying(36) NOT NULL, "organisationId" character varying(36) NOT NULL, "version" integer NOT NULL, "fieldMeta" text NOT NULL, "deletedAt" TIMESTAMP WITH TIME ZONE, "createdById" character varying(36), "updatedById" character varying(36), "createdAt" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "updatedAt" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "visitId" character varying(36) NOT NULL, "siteId" character varying(36) NOT NULL, "text" text NOT NULL, CONSTRAINT "PK_96d0c172a4fba276b1bbed43058" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE INDEX "IDX_note_organisation_version" ON "note"  ("organisationId", "version") `);
        await queryRunner.query(`CREATE INDEX "IDX_note_site" ON "note"  ("siteId") `);
        await queryRunner.query(`CREATE INDEX "IDX_note_visit" ON "note"  ("visitId") `);
        await queryRunner.query(`CREATE TABLE "cable_run" ("id" character varying(36) NOT NULL, "organisationId" character varying(36) NOT NULL, "version" integer NOT NULL, "fieldMeta" text NOT NULL, "deletedAt" TIMESTAMP WITH TIME ZONE, "createdById" character varying(36), "updatedById" character varying(36), "createdAt" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "updatedAt" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "siteId" character varying(36) NOT NULL, "label" character varying(100) NOT NULL, "medium" character varying(40), "endAAreaId" character varying(36), "endADescription" character varying(300), "endATermination" character varying(100), "endBAreaId" character varying(36), "endBDescription" character varying(300), "endBTermination" character varying(100), "status" character varying(40), "traceMethod" character varying(40), "lengthM" double precision, "nvp" double precision, "scheme" character varying(40), "wiremap" text, "verdict" character varying(40), "tdrNs" double precision, "linkKind" character varying(40), "testedAt" character varying(30), "lastVisitId" character varying(36), CONSTRAINT "PK_d9e0b1e5ee65dcfb528206820cd" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE INDEX "IDX_cable_run_organisation_version" ON "cable_run"  ("organisationId", "version") `);
        await queryRunner.query(`CREATE INDEX "IDX_cable_run_site" ON "cable_run"  ("siteId") `);
        await queryRunner.query(`CREATE TABLE "point_change" ("id" character varying(36) NOT NULL, "organisationId" character varying(36) NOT NULL, "version" integer NOT NULL, "fieldMeta" text NOT NULL, "deletedAt" TIMESTAMP WITH TIME ZONE, "createdById" character varying(36), "updatedById" character varying(36), "createdAt" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "updatedAt" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "visitId" character varying(36) NOT NULL, "siteId" character varying(36) NOT NULL, "circuitId" character varying(36), "action" character varying(40) NOT NULL, "accessoryKind" character varying(100), "fromAreaId" character varying(36), "fromDescription" character varying(300), "fromHeightMm" double precision, "toAreaId" character varying(36), "toDescription" character varying(300), "toHeightMm" double precision, "connection" character varying(40), "liveCsaMm2" double precision, "cpcCsaMm2" double precision, "addedRouteM" double precision, "fuseRatingA" double precision, "loadW" double precision, "beforeR1Ohm" double precision, "beforeRnOhm" double precision, "beforeR2Ohm" double precision, "concealedRoute" text, CONSTRAINT "PK_9316aadb636c48a72afa3de9f45" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE INDEX "IDX_point_change_organisation_version" ON "point_change"  ("organisationId", "version") `);
        await queryRunner.query(`CREATE INDEX "IDX_point_change_site" ON "point_change"  ("siteId") `);
        await queryRunner.query(`CREATE INDEX "IDX_point_change_visit" ON "point_change"  ("visitId") `);
        await queryRunner.query(`CREATE TABLE "test_result" ("id" character varying(36) NOT NULL, "organisationId" character varying(36) NOT NULL, "version" integer NOT NULL, "fieldMeta" text NOT NULL, "deletedAt" TIMESTAMP WITH TIME ZONE, "createdById" character varying(36), "updatedById" character varying(36), "createdAt" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "updatedAt" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "visitId" character varying(36) NOT NULL, "siteId" character varying(36) NOT NULL, "circuitId" character varying(36), "r1Ohm" double precision, "rnOhm" double precision, "r2Ohm" double precision, "r1r2Ohm" double precision, "irLiveLiveMOhm" double precision, "irLiveEarthMOhm" double precision, "irTestVoltageV" integer, "polarity" character varying(40), "zsOhm" double precision, "rcdTripMs" double precision, "rcdTripMs5x" double precision, "rcdButton" character varying(40), "instrument" character varying(200), "testedAt" character varying(30), "verdicts" text, CONSTRAINT "PK_95770fb76248f4c3def5de11a72" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE INDEX "IDX_test_result_organisation_version" ON "test_result"  ("organisationId", "version") `);
        await queryRunner.query(`CREATE INDEX "IDX_test_result_site" ON "test_result"  ("siteId") `);
        await queryRunner.query(`CREATE INDEX "IDX_test_result_visit" ON "test_result"  ("visitId") `);
        await queryRunner.query(`CREATE TABLE "document" ("id" character varying(36) NOT NULL, "organisationId" character varying(36) NOT NULL, "version" integer NOT NULL, "fieldMeta" text NOT NULL, "deletedAt" TIMESTAMP WITH TIME ZONE, "createdById" character varying(36), "updatedById" character varying(36), "createdAt" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "updatedAt" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "jobId" character varying(36) NOT NULL, "siteId" character varying(36) NOT NULL, "kind" character varying(40) NOT NULL, "visitId" character varying(36), "number" character varying(40), "title" character varying(200), "signerName" character varying(200), "pdfSha256" character varying(64), "pdfBytes" integer, "issuedAt" character varying(30), "issuedById" character varying(36), "emailState" character varying(40), "emailedTo" character varying(254), "emailedAt" character varying(30), "emailError" character varying(500), CONSTRAINT "PK_e57d3357f83f3cdc0acffc3d777" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE INDEX "IDX_document_organisation_version" ON "document"  ("organisationId", "version") `);
        await queryRunner.query(`CREATE INDEX "IDX_document_site" ON "document"  ("siteId") `);
        await queryRunner.query(`CREATE TABLE "conflict" ("id" character varying(36) NOT NULL, "organisationId" character varying(36) NOT NULL, "version" integer NOT NULL, "fieldMeta" text NOT NULL, "deletedAt" TIMESTAMP WITH TIME ZONE, "createdById" character varying(36), "updatedById" character varying(36), "createdAt" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "updatedAt" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "entity" character varying(40) NOT NULL, "rowId" character varying(36) NOT NULL, "field" character varying(60) NOT NULL, "reason" character varying(30) NOT NULL, "baseVersion" integer NOT NULL, "keptValue" text, "keptById" character varying(36), "keptHlc" character varying(120), "discardedValue" text, "discardedById" character varying(36), "discardedHlc" character varying(120), "discardedDeviceId" character varying(64), "resolvedAt" TIMESTAMP WITH TIME ZONE, "resolvedById" character varying(36), "resolution" text, CONSTRAINT "PK_f4b2f9c648b86fb42725e336dc5" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE INDEX "IDX_conflict_organisation_version" ON "conflict"  ("organisationId", "version") `);
        await queryRunner.query(`CREATE TABLE "price_item" ("id" character varying(36) NOT NULL, "organisationId" character varying(36) NOT NULL, "version" integer NOT NULL, "fieldMeta" text NOT NULL, "deletedAt" TIMESTAMP WITH TIME ZONE, "createdById" character varying(36), "updatedById" character varying(36), "createdAt" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "updatedAt" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "name" character varying(200) NOT NULL, "unit" character varying(20) NOT NULL, "category" character varying(60), "code" character varying(40), "costMinor" integer, "sellMinor" integer, "vatRateCode" character varying(20), "active" boolean, CONSTRAINT "PK_178cd9dbbbaa11cff1a0d7fdbb2" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE INDEX "IDX_price_item_organisation_version" ON "price_item"  ("organisationId", "version") `);
        await queryRunner.query(`CREATE TABLE "material_line" ("id" character varying(36) NOT NULL, "organisationId" character varying(36) NOT NULL, "version" integer NOT NULL, "fieldMeta" text NOT NULL, "deletedAt" TIMESTAMP WITH TIME ZONE, "createdById" character varying(36), "updatedById" character varying(36), "createdAt" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "updatedAt" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "visitId" character varying(36) NOT NULL, "siteId" character varying(36) NOT NULL, "priceItemId" character varying(36), "description" character varying(200) NOT NULL, "quantity" double precision NOT NULL, "unit" character varying(20), CONSTRAINT "PK_63b165788f018b7975c80dacbd7" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE INDEX "IDX_material_line_organisation_version" ON "material_line"  ("organisationId", "version") `);
        await queryRunner.query(`CREATE INDEX "IDX_material_line_site" ON "material_line"  ("siteId") `);
        await queryRunner.query(`CREATE INDEX "IDX_material_line_visit" ON "material_line"  ("visitId") `);
        await queryRunner.query(`ALTER TABLE "user" ADD CONSTRAINT "FK_642763a1acbc9672d38429ea62a" FOREIGN KEY ("organisationId") REFERENCES "organisation"("id") ON DELETE CASCADE ON UPDATE NO ACTION`);
    }

    public async down(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`ALTER TABLE "user" DROP CONSTRAINT "FK_642763a1acbc9672d38429ea62a"`);
        await queryRunner.query(`DROP INDEX "public"."IDX_material_line_visit"`);
        await queryRunner.query(`DROP INDEX "public"."IDX_material_line_site"`);
        await queryRunner.query(`DROP INDEX "public"."IDX_material_line_organisation_version"`);
        await queryRunner.query(`DROP TABLE "material_line"`);
        await queryRunner.query(`DROP INDEX "public"."IDX_price_item_organisation_version"`);
        await queryRunner.query(`DROP TABLE "price_item"`);
        await queryRunner.query(`DROP INDEX "public"."IDX_conflict_organisation_version"`);
        await queryRunner.query(`DROP TABLE "conflict"`);
        await queryRunner.query(`DROP INDEX "public"."IDX_document_site"`);
        await queryRunner.query(`DROP INDEX "public"."IDX_document_organisation_version"`);
        await queryRunner.query(`DROP TABLE "document"`);
        await queryRunner.query(`DROP INDEX "public"."IDX_test_result_visit"`);
        await queryRunner.query(`DROP INDEX "public"."IDX_test_result_site"`);
        await queryRunner.query(`DROP INDEX "public"."IDX_test_result_organisation_version"`);
        await queryRunner.query(`DROP TABLE "test_result"`);
        await queryRunner.query(`DROP INDEX "public"."IDX_point_change_visit"`);
        await queryRunner.query(`DROP INDEX "public"."IDX_point_change_site"`);
        await queryRunner.query(`DROP INDEX "public"."IDX_point_change_organisation_version"`);
        await queryRunner.query(`DROP TABLE "point_change"`);
        await queryRunner.query(`DROP INDEX "public"."IDX_cable_run_site"`);
        await queryRunner.query(`DROP INDEX "public"."IDX_cable_run_organisation_version"`);
        await queryRunner.query(`DROP TABLE "cable_run"`);
        await queryRunner.query(`DROP INDEX "public"."IDX_note_visit"`);
        await queryRunner.query(`DROP INDEX "public"."IDX_note_site"`);
        await queryRunner.query(`DROP INDEX "public"."IDX_note_organisation_version"`);
        await queryRunner.query(`DROP TABLE "note"`);
        await queryRunner.query(`DROP INDEX "public"."IDX_photo_visit"`);
        await queryRunner.query(`DROP INDEX "public"."IDX_photo_site"`);
        await queryRunner.query(`DROP INDEX "public"."IDX_photo_organisation_version"`);
        await queryRunner.query(`DROP TABLE "photo"`);
        await queryRunner.query(`DROP INDEX "public"."IDX_visit_site"`);
        await queryRunner.query(`DROP INDEX "public"."IDX_visit_organisation_version"`);
        await queryRunner.query(`DROP TABLE "visit"`);
        await queryRunner.query(`DROP INDEX "public"."IDX_job_site"`);
        await queryRunner.query(`DROP INDEX "public"."IDX_job_organisation_version"`);
        await queryRunner.query(`DROP TABLE "job"`);
        await queryRunner.query(`DROP INDEX "public"."IDX_circuit_site"`);
        await queryRunner.query(`DROP INDEX "public"."IDX_circuit_organisation_version"`);
        await queryRunner.query(`DROP TABLE "circuit"`);
        await queryRunner.query(`DROP INDEX "public"."IDX_board_site"`);
        await queryRunner.query(`DROP INDEX "public"."IDX_board_organisation_version"`);
        await queryRunner.query(`DROP TABLE "board"`);
        await queryRunner.query(`DROP INDEX "public"."IDX_area_site"`);
        await queryRunner.query(`DROP INDEX "public"."IDX_area_organisation_version"`);
        await queryRunner.query(`DROP TABLE "area"`);
        await queryRunner.query(`DROP INDEX "public"."IDX_site_organisation_version"`);
        await queryRunner.query(`DROP TABLE "site"`);
        await queryRunner.query(`DROP INDEX "public"."IDX_customer_organisation_version"`);
        await queryRunner.query(`DROP TABLE "customer"`);
        await queryRunner.query(`DROP INDEX "public"."IDX_e12875dfb3b1d92d7d7c5377e2"`);
        await queryRunner.query(`DROP TABLE "user"`);
        await queryRunner.query(`DROP INDEX "public"."IDX_a5465a28f9b179b7f06d1fc3a2"`);
        await queryRunner.query(`DROP INDEX "public"."IDX_2e73f9bf02ad6aab09658c7315"`);
        await queryRunner.query(`DROP TABLE "share_link"`);
        await queryRunner.query(`DROP TABLE "sync_device"`);
        await queryRunner.query(`DROP TABLE "applied_mutation"`);
        await queryRunner.query(`DROP TABLE "sync_counter"`);
        await queryRunner.query(`DROP INDEX "public"."IDX_sync_change_org_seq"`);
        await queryRunner.query(`DROP INDEX "public"."IDX_sync_change_site"`);
        await queryRunner.query(`DROP TABLE "sync_change"`);
        await queryRunner.query(`DROP TABLE "photo_blob"`);
        await queryRunner.query(`DROP TABLE "organisation"`);
        await queryRunner.query(`DROP INDEX "public"."IDX_outgoing_mail_due"`);
        await queryRunner.query(`DROP INDEX "public"."IDX_fd38b56ed4df340a64471d476e"`);
        await queryRunner.query(`DROP TABLE "outgoing_mail"`);
        await queryRunner.query(`DROP TABLE "document_counter"`);
        await queryRunner.query(`DROP INDEX "public"."IDX_b803086815f2d539fe7a0349d1"`);
        await queryRunner.query(`DROP INDEX "public"."IDX_8e913e288156c133999341156a"`);
        await queryRunner.query(`DROP TABLE "refresh_token"`);
        await queryRunner.query(`DROP INDEX "public"."IDX_05baebe80e9f8fab8207eda250"`);
        await queryRunner.query(`DROP TABLE "password_reset"`);
    }

}
