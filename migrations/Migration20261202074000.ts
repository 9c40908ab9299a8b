import { Migration } from '@mikro-orm/migrations';

// Sign-in and sign-up throttling kept in the database (shared by every server, kept across restarts).
export class Migration20261202074000 extends Migration {

  override async up(): Promise<void> {
    this.addSql(`create table "sign_in_throttles" ("key" text not null, "failures" int not null, "window_started_at" timestamptz not null, "blocked_until" timestamptz null, constraint "sign_in_throttles_pkey" primary key ("key"));`);
    this.addSql(`create index "sign_in_throttles_window_idx" on "sign_in_throttles" ("window_started_at");`);
  }

  override async down(): Promise<void> {
    this.addSql(`drop table if exists "sign_in_throttles" cascade;`);
  }

}
