import { Migration } from '@mikro-orm/migrations';

/** Egg sacs: the sac, its care log (with strike corrections), the opening and the brood's counts. */
export class Migration20261201212209 extends Migration {
  override async up(): Promise<void> {
    this.addSql(`create type "sac_outcome" as enum ('in-progress', 'hatched', 'failed');`);
    this.addSql(`create type "sac_failure_reason" as enum ('infertile', 'spoiled', 'eaten', 'other');`);
    this.addSql(`create type "brood_stage" as enum ('eggs', 'eggs-with-legs', 'first-instar', 'second-instar');`);
    this.addSql(`create type "care_log_kind" as enum ('roll', 'temperature', 'humidity', 'check', 'stage', 'note', 'strike');`);
    this.addSql(`create type "brood_loss_reason" as enum ('died', 'failed-molt', 'cannibalism', 'mould', 'escaped', 'other');`);
    this.addSql(`create type "brood_count_source" as enum ('opening', 'count');`);
    this.addSql(
      `create table "sacs" ("id" uuid not null, "created_at" timestamptz not null, "updated_at" timestamptz not null, "project_id" uuid not null, "lay_date" date not null, "pulled_at" timestamptz null, "pulled_on" date null, "outcome" "sac_outcome" not null default 'in-progress', "failure_reason" "sac_failure_reason" null, "pull_from_day" smallint null, "pull_to_day" smallint null, "roll_interval_hours" smallint not null default 12, "rolling_off" boolean not null default false, "brood_stage" "brood_stage" not null default 'eggs', "notes" text null, "recorded_by_id" uuid not null, constraint "sacs_pkey" primary key ("id"));`,
    );
    this.addSql(`create index "sacs_project_id_lay_date_index" on "sacs" ("project_id", "lay_date");`);

    this.addSql(
      `create table "sac_openings" ("id" uuid not null, "created_at" timestamptz not null, "updated_at" timestamptz not null, "sac_id" uuid not null, "opened_at" timestamptz not null, "healthy_eggs" int not null, "eggs_with_legs" int not null, "nymphs" int not null, "dark_eggs" int not null, "spoiled_eggs" int not null, "kept_back" int not null, "notes" text null, "recorded_by_id" uuid not null, constraint "sac_openings_pkey" primary key ("id"));`,
    );
    this.addSql(`alter table "sac_openings" add constraint "sac_openings_sac_id_unique" unique ("sac_id");`);

    this.addSql(
      `create table "sac_log_entries" ("id" uuid not null, "created_at" timestamptz not null, "updated_at" timestamptz not null, "sac_id" uuid not null, "kind" "care_log_kind" not null, "at" timestamptz not null, "author_id" uuid null, "temperature_c" double precision null, "entered_value" double precision null, "entered_unit" text check ("entered_unit" in ('C', 'F')) null, "humidity_percent" double precision null, "stage" "brood_stage" null, "text" text null, "strikes_id" uuid null, constraint "sac_log_entries_pkey" primary key ("id"));`,
    );
    this.addSql(`alter table "sac_log_entries" add constraint "sac_log_entries_strikes_unique" unique ("strikes_id");`);
    this.addSql(`create index "sac_log_entries_sac_id_at_index" on "sac_log_entries" ("sac_id", "at");`);

    this.addSql(
      `create table "brood_counts" ("id" uuid not null, "created_at" timestamptz not null, "updated_at" timestamptz not null, "sac_id" uuid not null, "at" timestamptz not null, "stage" "brood_stage" not null, "alive" int not null, "lost" int not null default 0, "loss_reason" "brood_loss_reason" null, "note" text null, "source" "brood_count_source" not null default 'count', "recorded_by_id" uuid null, constraint "brood_counts_pkey" primary key ("id"), constraint brood_counts_non_negative_check check (alive >= 0 and lost >= 0));`,
    );
    this.addSql(`create index "brood_counts_sac_id_at_index" on "brood_counts" ("sac_id", "at");`);

    this.addSql(
      `alter table "sacs" add constraint "sacs_project_id_foreign" foreign key ("project_id") references "projects" ("id") on update cascade on delete cascade;`,
    );
    this.addSql(
      `alter table "sacs" add constraint "sacs_recorded_by_id_foreign" foreign key ("recorded_by_id") references "users" ("id") on update cascade on delete restrict;`,
    );

    this.addSql(
      `alter table "sac_openings" add constraint "sac_openings_sac_id_foreign" foreign key ("sac_id") references "sacs" ("id") on update cascade on delete cascade;`,
    );
    this.addSql(
      `alter table "sac_openings" add constraint "sac_openings_recorded_by_id_foreign" foreign key ("recorded_by_id") references "users" ("id") on update cascade on delete restrict;`,
    );

    this.addSql(
      `alter table "sac_log_entries" add constraint "sac_log_entries_sac_id_foreign" foreign key ("sac_id") references "sacs" ("id") on update cascade on delete cascade;`,
    );
    this.addSql(
      `alter table "sac_log_entries" add constraint "sac_log_entries_author_id_foreign" foreign key ("author_id") references "users" ("id") on update cascade on delete set null;`,
    );
    this.addSql(
      `alter table "sac_log_entries" add constraint "sac_log_entries_strikes_id_foreign" foreign key ("strikes_id") references "sac_log_entries" ("id") on update cascade on delete restrict;`,
    );

    this.addSql(
      `alter table "brood_counts" add constraint "brood_counts_sac_id_foreign" foreign key ("sac_id") references "sacs" ("id") on update cascade on delete cascade;`,
    );
    this.addSql(
      `alter table "brood_counts" add constraint "brood_counts_recorded_by_id_foreign" foreign key ("recorded_by_id") references "users" ("id") on update cascade on delete set null;`,
    );
  }

  override async down(): Promise<void> {
    this.addSql(`alter table "sac_openings" drop constraint "sac_openings_sac_id_foreign";`);

    this.addSql(`alter table "sac_log_entries" drop constraint "sac_log_entries_sac_id_foreign";`);

    this.addSql(`alter table "brood_counts" drop constraint "brood_counts_sac_id_foreign";`);

    this.addSql(`alter table "sac_log_entries" drop constraint "sac_log_entries_strikes_id_foreign";`);

    this.addSql(`drop table if exists "sacs" cascade;`);

    this.addSql(`drop table if exists "sac_openings" cascade;`);

    this.addSql(`drop table if exists "sac_log_entries" cascade;`);

    this.addSql(`drop table if exists "brood_counts" cascade;`);

    this.addSql(`drop type "sac_outcome";`);
    this.addSql(`drop type "sac_failure_reason";`);
    this.addSql(`drop type "brood_stage";`);
    this.addSql(`drop type "care_log_kind";`);
    this.addSql(`drop type "brood_loss_reason";`);
    this.addSql(`drop type "brood_count_source";`);
  }
}
