import { Migration } from '@mikro-orm/migrations';

// People joining and recovering: clients per project, share links, invitations by e-mail, password resets
// (tokens kept as SHA-256 only), and which project files a client may see.
export class Migration20261202070500 extends Migration {

  override async up(): Promise<void> {
    this.addSql(`create table "project_clients" ("id" uuid not null, "project_id" uuid not null, "user_id" uuid not null, "created_at" timestamptz not null, constraint "project_clients_pkey" primary key ("id"));`);
    this.addSql(`create index "project_clients_project_idx" on "project_clients" ("project_id");`);
    this.addSql(`create index "project_clients_user_idx" on "project_clients" ("user_id");`);
    this.addSql(`alter table "project_clients" add constraint "project_clients_project_user_unique" unique ("project_id", "user_id");`);
    this.addSql(`alter table "project_clients" add constraint "project_clients_project_id_foreign" foreign key ("project_id") references "projects" ("id") on update cascade on delete cascade;`);
    this.addSql(`alter table "project_clients" add constraint "project_clients_user_id_foreign" foreign key ("user_id") references "users" ("id") on update cascade on delete cascade;`);

    this.addSql(`create table "share_links" ("id" uuid not null, "project_id" uuid not null, "token_hash" text not null, "expires_at" timestamptz not null, "revoked_at" timestamptz null, "created_by_id" uuid null, "created_at" timestamptz not null, constraint "share_links_pkey" primary key ("id"));`);
    this.addSql(`create index "share_links_project_idx" on "share_links" ("project_id");`);
    this.addSql(`alter table "share_links" add constraint "share_links_token_hash_unique" unique ("token_hash");`);
    this.addSql(`alter table "share_links" add constraint "share_links_project_id_foreign" foreign key ("project_id") references "projects" ("id") on update cascade on delete cascade;`);
    this.addSql(`alter table "share_links" add constraint "share_links_created_by_id_foreign" foreign key ("created_by_id") references "users" ("id") on update cascade on delete set null;`);

    this.addSql(`create table "invitations" ("id" uuid not null, "workshop_id" uuid not null, "email" text not null, "role" text check ("role" in ('owner', 'designer', 'cutter', 'viewer', 'client')) not null, "project_ids" jsonb not null, "token_hash" text not null, "expires_at" timestamptz not null, "accepted_at" timestamptz null, "accepted_by_id" uuid null, "revoked_at" timestamptz null, "invited_by_id" uuid null, "created_at" timestamptz not null, constraint "invitations_pkey" primary key ("id"), constraint invitations_email_lowercase check (email = lower(email)));`);
    this.addSql(`create index "invitations_workshop_idx" on "invitations" ("workshop_id");`);
    this.addSql(`alter table "invitations" add constraint "invitations_token_hash_unique" unique ("token_hash");`);
    this.addSql(`alter table "invitations" add constraint "invitations_workshop_id_foreign" foreign key ("workshop_id") references "workshops" ("id") on update cascade on delete cascade;`);
    this.addSql(`alter table "invitations" add constraint "invitations_accepted_by_id_foreign" foreign key ("accepted_by_id") references "users" ("id") on update cascade on delete set null;`);
    this.addSql(`alter table "invitations" add constraint "invitations_invited_by_id_foreign" foreign key ("invited_by_id") references "users" ("id") on update cascade on delete set null;`);

    this.addSql(`create table "password_resets" ("id" uuid not null, "user_id" uuid not null, "token_hash" text not null, "expires_at" timestamptz not null, "used_at" timestamptz null, "created_at" timestamptz not null, constraint "password_resets_pkey" primary key ("id"));`);
    this.addSql(`create index "password_resets_user_idx" on "password_resets" ("user_id");`);
    this.addSql(`alter table "password_resets" add constraint "password_resets_token_hash_unique" unique ("token_hash");`);
    this.addSql(`alter table "password_resets" add constraint "password_resets_user_id_foreign" foreign key ("user_id") references "users" ("id") on update cascade on delete cascade;`);

    this.addSql(`alter table "attachments" add column "shared_with_client" boolean not null default false;`);
  }

  override async down(): Promise<void> {
    this.addSql(`alter table "attachments" drop column "shared_with_client";`);
    this.addSql(`drop table if exists "password_resets" cascade;`);
    this.addSql(`drop table if exists "invitations" cascade;`);
    this.addSql(`drop table if exists "share_links" cascade;`);
    this.addSql(`drop table if exists "project_clients" cascade;`);
  }

}
