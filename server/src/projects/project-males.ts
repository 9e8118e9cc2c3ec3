import type { EntityManager } from '@mikro-orm/postgresql';
import { Animal } from '../animals/animal.entity';
import type { Pairing } from './pairing.entity';
import type { Project } from './project.entity';

/** What the males list needs of a pairing in force. */
export type PairingMaleRow = Pick<Pairing, 'project' | 'male' | 'startedAt'>;

/**
 * Each project's males: the one it started with, then every other male paired with her (pairings in
 * force), in the order first paired. Other males are loaded with what members see of them (species,
 * recorder, owner); one query, and none while every project has only its first male.
 */
export async function projectMales(em: EntityManager, projects: readonly Project[], pairings: readonly PairingMaleRow[]): Promise<Map<string, Animal[]>> {
  const sorted = [...pairings].sort((a, b) => a.startedAt.getTime() - b.startedAt.getTime());
  const idsOf = new Map(projects.map((p) => [p.id, [p.male.id]]));
  for (const row of sorted) {
    const ids = idsOf.get(row.project.id);
    if (ids && !ids.includes(row.male.id)) ids.push(row.male.id);
  }
  const first = new Set(projects.map((p) => p.male.id));
  const others = [...new Set([...idsOf.values()].flat().filter((id) => !first.has(id)))];
  const loaded = others.length ? await em.find(Animal, { id: { $in: others } }, { populate: ['species', 'recordedBy', 'ownerUser'] }) : [];
  const byId = new Map<string, Animal>([...projects.map((p) => [p.male.id, p.male] as const), ...loaded.map((a) => [a.id, a] as const)]);
  return new Map(projects.map((p) => [p.id, idsOf.get(p.id)!.map((id) => byId.get(id)!)]));
}

/** The day a male died, or null while he lives (a death recorded without a date counts from the record's last change). */
export function diedOn(male: Animal): string | null {
  return male.status === 'deceased' ? (male.statusOn ?? male.updatedAt.toISOString().slice(0, 10)) : null;
}

/** When the last of the males died; null while one of them lives. */
export function lastMaleDiedOn(males: readonly Animal[]): string | null {
  const deaths = males.map(diedOn);
  return deaths.every((d) => d !== null) ? ([...deaths].sort().at(-1) ?? null) : null;
}
