import { Migration } from '@mikro-orm/migrations';

/** Accounts and password-reset links. */
export class Migration20261201204907 extends Migration {
  override async up(): Promise<void> {
    this.addSql(`create type "account_role" as enum ('keeper', 'admin');`);
    this.addSql(
      `create table "users" ("id" uuid not null, "created_at" timestamptz not null, "updated_at" timestamptz not null, "email" text not null, "password_hash" text not null, "display_name" text not null, "role" "account_role" not null default 'keeper', "time_zone" text not null default 'UTC', "temperature_unit" text check ("temperature_unit" in ('C', 'F')) not null default 'C', "token_version" int not null default 0, constraint "users_pkey" primary key ("id"));`,
    );
    this.addSql(`alter table "users" add constraint "users_email_unique" unique ("email");`);

    this.addSql(
      `create table "password_reset_tokens" ("id" uuid not null, "created_at" timestamptz not null, "updated_at" timestamptz not null, "user_id" uuid not null, "token_hash" text not null, "expires_at" timestamptz not null, "used_at" timestamptz null, constraint "password_reset_tokens_pkey" primary key ("id"));`,
    );
    this.addSql(`alter table "password_reset_tokens" add constraint "password_reset_tokens_token_hash_unique" unique ("token_hash");`);

    this.addSql(
      `alter table "password_reset_tokens" add constraint "password_reset_tokens_user_id_foreign" foreign key ("user_id") references "users" ("id") on update cascade on delete cascade;`,
    );
  }

  override async down(): Promise<void> {
    this.addSql(`drop table if exists "password_reset_tokens" cascade;`);
    this.addSql(`drop table if exists "users" cascade;`);
    this.addSql(`drop type if exists "account_role";`);
  }
}
