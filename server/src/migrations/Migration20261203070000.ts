import { Migration } from '@mikro-orm/migrations';

/**
 * A new account confirms its e-mail address before it can sign in. Accounts made before this
 * step count as confirmed from their creation (they signed in without one until now).
 */
export class Migration20261203070000 extends Migration {
  override async up(): Promise<void> {
    this.addSql(`alter table "users" add column "email_confirmed_at" timestamptz null;`);
    this.addSql(`update "users" set "email_confirmed_at" = "created_at";`);
    this.addSql(
      `create table "email_confirmation_tokens" ("id" uuid not null, "created_at" timestamptz not null, "updated_at" timestamptz not null, "user_id" uuid not null, "token_hash" text not null, "expires_at" timestamptz not null, "used_at" timestamptz null, "invitation_id" uuid null, constraint "email_confirmation_tokens_pkey" primary key ("id"));`,
    );
    this.addSql(`alter table "email_confirmation_tokens" add constraint "email_confirmation_tokens_token_hash_unique" unique ("token_hash");`);
    this.addSql(
      `alter table "email_confirmation_tokens" add constraint "email_confirmation_tokens_user_id_foreign" foreign key ("user_id") references "users" ("id") on update cascade on delete cascade;`,
    );
    this.addSql(
      `alter table "email_confirmation_tokens" add constraint "email_confirmation_tokens_invitation_id_foreign" foreign key ("invitation_id") references "invitations" ("id") on update cascade on delete set null;`,
    );
  }

  override async down(): Promise<void> {
    this.addSql(`drop table if exists "email_confirmation_tokens" cascade;`);
    this.addSql(`alter table "users" drop column "email_confirmed_at";`);
  }
}
