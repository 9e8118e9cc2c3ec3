import { Migration } from '@mikro-orm/migrations';

/** Calendar feeds (token hashes only), in-app notifications and the once-a-day reminder keys. */
export class Migration20261201214408 extends Migration {
  override async up(): Promise<void> {
    this.addSql(`create type "notification_kind" as enum ('roll-due', 'roll-overdue', 'pull-window-opens', 'pull-window-closes', 'male-clock');`);
    this.addSql(`create type "notification_subject" as enum ('sac', 'animal');`);
    this.addSql(
      `create table "reminder_sent" ("id" uuid not null, "created_at" timestamptz not null, "updated_at" timestamptz not null, "key" text not null, constraint "reminder_sent_pkey" primary key ("id"));`,
    );
    this.addSql(`alter table "reminder_sent" add constraint "reminder_sent_key_unique" unique ("key");`);

    this.addSql(
      `create table "notifications" ("id" uuid not null, "created_at" timestamptz not null, "updated_at" timestamptz not null, "user_id" uuid not null, "kind" "notification_kind" not null, "title" text not null, "body" text not null, "subject_type" "notification_subject" not null, "subject_id" uuid not null, "project_id" uuid null, "read_at" timestamptz null, constraint "notifications_pkey" primary key ("id"));`,
    );
    this.addSql(`create index "notifications_user_id_created_at_index" on "notifications" ("user_id", "created_at");`);

    this.addSql(
      `create table "calendar_feeds" ("id" uuid not null, "created_at" timestamptz not null, "updated_at" timestamptz not null, "user_id" uuid not null, "token_hash" text not null, "revoked_at" timestamptz null, constraint "calendar_feeds_pkey" primary key ("id"));`,
    );
    this.addSql(`alter table "calendar_feeds" add constraint "calendar_feeds_token_hash_unique" unique ("token_hash");`);
    this.addSql(`create index "calendar_feeds_user_id_revoked_at_index" on "calendar_feeds" ("user_id", "revoked_at");`);

    this.addSql(
      `alter table "notifications" add constraint "notifications_user_id_foreign" foreign key ("user_id") references "users" ("id") on update cascade on delete cascade;`,
    );

    this.addSql(
      `alter table "calendar_feeds" add constraint "calendar_feeds_user_id_foreign" foreign key ("user_id") references "users" ("id") on update cascade on delete cascade;`,
    );
  }

  override async down(): Promise<void> {
    this.addSql(`drop table if exists "reminder_sent" cascade;`);

    this.addSql(`drop table if exists "notifications" cascade;`);

    this.addSql(`drop table if exists "calendar_feeds" cascade;`);

    this.addSql(`drop type "notification_kind";`);
    this.addSql(`drop type "notification_subject";`);
  }
}
