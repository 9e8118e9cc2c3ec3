import { Migration } from '@mikro-orm/migrations';

/** Breeding projects, their parties (members with a project role) and the activity record. */
export class Migration20261201211153 extends Migration {
  override async up(): Promise<void> {
    this.addSql(`create type "ended_early_reason" as enum ('no-sac', 'female-molted', 'sac-failed', 'sac-eaten', 'male-died');`);
    this.addSql(`create type "project_role" as enum ('owner', 'partner', 'caretaker');`);
    this.addSql(`create type "activity_audience" as enum ('members', 'partners');`);
    this.addSql(
      `create table "projects" ("id" uuid not null, "created_at" timestamptz not null, "updated_at" timestamptz not null, "owner_id" uuid not null, "female_id" uuid not null, "male_id" uuid not null, "title" text not null, "notes" text null, "ended_early_reason" "ended_early_reason" null, "ended_early_note" text null, "ended_on" date null, "closed_on" date null, constraint "projects_pkey" primary key ("id"));`,
    );
    this.addSql(`create index "projects_owner_id_created_at_index" on "projects" ("owner_id", "created_at");`);

    this.addSql(
      `create table "project_members" ("id" uuid not null, "created_at" timestamptz not null, "updated_at" timestamptz not null, "project_id" uuid not null, "user_id" uuid null, "role" "project_role" not null, "name" text not null, "email" text null, constraint "project_members_pkey" primary key ("id"));`,
    );
    this.addSql(`alter table "project_members" add constraint "project_members_project_id_user_id_unique" unique ("project_id", "user_id");`);

    this.addSql(
      `create table "activity_events" ("id" uuid not null, "created_at" timestamptz not null, "updated_at" timestamptz not null, "project_id" uuid not null, "actor_id" uuid null, "kind" text not null, "subject_type" text not null, "subject_id" uuid null, "summary" text not null, "data" jsonb not null, "audience" "activity_audience" not null default 'members', "at" timestamptz not null, constraint "activity_events_pkey" primary key ("id"));`,
    );
    this.addSql(`create index "activity_events_project_id_at_index" on "activity_events" ("project_id", "at");`);

    this.addSql(
      `alter table "projects" add constraint "projects_owner_id_foreign" foreign key ("owner_id") references "users" ("id") on update cascade on delete cascade;`,
    );
    this.addSql(
      `alter table "projects" add constraint "projects_female_id_foreign" foreign key ("female_id") references "animals" ("id") on update cascade on delete restrict;`,
    );
    this.addSql(
      `alter table "projects" add constraint "projects_male_id_foreign" foreign key ("male_id") references "animals" ("id") on update cascade on delete restrict;`,
    );

    this.addSql(
      `alter table "project_members" add constraint "project_members_project_id_foreign" foreign key ("project_id") references "projects" ("id") on update cascade on delete cascade;`,
    );
    this.addSql(
      `alter table "project_members" add constraint "project_members_user_id_foreign" foreign key ("user_id") references "users" ("id") on update cascade on delete set null;`,
    );

    this.addSql(
      `alter table "activity_events" add constraint "activity_events_project_id_foreign" foreign key ("project_id") references "projects" ("id") on update cascade on delete cascade;`,
    );
    this.addSql(
      `alter table "activity_events" add constraint "activity_events_actor_id_foreign" foreign key ("actor_id") references "users" ("id") on update cascade on delete set null;`,
    );
    this.addSql(`create index "project_members_user_id_index" on "project_members" ("user_id");`);
    this.addSql(`alter table "projects" add constraint "projects_two_animals_check" check ("female_id" <> "male_id");`);
  }

  override async down(): Promise<void> {
    this.addSql(`drop table if exists "activity_events" cascade;`);
    this.addSql(`drop table if exists "project_members" cascade;`);
    this.addSql(`drop table if exists "projects" cascade;`);

    this.addSql(`drop type "ended_early_reason";`);
    this.addSql(`drop type "project_role";`);
    this.addSql(`drop type "activity_audience";`);
  }
}
