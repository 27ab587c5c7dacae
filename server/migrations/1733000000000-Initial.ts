import type { MigrationInterface, QueryRunner } from 'typeorm';

/** The whole first schema, written by hand (the server never synchronizes). */
export class Initial1733000000000 implements MigrationInterface {
  name = 'Initial1733000000000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`CREATE TABLE "user" (
      "id" varchar(36) PRIMARY KEY NOT NULL,
      "email" varchar(254) NOT NULL UNIQUE,
      "display_name" varchar(100) NOT NULL,
      "role" varchar(16) NOT NULL CHECK ("role" IN ('student','analyst','curator','admin')),
      "password_hash" varchar(100) NOT NULL,
      "demo" boolean NOT NULL DEFAULT (0),
      "disabled" boolean NOT NULL DEFAULT (0),
      "created_at" datetime NOT NULL,
      "updated_at" datetime NOT NULL
    )`);
    await q.query(`CREATE TABLE "library_entry" (
      "entry_id" varchar(80) NOT NULL,
      "revision" integer NOT NULL,
      "name" varchar(200) NOT NULL,
      "status" varchar(16) NOT NULL CHECK ("status" IN ('current','superseded','retired')),
      "body" text NOT NULL,
      "seq" integer NOT NULL UNIQUE,
      "submission_id" varchar(36),
      "created_by" varchar(36) REFERENCES "user"("id"),
      "created_at" datetime NOT NULL,
      "updated_at" datetime NOT NULL,
      PRIMARY KEY ("entry_id", "revision")
    )`);
    await q.query(`CREATE INDEX "idx_library_entry_status_seq" ON "library_entry" ("status", "seq")`);
    // At most one visible (current or retired) revision per entry.
    await q.query(`CREATE UNIQUE INDEX "uq_library_entry_visible" ON "library_entry" ("entry_id") WHERE "status" <> 'superseded'`);
    await q.query(`CREATE TABLE "refresh_token" (
      "id" varchar(36) PRIMARY KEY NOT NULL,
      "user_id" varchar(36) NOT NULL REFERENCES "user"("id") ON DELETE CASCADE,
      "token_hash" varchar(64) NOT NULL UNIQUE,
      "expires_at" datetime NOT NULL,
      "revoked_at" datetime,
      "created_at" datetime NOT NULL
    )`);
    await q.query(`CREATE INDEX "idx_refresh_token_user" ON "refresh_token" ("user_id")`);
    await q.query(`CREATE TABLE "password_reset" (
      "id" varchar(36) PRIMARY KEY NOT NULL,
      "user_id" varchar(36) NOT NULL REFERENCES "user"("id") ON DELETE CASCADE,
      "token_hash" varchar(64) NOT NULL UNIQUE,
      "expires_at" datetime NOT NULL,
      "used_at" datetime,
      "created_at" datetime NOT NULL
    )`);
    await q.query(`CREATE TABLE "submission" (
      "id" varchar(36) PRIMARY KEY NOT NULL,
      "submitter_id" varchar(36) NOT NULL REFERENCES "user"("id"),
      "kind" varchar(16) NOT NULL CHECK ("kind" IN ('new','change')),
      "entry_id" varchar(80) NOT NULL,
      "base_revision" integer,
      "name" varchar(200) NOT NULL,
      "body" text NOT NULL,
      "source_format" varchar(16) NOT NULL,
      "file_name" varchar(255),
      "status" varchar(24) NOT NULL,
      "checks" text NOT NULL,
      "student_work" boolean NOT NULL DEFAULT (0),
      "note" text,
      "decision_comment" text,
      "decided_by" varchar(36) REFERENCES "user"("id"),
      "decided_at" datetime,
      "version" integer NOT NULL,
      "created_at" datetime NOT NULL,
      "updated_at" datetime NOT NULL
    )`);
    await q.query(`CREATE INDEX "idx_submission_status_created" ON "submission" ("status", "created_at")`);
    await q.query(`CREATE INDEX "idx_submission_submitter" ON "submission" ("submitter_id")`);
    await q.query(`CREATE TABLE "audit_log" (
      "id" integer PRIMARY KEY AUTOINCREMENT NOT NULL,
      "at" datetime NOT NULL,
      "actor_id" varchar(36),
      "action" varchar(64) NOT NULL,
      "subject_type" varchar(32) NOT NULL,
      "subject_id" varchar(80) NOT NULL,
      "details" text NOT NULL
    )`);
    await q.query(`CREATE INDEX "idx_audit_log_subject" ON "audit_log" ("subject_type", "subject_id")`);
    await q.query(`CREATE TABLE "mail_message" (
      "id" varchar(36) PRIMARY KEY NOT NULL,
      "kind" varchar(32) NOT NULL,
      "to_address" varchar(254) NOT NULL,
      "subject" varchar(300) NOT NULL,
      "body_text" text,
      "transport" varchar(16) NOT NULL,
      "status" varchar(16) NOT NULL,
      "error" text,
      "created_at" datetime NOT NULL
    )`);
    await q.query(`CREATE INDEX "idx_mail_message_created" ON "mail_message" ("created_at")`);
  }

  async down(q: QueryRunner): Promise<void> {
    for (const t of ['mail_message', 'audit_log', 'submission', 'password_reset', 'refresh_token', 'library_entry', 'user']) {
      await q.query(`DROP TABLE "${t}"`);
    }
  }
}
