import { ConflictException, ForbiddenException, Injectable, NotFoundException } from '@nestjs/common';
import { EntityManager, type QueryBuilder } from '@mikro-orm/postgresql';
import { ForeignKeyConstraintViolationException, LockMode } from '@mikro-orm/core';
import { todayIn, type AnimalStatus, type MaleDeparture, type AnimalResponse, type MaleClockRow, type Paged, type AnimalSummary } from '@broodsilk/shared';
import type { AuthUser } from '../common/auth-user';
import { User } from '../users/user.entity';
import { escapeLike } from '../species/species.service';
import { Animal } from './animal.entity';
import { maleClockOf, toAnimalResponse, toAnimalSummary } from './animals.mapper';
import { resolveAnimalInput } from './animal-input';
import { AnimalUsageRegistry } from './animal-usage.registry';
import { AnimalDepartureRegistry } from './animal-departure.registry';
import { AnimalReadersRegistry } from './animal-readers.registry';
import { PhotosService } from '../photos/photos.service';
import { badRequest } from '../common/field-errors';

/** Photo subject type of an animal's own photos. */
export const ANIMAL_PHOTO = 'animal';
import type { CreateAnimalDto } from './dto/create-animal.dto';
import type { UpdateAnimalDto } from './dto/update-animal.dto';
import type { AnimalListQueryDto } from './dto/animal-list-query.dto';
import { Clock } from '../common/clock';
import { refusal } from '../common/refusal';

const SORT_COLUMNS = {
  label: 'a.label',
  species: 's.scientificName',
  sex: 'a.sex',
  status: 'a.status',
  maturedOn: 'a.maturedOn',
  createdAt: 'a.createdAt',
} as const;

/** Statuses an edit can move to that count as the animal leaving for good. */
const DEPARTURES: Partial<Record<AnimalStatus, MaleDeparture>> = { deceased: 'died', returned: 'returned' };

const CLOCK_URGENCY = { 'past-typical': 0, late: 1, prime: 2, fresh: 3 } as const;

/** Row lock for a change that reads before it writes, so two requests at once see each other's result. */
export async function lockAnimal(tx: EntityManager, id: string): Promise<void> {
  await tx.createQueryBuilder(Animal).select('id').where({ id }).setLockMode(LockMode.PESSIMISTIC_WRITE).execute();
}

@Injectable()
export class AnimalsService {
  constructor(
    private readonly em: EntityManager,
    private readonly clock: Clock,
    private readonly usage: AnimalUsageRegistry,
    private readonly departures: AnimalDepartureRegistry,
    private readonly readers: AnimalReadersRegistry,
    private readonly photos: PhotosService,
  ) {}

  private async respond(a: Animal, viewer: AuthUser): Promise<AnimalResponse> {
    const photos = await this.photos.refsFor(ANIMAL_PHOTO, [a.id]);
    return toAnimalResponse(a, this.today(viewer), viewer.id, photos.get(a.id) ?? []);
  }

  today(viewer: AuthUser): string {
    return todayIn(viewer.timeZone, this.clock.now());
  }

  async list(viewer: AuthUser, q: AnimalListQueryDto): Promise<Paged<AnimalSummary>> {
    // Her own records, and animals she owns that another keeper holds (a male on loan), read-only.
    const qb = this.em
      .createQueryBuilder(Animal, 'a')
      .joinAndSelect('a.species', 's')
      .joinAndSelect('a.recordedBy', 'r')
      .leftJoinAndSelect('a.ownerUser', 'o')
      .where({ $or: [{ recordedBy: viewer.id }, { ownerUser: viewer.id }] });
    this.applyFilters(qb, q);
    const dir = q.order === 'desc' ? 'desc' : 'asc';
    const column = SORT_COLUMNS[q.sort ?? 'createdAt'];
    // nulls last either way, and the id breaks ties so pages never overlap
    qb.orderBy([{ [column]: `${dir} nulls last` } as never, { id: 'asc' }]);
    qb.limit(q.limit ?? 50).offset(q.offset ?? 0);
    const [rows, total] = await qb.getResultAndCount();
    return { items: rows.map((a) => toAnimalSummary(a, viewer.id)), total };
  }

  private applyFilters(qb: QueryBuilder<Animal>, q: AnimalListQueryDto): void {
    if (q.speciesId) qb.andWhere({ species: q.speciesId });
    if (q.sex) qb.andWhere({ sex: q.sex });
    if (q.status) qb.andWhere({ status: q.status });
    if (q.mature !== undefined) qb.andWhere({ maturity: q.mature ? 'mature' : { $ne: 'mature' } });
    const text = q.q?.trim().toLowerCase();
    if (text) {
      const like = `%${escapeLike(text)}%`;
      qb.andWhere(
        `(lower(a.label) like ? or lower(a.enclosure) like ? or lower(s.scientific_name) like ? or exists (select 1 from unnest(s.former_names || s.common_names) as n(name) where lower(n.name) like ?))`,
        [like, like, like, like],
      );
    }
  }

  /** An animal the viewer recorded; anybody else's is a 404, so its existence is not revealed. */
  async own(viewer: AuthUser, id: string, em: EntityManager = this.em): Promise<Animal> {
    return em.findOneOrFail(Animal, { id, recordedBy: viewer.id }, { populate: ['species', 'recordedBy', 'ownerUser'] });
  }

  /**
   * Like `own`, for the routes that only the recorder may use: someone who can read the animal
   * through a project gets 403 (the animal is known to them), anybody else 404.
   */
  async ownOrForbid(viewer: AuthUser, id: string, em: EntityManager = this.em): Promise<Animal> {
    const a = await em.findOne(Animal, { id, recordedBy: viewer.id }, { populate: ['species', 'recordedBy', 'ownerUser'] });
    if (a) return a;
    if (await this.readers.canRead(em, id, viewer.id)) {
      throw new ForbiddenException(refusal('animal.onlyRecorder'));
    }
    throw new NotFoundException(refusal('animal.notFound'));
  }

  /** An animal the viewer recorded or owns (held by another keeper: read-only); anybody else's is a 404. */
  async readable(viewer: AuthUser, id: string): Promise<Animal> {
    return this.em.findOneOrFail(
      Animal,
      { id, $or: [{ recordedBy: viewer.id }, { ownerUser: viewer.id }] },
      { populate: ['species', 'recordedBy', 'ownerUser'] },
    );
  }

  async get(viewer: AuthUser, id: string): Promise<AnimalResponse> {
    return this.respond(await this.readable(viewer, id), viewer);
  }

  /**
   * For the projects module: reads an animal for a member of a project it belongs to. The caller
   * must have checked the membership; the response is read-only (`editable` false unless the
   * viewer recorded it).
   */
  async getForProjectMember(animalId: string, viewer: AuthUser): Promise<AnimalResponse> {
    const a = await this.em.findOneOrFail(Animal, { id: animalId }, { populate: ['species', 'recordedBy', 'ownerUser'] });
    return this.respond(a, viewer);
  }

  async create(viewer: AuthUser, dto: CreateAnimalDto): Promise<AnimalResponse> {
    const { errors, values } = await resolveAnimalInput(this.em, viewer, dto, null, this.today(viewer));
    if (errors.length) throw badRequest(errors);
    const animal = this.em.create(Animal, { ...values, recordedBy: this.em.getReference(User, viewer.id) } as never);
    await this.em.flush();
    return this.get(viewer, (animal as Animal).id);
  }

  /**
   * An edit that sets the status to deceased or returned is a departure like the dedicated routes:
   * the same transaction writes the events on the animal's projects.
   */
  async update(viewer: AuthUser, id: string, dto: UpdateAnimalDto): Promise<AnimalResponse> {
    await this.em.transactional(async (tx) => {
      await lockAnimal(tx, id);
      const animal = await this.own(viewer, id, tx);
      const before = animal.status;
      const { errors, values } = await resolveAnimalInput(tx, viewer, dto, animal, this.today(viewer));
      if (errors.length) throw badRequest(errors);
      tx.assign(animal, values);
      if (animal.status !== 'returned') animal.returnedOn = null;
      const departure = animal.status === before ? null : DEPARTURES[animal.status];
      if (departure) await this.departures.depart(tx, { animal, departure, on: animal.statusOn!, actorId: viewer.id });
    });
    return this.get(viewer, id);
  }

  /** Only for mistakes: a sold or dead animal keeps its record (set its status instead). */
  async remove(viewer: AuthUser, id: string): Promise<void> {
    const animal = await this.own(viewer, id);
    // Each reason is a whole sentence; the first one is enough to say why.
    const [used] = await this.usage.reasons(this.em, id);
    if (used) throw new ConflictException(refusal(used.key, used.values));
    try {
      await this.em.remove(animal).flush();
    } catch (e) {
      if (e instanceof ForeignKeyConstraintViolationException) {
        throw new ConflictException(refusal('animal.inProject'));
      }
      throw e;
    }
  }

  /** Mature males of the viewer's collection still in their hands, the most urgent clock first. */
  async malesByClock(viewer: AuthUser): Promise<MaleClockRow[]> {
    const males = await this.em.find(
      Animal,
      { recordedBy: viewer.id, sex: 'male', maturity: 'mature', maturedOn: { $ne: null }, status: { $in: ['active', 'on-loan'] } },
      { populate: ['species'] },
    );
    const today = this.today(viewer);
    return males
      .map((a) => ({ animal: toAnimalSummary(a, viewer.id), clock: maleClockOf(a, today) }))
      .filter((r): r is MaleClockRow => r.clock !== null)
      .sort(
        (x, y) =>
          CLOCK_URGENCY[x.clock.state] - CLOCK_URGENCY[y.clock.state] ||
          x.clock.daysUntilPastTypical - y.clock.daysUntilPastTypical ||
          x.animal.label.localeCompare(y.animal.label),
      );
  }
}
