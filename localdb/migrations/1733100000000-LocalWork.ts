import type { MigrationInterface, QueryRunner } from 'typeorm';

/** History of analyses and the outbox of unsent work. */
export class LocalWork1733100000000 implements MigrationInterface {
  name = 'LocalWork1733100000000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(
      `CREATE TABLE "analysis" ("id" varchar(40) PRIMARY KEY NOT NULL, "name" varchar(200) NOT NULL, "createdAt" varchar(40) NOT NULL, "nucleus" varchar(10) NOT NULL, "demo" integer NOT NULL DEFAULT 0, "summary" text NOT NULL, "body" text NOT NULL)`,
    );
    await q.query(`CREATE INDEX "idx_analysis_created" ON "analysis" ("createdAt")`);
    await q.query(
      `CREATE TABLE "outbox" ("id" varchar(40) PRIMARY KEY NOT NULL, "kind" varchar(20) NOT NULL, "status" varchar(20) NOT NULL, "title" varchar(200) NOT NULL, "body" text NOT NULL, "serverId" varchar(80), "message" text, "createdAt" varchar(40) NOT NULL, "updatedAt" varchar(40) NOT NULL)`,
    );
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`DROP TABLE "outbox"`);
    await q.query(`DROP INDEX "idx_analysis_created"`);
    await q.query(`DROP TABLE "analysis"`);
  }
}
