import { Migration } from '@mikro-orm/migrations';

// Shop outputs and ordering: suppliers, orders with their frozen contents and status, the saw's cutting sessions
// and ticks (one tick per cut, unique), offcuts on the shelf, custom profiles, and project attachments (bytea).
export class Migration20261201222312 extends Migration {

  override async up(): Promise<void> {
    this.addSql(`create table "suppliers" ("id" uuid not null, "workshop_id" uuid not null, "name" text not null, "email" text not null, "currency" text not null default 'EUR', "stock" jsonb not null, "cut_fee" double precision not null default 0, "notes" text not null default '', "created_at" timestamptz not null, "updated_at" timestamptz not null, "deleted_at" timestamptz null, constraint "suppliers_pkey" primary key ("id"));`);
    this.addSql(`create index "suppliers_workshop_idx" on "suppliers" ("workshop_id");`);

    this.addSql(`create table "stock_offcuts" ("id" uuid not null, "workshop_id" uuid not null, "profile" text not null, "length_mm" double precision not null, "qty" int not null, "created_at" timestamptz not null, constraint "stock_offcuts_pkey" primary key ("id"), constraint stock_offcuts_qty_positive check (qty > 0), constraint stock_offcuts_length_positive check (length_mm > 0));`);
    this.addSql(`create index "stock_offcuts_workshop_idx" on "stock_offcuts" ("workshop_id");`);

    this.addSql(`create table "cut_sessions" ("id" uuid not null, "frame_id" uuid not null, "frame_version" int not null, "plan" jsonb not null, "started_by_id" uuid null, "started_at" timestamptz not null, constraint "cut_sessions_pkey" primary key ("id"));`);
    this.addSql(`create index "cut_sessions_frame_idx" on "cut_sessions" ("frame_id");`);

    this.addSql(`create table "cut_ticks" ("id" uuid not null, "session_id" uuid not null, "cut_key" text not null, "mark" text not null, "ticked_by_id" uuid null, "ticked_at" timestamptz not null, constraint "cut_ticks_pkey" primary key ("id"));`);
    this.addSql(`alter table "cut_ticks" add constraint "cut_ticks_session_key_unique" unique ("session_id", "cut_key");`);

    this.addSql(`create table "attachments" ("id" uuid not null, "project_id" uuid not null, "filename" text not null, "content_type" text not null, "size" int not null, "data" bytea not null, "uploaded_by_id" uuid null, "created_at" timestamptz not null, constraint "attachments_pkey" primary key ("id"));`);
    this.addSql(`create index "attachments_project_idx" on "attachments" ("project_id");`);

    this.addSql(`create table "orders" ("id" uuid not null, "workshop_id" uuid not null, "frame_id" uuid null, "supplier_id" uuid null, "reference" text not null, "status" text check ("status" in ('draft', 'sending', 'sent', 'received')) not null default 'draft', "mode" text check ("mode" in ('stock', 'cut-to-length')) not null default 'stock', "frame_version" int null, "contents" jsonb not null, "created_by_id" uuid null, "created_at" timestamptz not null, "sent_at" timestamptz null, "sent_by_id" uuid null, "sent_to" text null, "message_id" text null, "send_error" text null, "received_at" timestamptz null, constraint "orders_pkey" primary key ("id"));`);
    this.addSql(`create index "orders_workshop_idx" on "orders" ("workshop_id");`);
    this.addSql(`alter table "orders" add constraint "orders_workshop_reference_unique" unique ("workshop_id", "reference");`);

    this.addSql(`create table "custom_profiles" ("id" uuid not null, "workshop_id" uuid not null, "name" text not null, "width_mm" double precision not null, "height_mm" double precision not null, "area_mm2" double precision not null, "ix_mm4" double precision not null, "iy_mm4" double precision not null, "wx_mm3" double precision null, "wy_mm3" double precision null, "mass_kg_per_m" double precision not null, "created_at" timestamptz not null, constraint "custom_profiles_pkey" primary key ("id"));`);
    this.addSql(`alter table "custom_profiles" add constraint "custom_profiles_workshop_name_unique" unique ("workshop_id", "name");`);

    this.addSql(`alter table "suppliers" add constraint "suppliers_workshop_id_foreign" foreign key ("workshop_id") references "workshops" ("id") on update cascade on delete cascade;`);

    this.addSql(`alter table "stock_offcuts" add constraint "stock_offcuts_workshop_id_foreign" foreign key ("workshop_id") references "workshops" ("id") on update cascade on delete cascade;`);

    this.addSql(`alter table "cut_sessions" add constraint "cut_sessions_frame_id_foreign" foreign key ("frame_id") references "frames" ("id") on update cascade on delete cascade;`);
    this.addSql(`alter table "cut_sessions" add constraint "cut_sessions_started_by_id_foreign" foreign key ("started_by_id") references "users" ("id") on update cascade on delete set null;`);

    this.addSql(`alter table "cut_ticks" add constraint "cut_ticks_session_id_foreign" foreign key ("session_id") references "cut_sessions" ("id") on update cascade on delete cascade;`);
    this.addSql(`alter table "cut_ticks" add constraint "cut_ticks_ticked_by_id_foreign" foreign key ("ticked_by_id") references "users" ("id") on update cascade on delete set null;`);

    this.addSql(`alter table "attachments" add constraint "attachments_project_id_foreign" foreign key ("project_id") references "projects" ("id") on update cascade on delete cascade;`);
    this.addSql(`alter table "attachments" add constraint "attachments_uploaded_by_id_foreign" foreign key ("uploaded_by_id") references "users" ("id") on update cascade on delete set null;`);

    this.addSql(`alter table "orders" add constraint "orders_workshop_id_foreign" foreign key ("workshop_id") references "workshops" ("id") on update cascade on delete cascade;`);
    this.addSql(`alter table "orders" add constraint "orders_frame_id_foreign" foreign key ("frame_id") references "frames" ("id") on update cascade on delete set null;`);
    this.addSql(`alter table "orders" add constraint "orders_supplier_id_foreign" foreign key ("supplier_id") references "suppliers" ("id") on update cascade on delete set null;`);
    this.addSql(`alter table "orders" add constraint "orders_created_by_id_foreign" foreign key ("created_by_id") references "users" ("id") on update cascade on delete set null;`);
    this.addSql(`alter table "orders" add constraint "orders_sent_by_id_foreign" foreign key ("sent_by_id") references "users" ("id") on update cascade on delete set null;`);

    this.addSql(`alter table "custom_profiles" add constraint "custom_profiles_workshop_id_foreign" foreign key ("workshop_id") references "workshops" ("id") on update cascade on delete cascade;`);
  }

  override async down(): Promise<void> {
    this.addSql(`alter table "orders" drop constraint "orders_supplier_id_foreign";`);

    this.addSql(`alter table "cut_ticks" drop constraint "cut_ticks_session_id_foreign";`);

    this.addSql(`drop table if exists "suppliers" cascade;`);

    this.addSql(`drop table if exists "stock_offcuts" cascade;`);

    this.addSql(`drop table if exists "cut_sessions" cascade;`);

    this.addSql(`drop table if exists "cut_ticks" cascade;`);

    this.addSql(`drop table if exists "attachments" cascade;`);

    this.addSql(`drop table if exists "orders" cascade;`);

    this.addSql(`drop table if exists "custom_profiles" cascade;`);
  }

}
