import type { MigrationInterface, QueryRunner } from "typeorm";

/**
 * One person (an e-mail address and a password) may belong to several organisations: the password moves to
 * "person", and each "user" row becomes that person's membership of one organisation. Every existing user becomes a
 * person of the same id. Written by hand as ADD and DROP COLUMN: a rebuild of "user" would drop columns added beside
 * this one.
 */
export class PeopleAndMemberships1796500100000 implements MigrationInterface {
    name = 'PeopleAndMemberships1796500100000'

    public async up(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`CREATE TABLE "person" ("id" varchar(36) PRIMARY KEY NOT NULL, "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "updatedAt" datetime NOT NULL DEFAULT (datetime('now')), "email" varchar(254) NOT NULL, "passwordHash" varchar(300) NOT NULL)`);
        await queryRunner.query(`CREATE UNIQUE INDEX "IDX_d2d717efd90709ebd3cb26b936" ON "person" ("email") `);
        // One person per address (addresses were unique until now; after an undo one may be listed twice).
        await queryRunner.query(`INSERT INTO "person" ("id", "createdAt", "updatedAt", "email", "passwordHash") SELECT "u"."id", "u"."createdAt", "u"."updatedAt", "u"."email", "u"."passwordHash" FROM "user" "u" WHERE "u"."id" = (SELECT MIN("o"."id") FROM "user" "o" WHERE "o"."email" = "u"."email")`);
        await queryRunner.query(`ALTER TABLE "user" ADD COLUMN "personId" varchar(36) NOT NULL DEFAULT ('')`);
        await queryRunner.query(`UPDATE "user" SET "personId" = (SELECT "p"."id" FROM "person" "p" WHERE "p"."email" = "user"."email")`);
        await queryRunner.query(`DROP INDEX "IDX_e12875dfb3b1d92d7d7c5377e2"`);
        await queryRunner.query(`ALTER TABLE "user" DROP COLUMN "passwordHash"`);
        await queryRunner.query(`CREATE INDEX "IDX_6aac19005cea8e2119cbe7759e" ON "user" ("personId") `);
        await queryRunner.query(`CREATE UNIQUE INDEX "IDX_8294ee7b3d4e25f5ed427426fd" ON "user" ("organisationId", "email") `);
    }

    /** Every membership keeps its person's password; an address in two organisations keeps its index, not unique. */
    public async down(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`ALTER TABLE "user" ADD COLUMN "passwordHash" varchar(300) NOT NULL DEFAULT ('')`);
        await queryRunner.query(`UPDATE "user" SET "passwordHash" = (SELECT "p"."passwordHash" FROM "person" "p" WHERE "p"."id" = "user"."personId")`);
        await queryRunner.query(`DROP INDEX "IDX_8294ee7b3d4e25f5ed427426fd"`);
        await queryRunner.query(`DROP INDEX "IDX_6aac19005cea8e2119cbe7759e"`);
        await queryRunner.query(`ALTER TABLE "user" DROP COLUMN "personId"`);
        await queryRunner.query(`CREATE INDEX "IDX_e12875dfb3b1d92d7d7c5377e2" ON "user" ("email") `);
        await queryRunner.query(`DROP INDEX "IDX_d2d717efd90709ebd3cb26b936"`);
        await queryRunner.query(`DROP TABLE "person"`);
    }
}
