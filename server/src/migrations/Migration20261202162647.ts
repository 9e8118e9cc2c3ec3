/** TOTP second factor: sealed secrets on users, single-use recovery codes stored as SHA-256. */
import { Migration } from '@mikro-orm/migrations';

export class Migration20261202162647 extends Migration {
  override async up(): Promise<void> {
    this.addSql(
      `create table "recovery_codes" ("id" uuid not null, "created_at" timestamptz not null, "updated_at" timestamptz not null, "user_id" uuid not null, "code_hash" text not null, "used_at" timestamptz null, constraint "recovery_codes_pkey" primary key ("id"));`,
    );
    this.addSql(`create index "recovery_codes_user_id_code_hash_index" on "recovery_codes" ("user_id", "code_hash");`);

    this.addSql(
      `alter table "recovery_codes" add constraint "recovery_codes_user_id_foreign" foreign key ("user_id") references "users" ("id") on update cascade on delete cascade;`,
    );

    this.addSql(
      `alter table "users" add column "totp_secret" text null, add column "totp_pending_secret" text null, add column "totp_enabled_at" timestamptz null, add column "totp_last_step" int null;`,
    );
  }

  override async down(): Promise<void> {
    this.addSql(`drop table if exists "recovery_codes" cascade;`);

    this.addSql(
      `alter table "users" drop column "totp_secret", drop column "totp_pending_secret", drop column "totp_enabled_at", drop column "totp_last_step";`,
    );
  }
}
