import type { SpeciesDataRow } from './data/species.data';
import type { SpeciesSourceKey } from './species.entity';

const lit = (v: string | null): string => (v === null ? 'null' : `'${v.replace(/'/g, "''")}'`);
const num = (v: number | undefined): string => (v === undefined ? 'null' : String(Math.trunc(v)));
const arr = (v: string[]): string => `array[${v.map(lit).join(', ')}]::text[]`;

function sources(r: SpeciesDataRow): Partial<Record<SpeciesSourceKey, unknown>> {
  return {
    name: r.nameSource,
    urticatingHairs: r.urticatingHairs.source,
    venom: r.venom.source,
    tradeListing: r.tradeListing.source,
    ...(r.pullWindow ? { pullWindow: r.pullWindow.source } : {}),
    ...(r.pairingToSacDays ? { pairingToSac: r.pairingToSacDays.source } : {}),
    ...(r.eggsPerSac ? { eggs: r.eggsPerSac.source } : {}),
    ...(r.matureMaleLifespanMonths ? { lifespan: r.matureMaleLifespanMonths.source } : {}),
  };
}

/**
 * How the venom flag is stored: a boolean `medically_significant_venom` until the three-valued
 * `venom` column replaced it (Migration20261203070400); the first catalogue migration writes the former.
 */
export type VenomColumn = 'boolean' | 'three-valued';

/**
 * One statement inserting the checked-in catalogue. Rows already present (by key) are left alone,
 * so an admin's edits survive; a later migration can call this again to add new dataset rows.
 */
export function catalogueInsertSql(rows: SpeciesDataRow[], venomColumn: VenomColumn = 'three-valued'): string {
  const values = rows.map((r) =>
    [
      'gen_random_uuid()',
      'now()',
      'now()',
      lit(r.key),
      lit(r.scientificName),
      lit(r.scientificName.split(' ')[0]),
      lit(r.authority),
      arr(r.formerNames),
      arr(r.commonNames),
      `${lit(r.group)}::species_group`,
      String(r.urticatingHairs.value),
      venomColumn === 'boolean' ? String(r.venom.value === 'medically-significant') : lit(r.venom.value),
      lit(r.tradeListing.value),
      num(r.pullWindow?.value.fromDay),
      num(r.pullWindow?.value.toDay),
      num(r.pairingToSacDays?.value.min),
      num(r.pairingToSacDays?.value.max),
      num(r.eggsPerSac?.value.min),
      num(r.eggsPerSac?.value.max),
      num(r.matureMaleLifespanMonths?.value.min),
      num(r.matureMaleLifespanMonths?.value.max),
      `${lit(JSON.stringify(sources(r)))}::jsonb`,
    ].join(', '),
  );
  return `insert into "species" ("id", "created_at", "updated_at", "key", "scientific_name", "genus", "authority", "former_names", "common_names", "group", "urticating_hairs", ${venomColumn === 'boolean' ? '"medically_significant_venom"' : '"venom"'}, "trade_listing", "pull_from_day", "pull_to_day", "pairing_to_sac_min_days", "pairing_to_sac_max_days", "eggs_min", "eggs_max", "lifespan_min_months", "lifespan_max_months", "sources") values\n(${values.join('),\n(')})\non conflict ("key") do nothing;`;
}

/** Fills in the common names of catalogue rows that have none yet (an admin's own list stays). */
export function commonNamesFillSql(rows: Pick<SpeciesDataRow, 'key' | 'commonNames'>[]): string[] {
  return rows
    .filter((r) => r.commonNames.length > 0)
    .map((r) => `update "species" set "common_names" = ${arr(r.commonNames)} where "key" = ${lit(r.key)} and "common_names" = '{}';`);
}
