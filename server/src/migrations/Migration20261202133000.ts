import { Migration } from '@mikro-orm/migrations';

/** An invitation opened by another account than the invited address waits for the owner: who asked, and when. */
export class Migration20261202133000 extends Migration {
  override async up(): Promise<void> {
    this.addSql(`alter table "invitations" add column "claimed_by_id" uuid null, add column "claimed_at" timestamptz null;`);
    this.addSql(
      `alter table "invitations" add constraint "invitations_claimed_by_id_foreign" foreign key ("claimed_by_id") references "users" ("id") on update cascade on delete set null;`,
    );
  }

  override async down(): Promise<void> {
    this.addSql(`alter table "invitations" drop constraint "invitations_claimed_by_id_foreign";`);
    this.addSql(`alter table "invitations" drop column "claimed_by_id", drop column "claimed_at";`);
  }
}
