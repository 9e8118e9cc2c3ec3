import { Migration } from '@mikro-orm/migrations';
import { SPECIES_DATA } from '../species/data/species.data';
import { catalogueInsertSql } from '../species/catalogue-sql';

/** Seeds the species catalogue in every database (demo or not); existing rows are kept. */
export class Migration20261201205809 extends Migration {
  override async up(): Promise<void> {
    this.addSql(catalogueInsertSql(SPECIES_DATA, 'boolean'));
  }

  override async down(): Promise<void> {
    const keys = SPECIES_DATA.map((r) => `'${r.key.replace(/'/g, "''")}'`).join(', ');
    this.addSql(`delete from "species" where "key" in (${keys}) and not exists (select 1 from "animals" a where a."species_id" = "species"."id");`);
  }
}
