import { Migration } from '@mikro-orm/migrations';

/** Pairings, terms versions (lines and acceptances) and invitations of breeding projects. */
export class Migration20261201211424 extends Migration {
  override async up(): Promise<void> {
    this.addSql(`create type "terms_failure_clause" as enum ('nothing-owed', 'carries-over');`);
    this.addSql(`create type "terms_hand_over_stage" as enum ('eggs', 'eggs-with-legs', 'first-instar', 'second-instar');`);
    this.addSql(`create type "terms_shipping_payer" as enum ('sender', 'recipient', 'split');`);
    this.addSql(`create type "pairing_outcome" as enum ('connected', 'interest-only', 'female-refused', 'aggression', 'male-lost');`);
    this.addSql(`create type "invitable_role" as enum ('partner', 'caretaker');`);
    this.addSql(
      `create table "terms_versions" ("id" uuid not null, "created_at" timestamptz not null, "updated_at" timestamptz not null, "project_id" uuid not null, "number" int not null, "created_by_id" uuid not null, "price_per_spiderling_minor" int not null, "currency" char(3) not null, "failure_clause" "terms_failure_clause" not null, "hand_over_stage" "terms_hand_over_stage" not null, "shipping_paid_by" "terms_shipping_payer" not null, "note" text null, constraint "terms_versions_pkey" primary key ("id"));`,
    );
    this.addSql(`alter table "terms_versions" add constraint "terms_versions_project_id_number_unique" unique ("project_id", "number");`);

    this.addSql(
      `create table "terms_lines" ("id" uuid not null, "created_at" timestamptz not null, "updated_at" timestamptz not null, "version_id" uuid not null, "member_id" uuid not null, "weight" int not null, "fixed_count" int not null, "pick_order" int not null, constraint "terms_lines_pkey" primary key ("id"));`,
    );
    this.addSql(`alter table "terms_lines" add constraint "terms_lines_version_id_pick_order_unique" unique ("version_id", "pick_order");`);
    this.addSql(`alter table "terms_lines" add constraint "terms_lines_version_id_member_id_unique" unique ("version_id", "member_id");`);

    this.addSql(
      `create table "terms_acceptances" ("id" uuid not null, "created_at" timestamptz not null, "updated_at" timestamptz not null, "version_id" uuid not null, "member_id" uuid not null, "recorded_by_id" uuid not null, "on_behalf" boolean not null default false, "note" text null, constraint "terms_acceptances_pkey" primary key ("id"));`,
    );
    this.addSql(`alter table "terms_acceptances" add constraint "terms_acceptances_version_id_member_id_unique" unique ("version_id", "member_id");`);

    this.addSql(
      `create table "pairings" ("id" uuid not null, "created_at" timestamptz not null, "updated_at" timestamptz not null, "project_id" uuid not null, "started_at" timestamptz not null, "started_on" date not null, "duration_minutes" int not null, "outcome" "pairing_outcome" not null, "notes" text null, "recorded_by_id" uuid not null, constraint "pairings_pkey" primary key ("id"));`,
    );
    this.addSql(`create index "pairings_project_id_started_at_index" on "pairings" ("project_id", "started_at");`);

    this.addSql(
      `create table "invitations" ("id" uuid not null, "created_at" timestamptz not null, "updated_at" timestamptz not null, "project_id" uuid not null, "email" text not null, "role" "invitable_role" not null, "member_id" uuid null, "token_hash" text not null, "invited_by_id" uuid not null, "expires_at" timestamptz not null, "accepted_at" timestamptz null, "accepted_by_id" uuid null, "replaced_at" timestamptz null, constraint "invitations_pkey" primary key ("id"));`,
    );
    this.addSql(`alter table "invitations" add constraint "invitations_token_hash_unique" unique ("token_hash");`);
    this.addSql(`create index "invitations_project_id_email_index" on "invitations" ("project_id", "email");`);

    this.addSql(
      `alter table "terms_versions" add constraint "terms_versions_project_id_foreign" foreign key ("project_id") references "projects" ("id") on update cascade on delete cascade;`,
    );
    this.addSql(
      `alter table "terms_versions" add constraint "terms_versions_created_by_id_foreign" foreign key ("created_by_id") references "users" ("id") on update cascade on delete restrict;`,
    );

    this.addSql(
      `alter table "terms_lines" add constraint "terms_lines_version_id_foreign" foreign key ("version_id") references "terms_versions" ("id") on update cascade on delete cascade;`,
    );
    this.addSql(
      `alter table "terms_lines" add constraint "terms_lines_member_id_foreign" foreign key ("member_id") references "project_members" ("id") on update cascade on delete restrict;`,
    );

    this.addSql(
      `alter table "terms_acceptances" add constraint "terms_acceptances_version_id_foreign" foreign key ("version_id") references "terms_versions" ("id") on update cascade on delete cascade;`,
    );
    this.addSql(
      `alter table "terms_acceptances" add constraint "terms_acceptances_member_id_foreign" foreign key ("member_id") references "project_members" ("id") on update cascade on delete restrict;`,
    );
    this.addSql(
      `alter table "terms_acceptances" add constraint "terms_acceptances_recorded_by_id_foreign" foreign key ("recorded_by_id") references "users" ("id") on update cascade on delete restrict;`,
    );

    this.addSql(
      `alter table "pairings" add constraint "pairings_project_id_foreign" foreign key ("project_id") references "projects" ("id") on update cascade on delete cascade;`,
    );
    this.addSql(
      `alter table "pairings" add constraint "pairings_recorded_by_id_foreign" foreign key ("recorded_by_id") references "users" ("id") on update cascade on delete restrict;`,
    );

    this.addSql(
      `alter table "invitations" add constraint "invitations_project_id_foreign" foreign key ("project_id") references "projects" ("id") on update cascade on delete cascade;`,
    );
    this.addSql(
      `alter table "invitations" add constraint "invitations_member_id_foreign" foreign key ("member_id") references "project_members" ("id") on update cascade on delete cascade;`,
    );
    this.addSql(
      `alter table "invitations" add constraint "invitations_invited_by_id_foreign" foreign key ("invited_by_id") references "users" ("id") on update cascade on delete cascade;`,
    );
    this.addSql(
      `alter table "invitations" add constraint "invitations_accepted_by_id_foreign" foreign key ("accepted_by_id") references "users" ("id") on update cascade on delete set null;`,
    );
  }

  override async down(): Promise<void> {
    this.addSql(`drop table if exists "terms_versions" cascade;`);

    this.addSql(`drop table if exists "terms_lines" cascade;`);

    this.addSql(`drop table if exists "terms_acceptances" cascade;`);

    this.addSql(`drop table if exists "pairings" cascade;`);

    this.addSql(`drop table if exists "invitations" cascade;`);

    this.addSql(`drop type "terms_failure_clause";`);
    this.addSql(`drop type "terms_hand_over_stage";`);
    this.addSql(`drop type "terms_shipping_payer";`);
    this.addSql(`drop type "pairing_outcome";`);
    this.addSql(`drop type "invitable_role";`);
  }
}
