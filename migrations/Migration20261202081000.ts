import { Migration } from '@mikro-orm/migrations';

// What happened on each project and who did it (saves, orders sent, cuts ticked, invitations), for its page.
export class Migration20261202081000 extends Migration {

  override async up(): Promise<void> {
    this.addSql(`create table "project_activity" ("id" uuid not null, "project_id" uuid not null, "user_id" uuid null, "kind" text check ("kind" in ('frame.created', 'frame.saved', 'order.sent', 'cuts.ticked', 'client.invited', 'client.removed', 'link.made', 'link.revoked')) not null, "subject" text not null, "group_key" text not null default '', "count" int not null default 1, "first_at" timestamptz not null, "last_at" timestamptz not null, constraint "project_activity_pkey" primary key ("id"));`);
    this.addSql(`create index "project_activity_project_idx" on "project_activity" ("project_id", "last_at");`);
    this.addSql(`alter table "project_activity" add constraint "project_activity_project_id_foreign" foreign key ("project_id") references "projects" ("id") on update cascade on delete cascade;`);
    this.addSql(`alter table "project_activity" add constraint "project_activity_user_id_foreign" foreign key ("user_id") references "users" ("id") on update cascade on delete set null;`);
  }

  override async down(): Promise<void> {
    this.addSql(`drop table if exists "project_activity" cascade;`);
  }

}
