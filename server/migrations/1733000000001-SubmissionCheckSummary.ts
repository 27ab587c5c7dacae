import type { MigrationInterface, QueryRunner } from 'typeorm';

/** Check summary columns on submission, so the curator queue can sort by problems without reading every JSON. */
export class SubmissionCheckSummary1733000000001 implements MigrationInterface {
  name = 'SubmissionCheckSummary1733000000001';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`ALTER TABLE "submission" ADD COLUMN "problem_count" integer NOT NULL DEFAULT (0)`);
    await q.query(`ALTER TABLE "submission" ADD COLUMN "nearest_entry_id" varchar(80)`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`ALTER TABLE "submission" DROP COLUMN "nearest_entry_id"`);
    await q.query(`ALTER TABLE "submission" DROP COLUMN "problem_count"`);
  }
}
