import type { MigrationInterface, QueryRunner } from "typeorm";

/**
 * Who has shown the server a photo's bytes. Everyone who already has a photo row naming bytes the server holds is
 * counted as having shown them, so that phones in use keep working.
 */
export class PhotoSenders1796430000000 implements MigrationInterface {
    name = 'PhotoSenders1796430000000'

    public async up(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`CREATE TABLE "photo_sender" ("organisationId" varchar(36) NOT NULL, "sha256" varchar(64) NOT NULL, "userId" varchar(36) NOT NULL, PRIMARY KEY ("organisationId", "sha256", "userId"))`);
        await queryRunner.query(`INSERT INTO "photo_sender" ("organisationId", "sha256", "userId") SELECT DISTINCT "p"."organisationId", "p"."sha256", "p"."createdById" FROM "photo" "p" INNER JOIN "photo_blob" "b" ON "b"."organisationId" = "p"."organisationId" AND "b"."sha256" = "p"."sha256" WHERE "p"."createdById" IS NOT NULL`);
    }

    public async down(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`DROP TABLE "photo_sender"`);
    }
}
