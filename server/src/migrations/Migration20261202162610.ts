import { Migration } from '@mikro-orm/migrations';

const NEW_KINDS = ['reading-out-of-band', 'female-molted', 'loan-due-back', 'daily-digest'];
const OLD_KINDS = ['roll-due', 'roll-overdue', 'pull-window-opens', 'pull-window-closes', 'male-clock'];

/** Reminder settings per user, the new reminder kinds, and notifications without a subject (the digest). */
export class Migration20261202162610 extends Migration {
  override async up(): Promise<void> {
    this.addSql(
      `create table "reminder_settings" ("id" uuid not null, "created_at" timestamptz not null, "updated_at" timestamptz not null, "user_id" uuid not null, "channels" jsonb not null, "quiet_from" smallint null, "quiet_to" smallint null, "overdue_breaks_quiet" boolean not null default false, "digest_hour" smallint null, constraint "reminder_settings_pkey" primary key ("id"));`,
    );
    this.addSql(`alter table "reminder_settings" add constraint "reminder_settings_user_unique" unique ("user_id");`);
    this.addSql(
      `alter table "reminder_settings" add constraint "reminder_settings_user_id_foreign" foreign key ("user_id") references "users" ("id") on update cascade on delete cascade;`,
    );
    let after = 'male-clock';
    for (const kind of NEW_KINDS) {
      this.addSql(`alter type "notification_kind" add value if not exists '${kind}' after '${after}';`);
      after = kind;
    }
    this.addSql(`alter table "notifications" alter column "subject_type" drop not null;`);
    this.addSql(`alter table "notifications" alter column "subject_id" drop not null;`);
  }

  override async down(): Promise<void> {
    this.addSql(`drop table if exists "reminder_settings" cascade;`);
    // The older schema has no room for digests and the new kinds: those notifications go.
    this.addSql(
      `delete from "notifications" where "subject_type" is null or "subject_id" is null or "kind"::text in (${NEW_KINDS.map((k) => `'${k}'`).join(', ')});`,
    );
    this.addSql(`alter table "notifications" alter column "subject_type" set not null;`);
    this.addSql(`alter table "notifications" alter column "subject_id" set not null;`);
    // PostgreSQL cannot drop an enum value: the type is made again with the old ones.
    this.addSql(`alter type "notification_kind" rename to "notification_kind_before";`);
    this.addSql(`create type "notification_kind" as enum (${OLD_KINDS.map((k) => `'${k}'`).join(', ')});`);
    this.addSql(`alter table "notifications" alter column "kind" type "notification_kind" using ("kind"::text::"notification_kind");`);
    this.addSql(`drop type "notification_kind_before";`);
  }
}
