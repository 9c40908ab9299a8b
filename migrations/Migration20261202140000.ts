import { Migration } from '@mikro-orm/migrations';

// The bin: who deleted a project or frame (shown beside it), and partial indexes so listing the bin and
// purging what has been there 30 days read only the deleted rows.
export class Migration20261202140000 extends Migration {

  override async up(): Promise<void> {
    this.addSql(`alter table "projects" add column "deleted_by_id" uuid null;`);
    this.addSql(`alter table "projects" add constraint "projects_deleted_by_id_foreign" foreign key ("deleted_by_id") references "users" ("id") on update cascade on delete set null;`);
    this.addSql(`create index "projects_bin_idx" on "projects" ("deleted_at") where "deleted_at" is not null;`);
    this.addSql(`alter table "frames" add column "deleted_by_id" uuid null;`);
    this.addSql(`alter table "frames" add constraint "frames_deleted_by_id_foreign" foreign key ("deleted_by_id") references "users" ("id") on update cascade on delete set null;`);
    this.addSql(`create index "frames_bin_idx" on "frames" ("deleted_at") where "deleted_at" is not null;`);
  }

  override async down(): Promise<void> {
    this.addSql(`drop index if exists "frames_bin_idx";`);
    this.addSql(`alter table "frames" drop constraint if exists "frames_deleted_by_id_foreign";`);
    this.addSql(`alter table "frames" drop column if exists "deleted_by_id";`);
    this.addSql(`drop index if exists "projects_bin_idx";`);
    this.addSql(`alter table "projects" drop constraint if exists "projects_deleted_by_id_foreign";`);
    this.addSql(`alter table "projects" drop column if exists "deleted_by_id";`);
  }

}
