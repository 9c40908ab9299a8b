import { Migration } from '@mikro-orm/migrations';

// Revisions per editing stretch: the current document's name and whether it is kept when replaced, and a name
// on each kept revision.
export class Migration20261202133000 extends Migration {

  override async up(): Promise<void> {
    this.addSql(`alter table "frames" add column "head_name" text null, add column "head_kept" boolean not null default false;`);
    this.addSql(`alter table "frame_revisions" add column "name" text null;`);
  }

  override async down(): Promise<void> {
    this.addSql(`alter table "frames" drop column "head_name", drop column "head_kept";`);
    this.addSql(`alter table "frame_revisions" drop column "name";`);
  }

}
