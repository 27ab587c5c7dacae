import type { MigrationInterface, QueryRunner } from 'typeorm';

export class LocalInit1733000000000 implements MigrationInterface {
  name = 'LocalInit1733000000000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(
      `CREATE TABLE "library_entry" ("id" varchar(80) PRIMARY KEY NOT NULL, "name" varchar(200) NOT NULL, "category" varchar(20) NOT NULL, "solvent" varchar(20) NOT NULL, "revision" integer NOT NULL DEFAULT 1, "body" text NOT NULL, "updatedAt" varchar(40) NOT NULL)`,
    );
    await q.query(`CREATE INDEX "idx_library_entry_name" ON "library_entry" ("name")`);
    await q.query(`CREATE TABLE "setting" ("key" varchar(80) PRIMARY KEY NOT NULL, "value" text NOT NULL)`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`DROP TABLE "setting"`);
    await q.query(`DROP INDEX "idx_library_entry_name"`);
    await q.query(`DROP TABLE "library_entry"`);
  }
}
