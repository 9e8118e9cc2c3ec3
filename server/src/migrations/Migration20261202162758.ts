import { Migration } from '@mikro-orm/migrations';

/**
 * Openings as they really go: an opening may be an estimate and may carry the reason for counts
 * outside the species' range; the eggs kept back at it become their own batch with its own log.
 */
export class Migration20261202162758 extends Migration {
  override async up(): Promise<void> {
    this.addSql(`create type "kept_back_state" as enum ('incubating', 'joined', 'written-off');`);
    this.addSql(`create type "kept_back_log_kind" as enum ('roll', 'check', 'strike');`);
    this.addSql(
      `create table "kept_back_batches" ("id" uuid not null, "created_at" timestamptz not null, "updated_at" timestamptz not null, "sac_id" uuid not null, "state" "kept_back_state" not null default 'incubating', "ended_at" timestamptz null, "joined" int null, "reason" text null, "ended_by_id" uuid null, constraint "kept_back_batches_pkey" primary key ("id"), constraint kept_back_batches_ended_check check ((state = 'incubating') = (ended_at is null)), constraint kept_back_batches_joined_check check ((state = 'joined') = (joined is not null) and (joined is null or joined >= 0)));`,
    );
    this.addSql(`alter table "kept_back_batches" add constraint "kept_back_batches_sac_id_unique" unique ("sac_id");`);

    this.addSql(
      `create table "kept_back_log_entries" ("id" uuid not null, "created_at" timestamptz not null, "updated_at" timestamptz not null, "batch_id" uuid not null, "kind" "kept_back_log_kind" not null, "at" timestamptz not null, "note" text null, "recorded_by_id" uuid null, "strikes_id" uuid null, constraint "kept_back_log_entries_pkey" primary key ("id"));`,
    );
    this.addSql(`alter table "kept_back_log_entries" add constraint "kept_back_log_entries_strikes_unique" unique ("strikes_id");`);
    this.addSql(`create index "kept_back_log_entries_batch_id_at_index" on "kept_back_log_entries" ("batch_id", "at");`);

    this.addSql(
      `alter table "kept_back_batches" add constraint "kept_back_batches_sac_id_foreign" foreign key ("sac_id") references "sacs" ("id") on update cascade on delete cascade;`,
    );
    this.addSql(
      `alter table "kept_back_batches" add constraint "kept_back_batches_ended_by_id_foreign" foreign key ("ended_by_id") references "users" ("id") on update cascade on delete set null;`,
    );

    this.addSql(
      `alter table "kept_back_log_entries" add constraint "kept_back_log_entries_batch_id_foreign" foreign key ("batch_id") references "kept_back_batches" ("id") on update cascade on delete cascade;`,
    );
    this.addSql(
      `alter table "kept_back_log_entries" add constraint "kept_back_log_entries_recorded_by_id_foreign" foreign key ("recorded_by_id") references "users" ("id") on update cascade on delete set null;`,
    );
    this.addSql(
      `alter table "kept_back_log_entries" add constraint "kept_back_log_entries_strikes_id_foreign" foreign key ("strikes_id") references "kept_back_log_entries" ("id") on update cascade on delete restrict;`,
    );

    this.addSql(`alter table "sac_openings" add column "estimated" boolean not null default false, add column "warning_reason" text null;`);
  }

  override async down(): Promise<void> {
    this.addSql(`drop table if exists "kept_back_log_entries";`);
    this.addSql(`drop table if exists "kept_back_batches";`);
    this.addSql(`alter table "sac_openings" drop column "estimated", drop column "warning_reason";`);
    this.addSql(`drop type "kept_back_log_kind";`);
    this.addSql(`drop type "kept_back_state";`);
  }
}
