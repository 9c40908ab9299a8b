import { Migration } from '@mikro-orm/migrations';

// The foundation schema: accounts, workshops and memberships, projects, frames and their revisions, and the
// table express-session keeps sessions in (connect-pg-simple's layout; the entities leave it out of diffs).
export class Migration20261201215916 extends Migration {

  override async up(): Promise<void> {
    this.addSql(`create table "session" ("sid" varchar not null collate "default", "sess" json not null, "expire" timestamp(6) not null, constraint "session_pkey" primary key ("sid"));`);
    this.addSql(`create index "IDX_session_expire" on "session" ("expire");`);

    this.addSql(`create table "users" ("id" uuid not null, "email" text not null, "name" text not null, "password_hash" text not null, "created_at" timestamptz not null, constraint "users_pkey" primary key ("id"), constraint users_email_lowercase check (email = lower(email)));`);
    this.addSql(`alter table "users" add constraint "users_email_unique" unique ("email");`);

    this.addSql(`create table "workshops" ("id" uuid not null, "name" text not null, "created_at" timestamptz not null, "updated_at" timestamptz not null, constraint "workshops_pkey" primary key ("id"));`);

    this.addSql(`create table "projects" ("id" uuid not null, "workshop_id" uuid not null, "name" text not null, "client" text not null default '', "notes" text not null default '', "created_at" timestamptz not null, "updated_at" timestamptz not null, "deleted_at" timestamptz null, constraint "projects_pkey" primary key ("id"));`);
    this.addSql(`create index "projects_workshop_idx" on "projects" ("workshop_id");`);

    this.addSql(`create table "frames" ("id" uuid not null, "project_id" uuid not null, "name" text not null, "document" jsonb not null, "version" int not null default 1, "member_count" int not null default 0, "saved_at" timestamptz not null, "saved_by_id" uuid null, "created_at" timestamptz not null, "updated_at" timestamptz not null, "deleted_at" timestamptz null, constraint "frames_pkey" primary key ("id"), constraint frames_version_positive check (version >= 1));`);
    this.addSql(`create index "frames_project_idx" on "frames" ("project_id");`);

    this.addSql(`create table "frame_revisions" ("id" uuid not null, "frame_id" uuid not null, "version" int not null, "document" jsonb not null, "member_count" int not null, "saved_at" timestamptz not null, "saved_by_id" uuid null, constraint "frame_revisions_pkey" primary key ("id"));`);
    this.addSql(`alter table "frame_revisions" add constraint "frame_revisions_frame_version_unique" unique ("frame_id", "version");`);

    this.addSql(`create table "memberships" ("id" uuid not null, "workshop_id" uuid not null, "user_id" uuid not null, "role" text check ("role" in ('owner', 'designer', 'cutter', 'viewer')) not null, "created_at" timestamptz not null, constraint "memberships_pkey" primary key ("id"));`);
    this.addSql(`create index "memberships_workshop_idx" on "memberships" ("workshop_id");`);
    this.addSql(`create index "memberships_user_idx" on "memberships" ("user_id");`);
    this.addSql(`alter table "memberships" add constraint "memberships_workshop_user_unique" unique ("workshop_id", "user_id");`);

    this.addSql(`alter table "projects" add constraint "projects_workshop_id_foreign" foreign key ("workshop_id") references "workshops" ("id") on update cascade on delete cascade;`);

    this.addSql(`alter table "frames" add constraint "frames_project_id_foreign" foreign key ("project_id") references "projects" ("id") on update cascade on delete cascade;`);
    this.addSql(`alter table "frames" add constraint "frames_saved_by_id_foreign" foreign key ("saved_by_id") references "users" ("id") on update cascade on delete set null;`);

    this.addSql(`alter table "frame_revisions" add constraint "frame_revisions_frame_id_foreign" foreign key ("frame_id") references "frames" ("id") on update cascade on delete cascade;`);
    this.addSql(`alter table "frame_revisions" add constraint "frame_revisions_saved_by_id_foreign" foreign key ("saved_by_id") references "users" ("id") on update cascade on delete set null;`);

    this.addSql(`alter table "memberships" add constraint "memberships_workshop_id_foreign" foreign key ("workshop_id") references "workshops" ("id") on update cascade on delete cascade;`);
    this.addSql(`alter table "memberships" add constraint "memberships_user_id_foreign" foreign key ("user_id") references "users" ("id") on update cascade on delete cascade;`);
  }

  override async down(): Promise<void> {
    this.addSql(`alter table "frames" drop constraint "frames_saved_by_id_foreign";`);

    this.addSql(`alter table "frame_revisions" drop constraint "frame_revisions_saved_by_id_foreign";`);

    this.addSql(`alter table "memberships" drop constraint "memberships_user_id_foreign";`);

    this.addSql(`alter table "projects" drop constraint "projects_workshop_id_foreign";`);

    this.addSql(`alter table "memberships" drop constraint "memberships_workshop_id_foreign";`);

    this.addSql(`alter table "frames" drop constraint "frames_project_id_foreign";`);

    this.addSql(`alter table "frame_revisions" drop constraint "frame_revisions_frame_id_foreign";`);

    this.addSql(`drop table if exists "users" cascade;`);

    this.addSql(`drop table if exists "workshops" cascade;`);

    this.addSql(`drop table if exists "projects" cascade;`);

    this.addSql(`drop table if exists "frames" cascade;`);

    this.addSql(`drop table if exists "frame_revisions" cascade;`);

    this.addSql(`drop table if exists "memberships" cascade;`);

    this.addSql(`drop table if exists "session";`);
  }

}
