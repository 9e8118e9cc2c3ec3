import { Migration } from '@mikro-orm/migrations';
import { TLIL_VAGANS_EGGS_SOURCE } from '../species/data/species.data';

const json = (v: unknown) => `'${JSON.stringify(v).replace(/'/g, "''")}'::jsonb`;

/**
 * A figure resting on few observations says so: T. vagans' 200 eggs a sac come from two sacs
 * (Dor & Hénaut 2012; docs/trade-facts.md §6). Only a row whose eggs source is still that paper gets it.
 */
export class Migration20261203071000 extends Migration {
  override async up(): Promise<void> {
    this.addSql(
      `update "species" set "sources" = jsonb_set("sources", '{eggs}', ${json(TLIL_VAGANS_EGGS_SOURCE)})
        where "key" = 'tliltocatl-vagans' and "sources" -> 'eggs' ->> 'citation' like 'Dor, A. & Hénaut, Y. 2012%';`,
    );
  }

  override async down(): Promise<void> {
    this.addSql(`update "species" set "sources" = "sources" #- '{eggs,sampleSize}' where "key" = 'tliltocatl-vagans';`);
  }
}
