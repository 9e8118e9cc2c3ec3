import { Migration } from '@mikro-orm/migrations';

/**
 * The care log is read newest first by (at, created_at, id) one page at a time (keyset): the index
 * carries the whole sort key, so each page is one index range scan, however far back it is.
 */
export class Migration20261203070100 extends Migration {
  override async up(): Promise<void> {
    this.addSql(`drop index "sac_log_entries_sac_id_at_index";`);
    this.addSql(`create index "sac_log_entries_sac_id_at_created_at_id_index" on "sac_log_entries" ("sac_id", "at", "created_at", "id");`);
  }

  override async down(): Promise<void> {
    this.addSql(`drop index "sac_log_entries_sac_id_at_created_at_id_index";`);
    this.addSql(`create index "sac_log_entries_sac_id_at_index" on "sac_log_entries" ("sac_id", "at");`);
  }
}
