import { Migration } from '@mikro-orm/migrations';

const OLD_KINDS = [
  'roll-due',
  'roll-overdue',
  'pull-window-opens',
  'pull-window-closes',
  'male-clock',
  'reading-out-of-band',
  'female-molted',
  'loan-due-back',
  'daily-digest',
];

/** Partner updates: a notification kind of their own, and notifications about a whole project. */
export class Migration20261203070300 extends Migration {
  override async up(): Promise<void> {
    this.addSql(`alter type "notification_kind" add value if not exists 'partner-update' after 'daily-digest';`);
    this.addSql(`alter type "notification_subject" add value if not exists 'project' after 'animal';`);
  }

  override async down(): Promise<void> {
    this.addSql(`delete from "notifications" where "kind"::text = 'partner-update' or "subject_type"::text = 'project';`);
    // PostgreSQL cannot drop an enum value: the types are made again with the old ones.
    this.addSql(`alter type "notification_kind" rename to "notification_kind_before";`);
    this.addSql(`create type "notification_kind" as enum (${OLD_KINDS.map((k) => `'${k}'`).join(', ')});`);
    this.addSql(`alter table "notifications" alter column "kind" type "notification_kind" using ("kind"::text::"notification_kind");`);
    this.addSql(`drop type "notification_kind_before";`);
    this.addSql(`alter type "notification_subject" rename to "notification_subject_before";`);
    this.addSql(`create type "notification_subject" as enum ('sac', 'animal');`);
    this.addSql(`alter table "notifications" alter column "subject_type" type "notification_subject" using ("subject_type"::text::"notification_subject");`);
    this.addSql(`drop type "notification_subject_before";`);
  }
}
