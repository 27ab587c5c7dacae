import type { MigrationInterface, QueryRunner } from 'typeorm';

/** Outbox items belong to the account that made them (a shared bench device has several). */
export class OutboxOwner1733200000000 implements MigrationInterface {
  name = 'OutboxOwner1733200000000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`ALTER TABLE "outbox" ADD COLUMN "userId" varchar(80)`);
    await q.query(`CREATE INDEX "idx_outbox_user" ON "outbox" ("userId")`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`DROP INDEX "idx_outbox_user"`);
    await q.query(`ALTER TABLE "outbox" DROP COLUMN "userId"`);
  }
}
