import { Migration } from '@mikro-orm/migrations';

/**
 * Incubation as it really goes: a sac left with the mother on purpose, rolling past the legs by
 * choice, the incubator or container, the sac's own target band, and the project's switch letting
 * caretakers record the pull and the opening.
 */
export class Migration20261202162657 extends Migration {
  override async up(): Promise<void> {
    this.addSql(`alter table "projects" add column "caretakers_may_pull_and_open" boolean not null default false;`);

    this.addSql(
      `alter table "sacs" add column "left_with_mother" boolean not null default false, add column "roll_past_legs" boolean not null default false, add column "container" text null, add column "band_temperature_min_c" double precision null, add column "band_temperature_max_c" double precision null, add column "band_humidity_min" double precision null, add column "band_humidity_max" double precision null;`,
    );
  }

  override async down(): Promise<void> {
    this.addSql(`alter table "projects" drop column "caretakers_may_pull_and_open";`);

    this.addSql(
      `alter table "sacs" drop column "left_with_mother", drop column "roll_past_legs", drop column "container", drop column "band_temperature_min_c", drop column "band_temperature_max_c", drop column "band_humidity_min", drop column "band_humidity_max";`,
    );
  }
}
