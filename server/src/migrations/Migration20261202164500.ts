import { Migration } from '@mikro-orm/migrations';
import { COMMON_NAMES } from '../species/data/common-names.data';
import { commonNamesFillSql } from '../species/catalogue-sql';
import { speciesKey } from '../species/data/species.data';

const ROWS = Object.entries(COMMON_NAMES).map(([name, commonNames]) => ({ key: speciesKey(name), commonNames }));

/** The catalogue gains common names, so a search by a keeper's everyday name finds the species. */
export class Migration20261202164500 extends Migration {
  override async up(): Promise<void> {
    for (const sql of commonNamesFillSql(ROWS)) this.addSql(sql);
  }

  override async down(): Promise<void> {
    for (const { key } of ROWS) this.addSql(`update "species" set "common_names" = '{}' where "key" = '${key}';`);
  }
}
