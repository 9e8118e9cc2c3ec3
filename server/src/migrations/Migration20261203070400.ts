import { Migration } from '@mikro-orm/migrations';
import { OW_NOT_KNOWN_NOTE } from '../species/data/species.data';

/** The dataset's note on a New World species without a published case (kept for those that stay "no cases known"). */
const OLD_DEFAULT_NOTE = 'no published case of severe systemic effects known to us';
/** Old World burrowers of the fossorial group (its other genera are New World). */
const OW_BURROWER_GENERA = ['Pelinobius', 'Cyriopagopus'];
const PSALMOPOEUS_SOURCE = {
  kind: 'published',
  citation:
    'HandWiki, "Psalmopoeus irminia" (Psalmopoeus described as having stronger venom than other New World tarantulas; no medically significant case given)',
};

const list = (xs: string[]) => xs.map((x) => `'${x}'`).join(', ');
const json = (v: unknown) => `'${JSON.stringify(v).replace(/'/g, "''")}'::jsonb`;

/**
 * The venom flag becomes three-valued (docs/trade-facts.md §9): true → medically-significant;
 * false → not-known for Old World species (their groups and burrowing genera) and Psalmopoeus,
 * whose bites nobody has published either way; other false values with a recorded source →
 * no-cases-known; anything without a source → not-known.
 */
export class Migration20261203070400 extends Migration {
  override async up(): Promise<void> {
    this.addSql(`alter table "species" add column "venom" text check ("venom" in ('medically-significant', 'no-cases-known', 'not-known')) null;`);
    this.addSql(
      `update "species" set "venom" = case
        when "medically_significant_venom" then 'medically-significant'
        when "group" in ('ow-terrestrial', 'ow-arboreal') or "genus" in (${list([...OW_BURROWER_GENERA, 'Psalmopoeus'])}) then 'not-known'
        when "sources" -> 'venom' is not null then 'no-cases-known'
        else 'not-known' end;`,
    );
    this.addSql(
      `update "species" set "sources" = jsonb_set("sources", '{venom}', ${json({ kind: 'memory', note: OW_NOT_KNOWN_NOTE })})
        where "venom" = 'not-known' and "genus" <> 'Psalmopoeus' and "sources" -> 'venom' ->> 'note' = '${OLD_DEFAULT_NOTE}';`,
    );
    this.addSql(
      `update "species" set "sources" = jsonb_set("sources", '{venom}', ${json(PSALMOPOEUS_SOURCE)})
        where "genus" = 'Psalmopoeus' and "sources" -> 'venom' ->> 'note' = '${OLD_DEFAULT_NOTE}';`,
    );
    this.addSql(`alter table "species" alter column "venom" set not null;`);
    this.addSql(`alter table "species" drop column "medically_significant_venom";`);
  }

  override async down(): Promise<void> {
    this.addSql(`alter table "species" add column "medically_significant_venom" boolean not null default false;`);
    this.addSql(`update "species" set "medically_significant_venom" = ("venom" = 'medically-significant');`);
    this.addSql(`alter table "species" alter column "medically_significant_venom" drop default;`);
    this.addSql(
      `update "species" set "sources" = jsonb_set("sources", '{venom}', ${json({ kind: 'memory', note: OLD_DEFAULT_NOTE })})
        where "venom" = 'not-known' and ("sources" -> 'venom' ->> 'note' = '${OW_NOT_KNOWN_NOTE.replace(/'/g, "''")}' or "sources" -> 'venom' ->> 'citation' like 'HandWiki%');`,
    );
    this.addSql(`alter table "species" drop column "venom";`);
  }
}
