import { Migration } from '@mikro-orm/migrations';

/** Collection: species catalogue, animals, molts and photos (schema only; the catalogue rows come next). */
export class Migration20261201205506 extends Migration {
  override async up(): Promise<void> {
    this.addSql(`create type "species_group" as enum ('nw-terrestrial', 'nw-arboreal', 'ow-terrestrial', 'ow-arboreal', 'fossorial');`);
    this.addSql(`create type "animal_sex" as enum ('female', 'male', 'unsexed');`);
    this.addSql(`create type "animal_maturity" as enum ('immature', 'mature');`);
    this.addSql(`create type "animal_owner_kind" as enum ('self', 'keeper', 'party');`);
    this.addSql(`create type "animal_custody" as enum ('with-owner', 'loan-in', 'loan-out');`);
    this.addSql(`create type "animal_status" as enum ('active', 'on-loan', 'sold', 'deceased');`);
    this.addSql(`create type "exuvia_sex" as enum ('female', 'male', 'not-sure');`);
    this.addSql(
      `create table "species" ("id" uuid not null, "created_at" timestamptz not null, "updated_at" timestamptz not null, "key" text not null, "scientific_name" text not null, "genus" text not null, "authority" text not null, "former_names" text[] not null, "common_names" text[] not null, "group" "species_group" not null, "urticating_hairs" boolean not null, "medically_significant_venom" boolean not null, "trade_listing" text null, "pull_from_day" smallint null, "pull_to_day" smallint null, "pairing_to_sac_min_days" smallint null, "pairing_to_sac_max_days" smallint null, "eggs_min" int null, "eggs_max" int null, "lifespan_min_months" smallint null, "lifespan_max_months" smallint null, "sources" jsonb not null, constraint "species_pkey" primary key ("id"));`,
    );
    this.addSql(`alter table "species" add constraint "species_key_unique" unique ("key");`);
    this.addSql(`alter table "species" add constraint "species_scientific_name_unique" unique ("scientific_name");`);
    this.addSql(`create index "species_genus_index" on "species" ("genus");`);

    this.addSql(
      `create table "photos" ("id" uuid not null, "created_at" timestamptz not null, "updated_at" timestamptz not null, "uploaded_by_id" uuid not null, "subject_type" text not null, "subject_id" uuid not null, "storage_key" text not null, "thumb_key" text not null, "content_type" text not null, "width" int not null, "height" int not null, "bytes" int not null, constraint "photos_pkey" primary key ("id"));`,
    );
    this.addSql(`create index "photos_subject_type_subject_id_index" on "photos" ("subject_type", "subject_id");`);

    this.addSql(
      `create table "animals" ("id" uuid not null, "created_at" timestamptz not null, "updated_at" timestamptz not null, "recorded_by_id" uuid not null, "species_id" uuid not null, "label" text not null, "sex" "animal_sex" not null, "maturity" "animal_maturity" not null default 'immature', "matured_on" date null, "acquired_on" date null, "acquired_from" text null, "price_paid_minor" int null, "price_currency" char(3) null, "owner_kind" "animal_owner_kind" not null default 'self', "owner_user_id" uuid null, "owner_name" text null, "owner_email" text null, "custody" "animal_custody" not null default 'with-owner', "custody_party" text null, "due_back_on" date null, "status" "animal_status" not null default 'active', "status_on" date null, "enclosure" text null, "notes" text null, "premolt_note" text null, "last_molt_on" date null, constraint "animals_pkey" primary key ("id"));`,
    );
    this.addSql(`create index "animals_recorded_by_id_matured_on_index" on "animals" ("recorded_by_id", "matured_on");`);
    this.addSql(`create index "animals_recorded_by_id_sex_maturity_index" on "animals" ("recorded_by_id", "sex", "maturity");`);
    this.addSql(`create index "animals_recorded_by_id_status_index" on "animals" ("recorded_by_id", "status");`);
    this.addSql(`create index "animals_recorded_by_id_species_id_index" on "animals" ("recorded_by_id", "species_id");`);
    this.addSql(`create index "animals_recorded_by_id_created_at_index" on "animals" ("recorded_by_id", "created_at");`);
    this.addSql(`alter table "animals" add constraint "animals_recorded_by_id_label_unique" unique ("recorded_by_id", "label");`);

    this.addSql(
      `create table "molts" ("id" uuid not null, "created_at" timestamptz not null, "updated_at" timestamptz not null, "animal_id" uuid not null, "molted_on" date not null, "exuvia_sex" "exuvia_sex" null, "size_cm" numeric(4,1) null, "maturing" boolean not null default false, "notes" text null, constraint "molts_pkey" primary key ("id"));`,
    );
    // Text search over labels and enclosures uses trigram indexes, so "%q%" stays fast for thousands of rows.
    this.addSql(`create extension if not exists pg_trgm;`);
    this.addSql(`create index "animals_label_trgm_index" on "animals" using gin (lower("label") gin_trgm_ops);`);
    this.addSql(`create index "animals_enclosure_trgm_index" on "animals" using gin (lower("enclosure") gin_trgm_ops);`);

    this.addSql(`create index "molts_animal_id_molted_on_index" on "molts" ("animal_id", "molted_on");`);

    this.addSql(
      `alter table "photos" add constraint "photos_uploaded_by_id_foreign" foreign key ("uploaded_by_id") references "users" ("id") on update cascade on delete cascade;`,
    );

    this.addSql(
      `alter table "animals" add constraint "animals_recorded_by_id_foreign" foreign key ("recorded_by_id") references "users" ("id") on update cascade on delete cascade;`,
    );
    this.addSql(
      `alter table "animals" add constraint "animals_species_id_foreign" foreign key ("species_id") references "species" ("id") on update cascade on delete restrict;`,
    );
    this.addSql(
      `alter table "animals" add constraint "animals_owner_user_id_foreign" foreign key ("owner_user_id") references "users" ("id") on update cascade on delete set null;`,
    );

    this.addSql(
      `alter table "molts" add constraint "molts_animal_id_foreign" foreign key ("animal_id") references "animals" ("id") on update cascade on delete cascade;`,
    );
  }

  override async down(): Promise<void> {
    this.addSql(`drop table if exists "molts" cascade;`);
    this.addSql(`drop table if exists "animals" cascade;`);
    this.addSql(`drop table if exists "photos" cascade;`);
    this.addSql(`drop table if exists "species" cascade;`);
    for (const type of ['exuvia_sex', 'animal_status', 'animal_custody', 'animal_owner_kind', 'animal_maturity', 'animal_sex', 'species_group']) {
      this.addSql(`drop type if exists "${type}";`);
    }
  }
}
