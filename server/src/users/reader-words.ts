import type { EntityManager } from '@mikro-orm/postgresql';
import { serverWordsFor, type StageNumbering, type TemperatureUnit, type Words } from '@broodsilk/shared';
import { User } from './user.entity';

/** What a server text needs to speak to one reader: their language's words, numbering set and unit. */
export interface Reader {
  t: Words;
  lng: User['language'];
  numbering: StageNumbering;
  unit: TemperatureUnit;
}

export const readerFrom = (u: Pick<User, 'language' | 'stageNumbering' | 'temperatureUnit'>): Reader => ({
  t: serverWordsFor(u.language),
  lng: u.language,
  numbering: u.stageNumbering,
  unit: u.temperatureUnit,
});

/** The reader behind a user reference; loads the row only when the request has not loaded it already. */
export async function loadReader(em: EntityManager, user: User | null | undefined): Promise<Reader> {
  if (!user) return readerFrom({ language: 'en', stageNumbering: 'us', temperatureUnit: 'C' });
  const row = user.language ? user : await em.findOneOrFail(User, user.id);
  return readerFrom(row);
}
