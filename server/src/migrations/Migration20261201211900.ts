import { Migration } from '@mikro-orm/migrations';

/**
 * The partner account: its lock row, the append-only ledger (a trigger refuses UPDATE and DELETE),
 * the share bases per sac, payout accounts, handled payment events and settlement checkouts.
 */
export class Migration20261201211900 extends Migration {
  override async up(): Promise<void> {
    this.addSql(`create type "ledger_entry_kind" as enum ('hand-over', 'arrival', 'sale', 'cash-out', 'money', 'correction', 'confirmation');`);
    this.addSql(`create type "hand_over_method" as enum ('pick-up', 'shipment');`);
    this.addSql(`create type "ledger_entry_source" as enum ('manual', 'payment-provider');`);

    this.addSql(
      `create table "project_accounts" ("id" uuid not null, "created_at" timestamptz not null, "updated_at" timestamptz not null, "project_id" uuid not null, constraint "project_accounts_pkey" primary key ("id"));`,
    );
    this.addSql(`alter table "project_accounts" add constraint "project_accounts_project_id_unique" unique ("project_id");`);
    this.addSql(
      `alter table "project_accounts" add constraint "project_accounts_project_id_foreign" foreign key ("project_id") references "projects" ("id") on update cascade on delete cascade;`,
    );

    this.addSql(
      `create table "ledger_entries" ("id" uuid not null, "created_at" timestamptz not null, "updated_at" timestamptz not null, "project_id" uuid not null, "seq" int not null, "kind" "ledger_entry_kind" not null, "date" date not null, "sac_id" uuid null, "party_id" uuid null, "from_party_id" uuid null, "to_party_id" uuid null, "count" int null, "method" "hand_over_method" null, "carrier" text null, "tracking" text null, "price_minor" int null, "price_per_spiderling_minor" int null, "amount_minor" int null, "currency" char(3) null, "target_id" uuid null, "arrived_alive" int null, "arrived_dead" int null, "reason" text null, "note" text null, "source" "ledger_entry_source" not null default 'manual', "provider_ref" text null, "recorded_by_id" uuid null, constraint "ledger_entries_pkey" primary key ("id"));`,
    );
    this.addSql(`alter table "ledger_entries" add constraint "ledger_entries_provider_ref_unique" unique ("provider_ref");`);
    this.addSql(`create index "ledger_entries_project_id_seq_index" on "ledger_entries" ("project_id", "seq");`);
    this.addSql(`alter table "ledger_entries" add constraint "ledger_entries_seq_unique" unique ("seq");`);
    this.addSql(`create sequence "ledger_entry_seq" as integer;`);
    this.addSql(
      `alter table "ledger_entries" add constraint "ledger_entries_project_id_foreign" foreign key ("project_id") references "projects" ("id") on update cascade on delete cascade;`,
    );
    this.addSql(
      `alter table "ledger_entries" add constraint "ledger_entries_party_id_foreign" foreign key ("party_id") references "project_members" ("id") on update cascade on delete no action;`,
    );
    this.addSql(
      `alter table "ledger_entries" add constraint "ledger_entries_from_party_id_foreign" foreign key ("from_party_id") references "project_members" ("id") on update cascade on delete no action;`,
    );
    this.addSql(
      `alter table "ledger_entries" add constraint "ledger_entries_to_party_id_foreign" foreign key ("to_party_id") references "project_members" ("id") on update cascade on delete no action;`,
    );
    this.addSql(
      `alter table "ledger_entries" add constraint "ledger_entries_target_id_foreign" foreign key ("target_id") references "ledger_entries" ("id") on update cascade on delete no action;`,
    );
    this.addSql(
      `alter table "ledger_entries" add constraint "ledger_entries_recorded_by_id_foreign" foreign key ("recorded_by_id") references "users" ("id") on update cascade on delete restrict;`,
    );
    this.addSql(
      `alter table "ledger_entries" add constraint "ledger_entries_counts_check" check (coalesce("count", 1) > 0 and coalesce("amount_minor", 1) > 0 and coalesce("price_minor", 0) >= 0 and coalesce("arrived_alive", 0) >= 0 and coalesce("arrived_dead", 0) >= 0);`,
    );
    // The ledger is never edited: corrections are new rows. Deleting the whole project (cascade) is
    // the one exception, so the trigger lets a DELETE through only while its project row is gone.
    this.addSql(`create function "ledger_entries_append_only"() returns trigger language plpgsql as $$
begin
  if tg_op = 'DELETE' and not exists (select 1 from "projects" where "id" = old."project_id") then
    return old;
  end if;
  raise exception 'ledger entries are never changed or deleted; record a correction instead' using errcode = 'P0001';
end $$;`);
    this.addSql(
      `create trigger "ledger_entries_append_only" before update or delete on "ledger_entries" for each row execute function "ledger_entries_append_only"();`,
    );

    this.addSql(
      `create table "share_bases" ("id" uuid not null, "created_at" timestamptz not null, "updated_at" timestamptz not null, "project_id" uuid not null, "sac_id" uuid not null, "revision" int not null, "count" int not null, "terms_number" int null, "result" jsonb not null, constraint "share_bases_pkey" primary key ("id"));`,
    );
    this.addSql(`create index "share_bases_project_id_index" on "share_bases" ("project_id");`);
    this.addSql(`alter table "share_bases" add constraint "share_bases_sac_id_revision_unique" unique ("sac_id", "revision");`);
    this.addSql(
      `alter table "share_bases" add constraint "share_bases_project_id_foreign" foreign key ("project_id") references "projects" ("id") on update cascade on delete cascade;`,
    );

    this.addSql(
      `create table "payout_accounts" ("id" uuid not null, "created_at" timestamptz not null, "updated_at" timestamptz not null, "user_id" uuid not null, "provider_account_id" text not null, "charges_enabled" boolean not null default false, "payouts_enabled" boolean not null default false, "details_submitted" boolean not null default false, constraint "payout_accounts_pkey" primary key ("id"));`,
    );
    this.addSql(`alter table "payout_accounts" add constraint "payout_accounts_user_id_unique" unique ("user_id");`);
    this.addSql(`alter table "payout_accounts" add constraint "payout_accounts_provider_account_id_unique" unique ("provider_account_id");`);
    this.addSql(
      `alter table "payout_accounts" add constraint "payout_accounts_user_id_foreign" foreign key ("user_id") references "users" ("id") on update cascade on delete cascade;`,
    );

    this.addSql(
      `create table "payment_events" ("id" text not null, "type" text not null, "received_at" timestamptz not null, constraint "payment_events_pkey" primary key ("id"));`,
    );

    this.addSql(
      `create table "settlement_checkouts" ("id" uuid not null, "created_at" timestamptz not null, "updated_at" timestamptz not null, "session_id" text not null, "project_id" uuid not null, "from_party_id" uuid not null, "to_party_id" uuid not null, "amount_minor" int not null, "currency" char(3) not null, "destination_account_id" text not null, "created_by_id" uuid not null, constraint "settlement_checkouts_pkey" primary key ("id"));`,
    );
    this.addSql(`alter table "settlement_checkouts" add constraint "settlement_checkouts_session_id_unique" unique ("session_id");`);
    this.addSql(
      `alter table "settlement_checkouts" add constraint "settlement_checkouts_project_id_foreign" foreign key ("project_id") references "projects" ("id") on update cascade on delete cascade;`,
    );
    this.addSql(
      `alter table "settlement_checkouts" add constraint "settlement_checkouts_from_party_id_foreign" foreign key ("from_party_id") references "project_members" ("id") on update cascade on delete no action;`,
    );
    this.addSql(
      `alter table "settlement_checkouts" add constraint "settlement_checkouts_to_party_id_foreign" foreign key ("to_party_id") references "project_members" ("id") on update cascade on delete no action;`,
    );
    this.addSql(
      `alter table "settlement_checkouts" add constraint "settlement_checkouts_created_by_id_foreign" foreign key ("created_by_id") references "users" ("id") on update cascade on delete restrict;`,
    );
  }

  override async down(): Promise<void> {
    this.addSql(`drop table if exists "settlement_checkouts" cascade;`);
    this.addSql(`drop table if exists "payment_events" cascade;`);
    this.addSql(`drop table if exists "payout_accounts" cascade;`);
    this.addSql(`drop table if exists "share_bases" cascade;`);
    this.addSql(`drop trigger if exists "ledger_entries_append_only" on "ledger_entries";`);
    this.addSql(`drop function if exists "ledger_entries_append_only"();`);
    this.addSql(`drop table if exists "ledger_entries" cascade;`);
    this.addSql(`drop sequence if exists "ledger_entry_seq";`);
    this.addSql(`drop table if exists "project_accounts" cascade;`);
    this.addSql(`drop type if exists "ledger_entry_source";`);
    this.addSql(`drop type if exists "hand_over_method";`);
    this.addSql(`drop type if exists "ledger_entry_kind";`);
  }
}
