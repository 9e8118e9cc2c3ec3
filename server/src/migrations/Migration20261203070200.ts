import { Migration } from '@mikro-orm/migrations';

/** Progress links: read-only pages for outside parties; only the SHA-256 of each token is stored. */
export class Migration20261203070200 extends Migration {
  override async up(): Promise<void> {
    this.addSql(
      `create table "progress_links" ("id" uuid not null, "created_at" timestamptz not null, "updated_at" timestamptz not null, "member_id" uuid not null, "token_hash" text not null, "created_by_id" uuid null, "revoked_at" timestamptz null, constraint "progress_links_pkey" primary key ("id"));`,
    );
    this.addSql(`alter table "progress_links" add constraint "progress_links_token_hash_unique" unique ("token_hash");`);
    this.addSql(`create index "progress_links_member_id_revoked_at_index" on "progress_links" ("member_id", "revoked_at");`);
    this.addSql(
      `alter table "progress_links" add constraint "progress_links_member_id_foreign" foreign key ("member_id") references "project_members" ("id") on update cascade on delete cascade;`,
    );
    this.addSql(
      `alter table "progress_links" add constraint "progress_links_created_by_id_foreign" foreign key ("created_by_id") references "users" ("id") on update cascade on delete set null;`,
    );
  }

  override async down(): Promise<void> {
    this.addSql(`drop table if exists "progress_links" cascade;`);
  }
}
