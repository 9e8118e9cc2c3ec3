import { Migration } from '@mikro-orm/migrations';

/**
 * A record the keeper can trust: estimated counts; corrections of counts, pairings and openings
 * (a new row that strikes the old one, with a reason); the reason given for an acknowledged
 * plausibility warning; and the idempotency keys of button writes.
 */
export class Migration20261202150000 extends Migration {
  override async up(): Promise<void> {
    this.addSql(
      `alter table "brood_counts" add column "estimated" boolean not null default false, add column "corrects_id" uuid null, add column "reason" text null, add column "warning_reason" text null;`,
    );
    this.addSql(`alter table "brood_counts" add constraint "brood_counts_corrects_id_unique" unique ("corrects_id");`);
    this.addSql(
      `alter table "brood_counts" add constraint "brood_counts_corrects_id_foreign" foreign key ("corrects_id") references "brood_counts" ("id") on update cascade on delete cascade;`,
    );

    this.addSql(`alter table "pairings" add column "corrects_id" uuid null, add column "reason" text null, add column "warning_reason" text null;`);
    this.addSql(`alter table "pairings" add constraint "pairings_corrects_id_unique" unique ("corrects_id");`);
    this.addSql(
      `alter table "pairings" add constraint "pairings_corrects_id_foreign" foreign key ("corrects_id") references "pairings" ("id") on update cascade on delete cascade;`,
    );

    // One first opening per sac; its corrections are further rows, each striking one.
    this.addSql(`alter table "sac_openings" drop constraint "sac_openings_sac_id_unique";`);
    this.addSql(`alter table "sac_openings" add column "corrects_id" uuid null, add column "reason" text null;`);
    this.addSql(`create unique index "sac_openings_first_per_sac_unique" on "sac_openings" ("sac_id") where "corrects_id" is null;`);
    this.addSql(`alter table "sac_openings" add constraint "sac_openings_corrects_id_unique" unique ("corrects_id");`);
    this.addSql(
      `alter table "sac_openings" add constraint "sac_openings_corrects_id_foreign" foreign key ("corrects_id") references "sac_openings" ("id") on update cascade on delete cascade;`,
    );

    this.addSql(`alter table "sacs" add column "warning_reason" text null;`);
    this.addSql(`alter table "projects" add column "warning_reason" text null;`);

    this.addSql(
      `create table "idempotency_keys" ("id" uuid not null, "created_at" timestamptz not null, "updated_at" timestamptz not null, "user_id" uuid not null, "key" text not null, "method" text not null, "path" text not null, "fingerprint" text not null, "status" int null, "body" jsonb null, "expires_at" timestamptz not null, constraint "idempotency_keys_pkey" primary key ("id"));`,
    );
    this.addSql(`alter table "idempotency_keys" add constraint "idempotency_keys_user_id_key_unique" unique ("user_id", "key");`);
    this.addSql(`create index "idempotency_keys_expires_at_index" on "idempotency_keys" ("expires_at");`);
    this.addSql(
      `alter table "idempotency_keys" add constraint "idempotency_keys_user_id_foreign" foreign key ("user_id") references "users" ("id") on update cascade on delete cascade;`,
    );
  }

  override async down(): Promise<void> {
    this.addSql(`drop table if exists "idempotency_keys" cascade;`);
    this.addSql(`alter table "projects" drop column "warning_reason";`);
    this.addSql(`alter table "sacs" drop column "warning_reason";`);
    this.addSql(`delete from "sac_openings" where "corrects_id" is not null;`);
    this.addSql(`alter table "sac_openings" drop constraint "sac_openings_corrects_id_foreign";`);
    this.addSql(`alter table "sac_openings" drop constraint "sac_openings_corrects_id_unique";`);
    this.addSql(`drop index "sac_openings_first_per_sac_unique";`);
    this.addSql(`alter table "sac_openings" drop column "corrects_id", drop column "reason";`);
    this.addSql(`alter table "sac_openings" add constraint "sac_openings_sac_id_unique" unique ("sac_id");`);
    this.addSql(`alter table "pairings" drop constraint "pairings_corrects_id_foreign";`);
    this.addSql(`alter table "pairings" drop constraint "pairings_corrects_id_unique";`);
    this.addSql(`alter table "pairings" drop column "corrects_id", drop column "reason", drop column "warning_reason";`);
    this.addSql(`alter table "brood_counts" drop constraint "brood_counts_corrects_id_foreign";`);
    this.addSql(`alter table "brood_counts" drop constraint "brood_counts_corrects_id_unique";`);
    this.addSql(`alter table "brood_counts" drop column "estimated", drop column "corrects_id", drop column "reason", drop column "warning_reason";`);
  }
}
