import { Migration } from '@mikro-orm/migrations';

/** Recreates an enum type with new values (transaction-safe, unlike `alter type … add value`). */
function retype(m: Migration, type: string, column: string, values: string[], fallback: string): void {
  const list = values.map((v) => `'${v}'`).join(', ');
  m.addSql(`alter type "${type}" rename to "${type}_old";`);
  m.addSql(`create type "${type}" as enum (${list});`);
  m.addSql(`alter table "animals" alter column "${column}" drop default;`);
  m.addSql(`alter table "animals" alter column "${column}" type "${type}" using "${column}"::text::"${type}";`);
  m.addSql(`alter table "animals" alter column "${column}" set default '${fallback}';`);
  m.addSql(`drop type "${type}_old";`);
}

/**
 * The breeding season on the animals side: the penultimate maturity, the `returned` status with its
 * date, the premolt flag, the last sperm web seen, and the feeding log (corrections strike entries).
 */
export class Migration20261202144500 extends Migration {
  override async up(): Promise<void> {
    retype(this, 'animal_maturity', 'maturity', ['immature', 'penultimate', 'mature'], 'immature');
    retype(this, 'animal_status', 'status', ['active', 'on-loan', 'returned', 'sold', 'deceased'], 'active');
    this.addSql(
      `alter table "animals" add column "premolt_since" date null, add column "premolt_ended_on" date null, add column "sperm_web_on" date null, add column "returned_on" date null;`,
    );

    this.addSql(
      `create table "feeding_entries" ("id" uuid not null, "created_at" timestamptz not null, "updated_at" timestamptz not null, "animal_id" uuid not null, "fed_on" date not null, "prey" text not null, "taken" boolean not null, "note" text null, "strikes_id" uuid null, "reason" text null, "recorded_by_id" uuid null, constraint "feeding_entries_pkey" primary key ("id"));`,
    );
    this.addSql(`create index "feeding_entries_animal_id_fed_on_index" on "feeding_entries" ("animal_id", "fed_on");`);
    this.addSql(`alter table "feeding_entries" add constraint "feeding_entries_strikes_unique" unique ("strikes_id");`);
    this.addSql(
      `alter table "feeding_entries" add constraint "feeding_entries_animal_id_foreign" foreign key ("animal_id") references "animals" ("id") on update cascade on delete cascade;`,
    );
    this.addSql(
      `alter table "feeding_entries" add constraint "feeding_entries_strikes_id_foreign" foreign key ("strikes_id") references "feeding_entries" ("id") on update cascade on delete restrict;`,
    );
    this.addSql(
      `alter table "feeding_entries" add constraint "feeding_entries_recorded_by_id_foreign" foreign key ("recorded_by_id") references "users" ("id") on update cascade on delete set null;`,
    );
  }

  override async down(): Promise<void> {
    this.addSql(`drop table if exists "feeding_entries" cascade;`);
    this.addSql(`alter table "animals" drop column "premolt_since", drop column "premolt_ended_on", drop column "sperm_web_on", drop column "returned_on";`);
    // The old types have no place for the new values: a returned animal is back with its owner
    // (active), a penultimate one not yet mature.
    this.addSql(`update "animals" set "status" = 'active' where "status" = 'returned';`);
    this.addSql(`update "animals" set "maturity" = 'immature' where "maturity" = 'penultimate';`);
    retype(this, 'animal_status', 'status', ['active', 'on-loan', 'sold', 'deceased'], 'active');
    retype(this, 'animal_maturity', 'maturity', ['immature', 'mature'], 'immature');
  }
}
