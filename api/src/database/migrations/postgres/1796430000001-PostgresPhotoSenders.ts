import type { MigrationInterface, QueryRunner } from "typeorm";

/** PostgreSQL's side of PhotoSenders1796430000000: who has shown the server a photo's bytes. */
export class PostgresPhotoSenders1796430000001 implements MigrationInterface {
    name = 'PostgresPhotoSenders1796430000001'

    public async up(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`CREATE TABLE "photo_sender" ("organisationId" character varying(36) NOT NULL, "sha256" character varying(64) NOT NULL, "userId" character varying(36) NOT NULL, CONSTRAINT "PK_cf6682149a083de2135f1e29bb1" PRIMARY KEY ("organisationId", "sha256", "userId"))`);
        await queryRunner.query(`INSERT INTO "photo_sender" ("organisationId", "sha256", "userId") SELECT DISTINCT "p"."organisationId", "p"."sha256", "p"."createdById" FROM "photo" "p" INNER JOIN "photo_blob" "b" ON "b"."organisationId" = "p"."organisationId" AND "b"."sha256" = "p"."sha256" WHERE "p"."createdById" IS NOT NULL`);
    }

    public async down(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`DROP TABLE "photo_sender"`);
    }
}
