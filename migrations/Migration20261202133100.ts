import { Migration } from '@mikro-orm/migrations';

// A workshop's own defaults (units, date format, kerf, trim, shortest offcut, load limits, spares, join, profile,
// stock bars); an empty object reads as the built-in defaults.
export class Migration20261202133100 extends Migration {

  override async up(): Promise<void> {
    this.addSql(`alter table "workshops" add column "settings" jsonb not null default '{}';`);
  }

  override async down(): Promise<void> {
    this.addSql(`alter table "workshops" drop column "settings";`);
  }

}
