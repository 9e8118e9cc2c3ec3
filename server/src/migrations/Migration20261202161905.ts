import { Migration } from '@mikro-orm/migrations';

/**
 * Each pairing names its male, so a project can pair her with a backup male or a replacement after a
 * death. Pairings recorded before name the male the project started with.
 */
export class Migration20261202161905 extends Migration {
  override async up(): Promise<void> {
    this.addSql(`alter table "pairings" add column "male_id" uuid null;`);
    this.addSql(`update "pairings" set "male_id" = "projects"."male_id" from "projects" where "projects"."id" = "pairings"."project_id";`);
    this.addSql(`alter table "pairings" alter column "male_id" set not null;`);
    this.addSql(
      `alter table "pairings" add constraint "pairings_male_id_foreign" foreign key ("male_id") references "animals" ("id") on update cascade on delete restrict;`,
    );
    this.addSql(`create index "pairings_male_id_index" on "pairings" ("male_id");`);
  }

  /** Pairings keep their dates and outcomes; which male each one was is lost. */
  override async down(): Promise<void> {
    this.addSql(`alter table "pairings" drop constraint "pairings_male_id_foreign";`);
    this.addSql(`drop index "pairings_male_id_index";`);
    this.addSql(`alter table "pairings" drop column "male_id";`);
  }
}
