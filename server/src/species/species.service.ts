import { BadRequestException, Injectable } from '@nestjs/common';
import { EntityManager } from '@mikro-orm/postgresql';
import type { EffectiveBreedingValues, FieldError, Paged, SpeciesResponse, ValueSource } from '@broodsilk/shared';
import { Species, type SpeciesSourceKey } from './species.entity';
import { ownBreeding, toSpeciesResponse } from './species.mapper';
import { effectiveBreeding } from './effective-breeding';
import type { SpeciesListQueryDto } from './dto/species-list-query.dto';
import type { UpdateSpeciesDto } from './dto/update-species.dto';
import { fieldRefusal, refusal, term } from '../common/refusal';
import { badRequest } from '../common/field-errors';

/** `%`, `_` and `\` typed by a keeper are letters, not wildcards. */
export function escapeLike(text: string): string {
  return text.replace(/[\\%_]/g, (c) => `\\${c}`);
}

type Pair = [keyof Species & keyof UpdateSpeciesDto, keyof Species & keyof UpdateSpeciesDto, SpeciesSourceKey, string, number];
const PAIRS: Pair[] = [
  ['pullFromDay', 'pullToDay', 'pullWindow', 'pull window', 0],
  ['pairingToSacMinDays', 'pairingToSacMaxDays', 'pairingToSac', 'days from pairing to sac', 1],
  ['eggsMin', 'eggsMax', 'eggs', 'eggs per sac', 1],
  ['lifespanMinMonths', 'lifespanMaxMonths', 'lifespan', 'mature-male lifespan', 1],
];
const FLAGS: ['urticatingHairs' | 'venom' | 'tradeListing', SpeciesSourceKey][] = [
  ['urticatingHairs', 'urticatingHairs'],
  ['venom', 'venom'],
  ['tradeListing', 'tradeListing'],
];

@Injectable()
export class SpeciesService {
  constructor(private readonly em: EntityManager) {}

  /** Case-insensitive prefix of any word of the current, former or common names ("vag", "brachypelma vag", "euathlus"). */
  async list(query: SpeciesListQueryDto): Promise<Paged<SpeciesResponse>> {
    const qb = this.em.createQueryBuilder(Species, 's');
    const q = query.q?.trim().toLowerCase().replace(/\s+/g, ' ');
    if (q) {
      const like = `% ${escapeLike(q)}%`;
      qb.where(
        `(' ' || lower(s.scientific_name) like ? or exists (select 1 from unnest(s.former_names || s.common_names) as n(name) where ' ' || lower(n.name) like ?))`,
        [like, like],
      );
    }
    if (query.group) qb.andWhere({ group: query.group });
    qb.orderBy({ scientificName: 'asc' })
      .limit(query.limit ?? 50)
      .offset(query.offset ?? 0);
    const [rows, total] = await qb.getResultAndCount();
    return { items: rows.map(toSpeciesResponse), total };
  }

  async get(id: string): Promise<SpeciesResponse> {
    return toSpeciesResponse(await this.em.findOneOrFail(Species, { id }));
  }

  /** For other modules (projects, sacs): the breeding values in force for a species, each with its source and origin. */
  async effective(id: string): Promise<EffectiveBreedingValues> {
    const s = await this.em.findOneOrFail(Species, { id });
    return effectiveBreeding(s.group, ownBreeding(s));
  }

  /** For other modules: the entity, or a 400 naming the field when the id is not in the catalogue. */
  async require(id: string, field = 'speciesId'): Promise<Species> {
    const found = await this.em.findOne(Species, { id });
    if (!found) throw new BadRequestException({ ...refusal('species.choose'), details: [fieldRefusal(field, 'species.choose')] });
    return found;
  }

  async update(id: string, dto: UpdateSpeciesDto): Promise<SpeciesResponse> {
    const s = await this.em.findOneOrFail(Species, { id });
    const { sourceKind, sourceCitation, ...values } = dto;
    const changed: SpeciesSourceKey[] = [];
    for (const [a, b, key] of PAIRS) if (values[a] !== undefined || values[b] !== undefined) changed.push(key);
    for (const [field, key] of FLAGS) if (values[field] !== undefined) changed.push(key);

    const problems: FieldError[] = [];
    const source = this.sourceOf(sourceKind, sourceCitation, changed.length > 0, problems);
    this.em.assign(s, values);
    for (const [a, b, key, , least] of PAIRS) {
      const lo = s[a] as number | null | undefined;
      const hi = s[b] as number | null | undefined;
      if ((lo == null) !== (hi == null))
        problems.push(fieldRefusal(String(lo == null ? a : b), 'species.bothEnds', { what: term(`refusal.speciesRange.${key}`) }));
      else if (lo != null && hi != null && lo > hi)
        problems.push(fieldRefusal(String(a), 'species.upsideDown', { what: term(`refusal.speciesRange.${key}`), lo, hi }));
      else if (lo != null && lo < least) problems.push(fieldRefusal(String(a), 'species.startAtLeast', { what: term(`refusal.speciesRange.${key}`), least }));
    }
    if (problems.length) throw badRequest(problems);
    if (source) s.sources = { ...s.sources, ...Object.fromEntries(changed.map((k) => [k, source])) };
    await this.em.flush();
    return toSpeciesResponse(s);
  }

  private sourceOf(kind: ValueSource['kind'] | undefined, citation: string | undefined, needed: boolean, problems: FieldError[]): ValueSource | null {
    if (!needed) return null;
    if (!kind) {
      problems.push(fieldRefusal('sourceKind', 'species.sourceKind'));
      return null;
    }
    if (kind === 'published') {
      if (!citation) problems.push(fieldRefusal('sourceCitation', 'species.citation'));
      return { kind, citation: citation ?? '' };
    }
    return citation ? { kind, note: citation } : { kind };
  }
}
