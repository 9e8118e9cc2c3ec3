import { Migration } from '@mikro-orm/migrations';
import { SPECIES_DATA } from '../species/data/species.data';

const json = (v: unknown) => `'${JSON.stringify(v).replace(/'/g, "''")}'::jsonb`;
const ROWS = SPECIES_DATA.filter((r) => r.pairingToSacDays && r.key !== 'grammostola-rosea');

/**
 * Tropical New World ground dwellers get their own pairing-to-sac days (docs/trade-facts.md §3): the
 * group's 120–300 days fits the seasonal genera only. A species an admin already gave a value keeps it.
 */
export class Migration20261203072000 extends Migration {
  override async up(): Promise<void> {
    for (const r of ROWS) {
      const { value, source } = r.pairingToSacDays!;
      this.addSql(
        `update "species" set "pairing_to_sac_min_days" = ${value.min}, "pairing_to_sac_max_days" = ${value.max}, "sources" = jsonb_set("sources", '{pairingToSac}', ${json(source)})
          where "key" = '${r.key}' and "pairing_to_sac_min_days" is null and "pairing_to_sac_max_days" is null;`,
      );
    }
  }

  override async down(): Promise<void> {
    for (const r of ROWS) {
      const { value, source } = r.pairingToSacDays!;
      this.addSql(
        `update "species" set "pairing_to_sac_min_days" = null, "pairing_to_sac_max_days" = null, "sources" = "sources" - 'pairingToSac'
          where "key" = '${r.key}' and "pairing_to_sac_min_days" = ${value.min} and "pairing_to_sac_max_days" = ${value.max} and "sources" -> 'pairingToSac' = ${json(source)};`,
      );
    }
  }
}
