import { ConflictException, Injectable, NotFoundException } from '@nestjs/common';
import { EntityManager } from '@mikro-orm/postgresql';
import { todayIn, type OpeningResponse, type PhotoRef } from '@broodsilk/shared';
import type { AuthUser } from '../common/auth-user';
import type { ProjectAccess } from '../projects/project-access.service';
import { ActivityService } from '../activity/activity.service';
import { PhotosService } from '../photos/photos.service';
import { User } from '../users/user.entity';
import { SacOpening } from './sac-opening.entity';
import { BroodCount } from './brood-count.entity';
import { SacsService } from './sacs.service';
import { Clock } from '../common/clock';
import { assertNotFuture } from './sac-rules';
import { badRequest, fieldError } from '../common/field-errors';
import { toOpeningResponse, viableOf } from './brood.mapper';
import type { OpeningDto } from './dto/opening.dto';

/** Photo subject type of an opening's photos; members of the sac's project see them. */
export const OPENING_PHOTO = 'opening';

@Injectable()
export class OpeningService {
  constructor(
    private readonly em: EntityManager,
    private readonly sacs: SacsService,
    private readonly activity: ActivityService,
    private readonly photos: PhotosService,
    private readonly clock: Clock,
  ) {}

  async get(access: ProjectAccess, sacId: string): Promise<OpeningResponse> {
    const sac = await this.sacs.find(access, sacId);
    const o = await this.em.findOne(SacOpening, { sac }, { populate: ['recordedBy'] });
    if (!o) throw new NotFoundException({ message: 'This sac has not been opened yet.' });
    return toOpeningResponse(o, (await this.photos.refsFor(OPENING_PHOTO, [o.id])).get(o.id) ?? []);
  }

  /** Records the opening and starts the brood with its first count (the viable young), in one transaction. */
  async open(access: ProjectAccess, viewer: AuthUser, sacId: string, dto: OpeningDto): Promise<OpeningResponse> {
    const now = this.clock.now();
    const openedAt = dto.openedAt ? new Date(dto.openedAt) : now;
    assertNotFuture('openedAt', 'opening time', openedAt, now);
    const viable = viableOf(dto);
    if (dto.keptBack > viable) {
      throw badRequest([
        {
          field: 'keptBack',
          message: `Only viable young can go back into incubation: ${dto.keptBack} kept back, but ${viable} counted as healthy eggs, eggs with legs and nymphs.`,
        },
      ]);
    }
    if (viable + dto.darkEggs + dto.spoiledEggs === 0) throw fieldError('healthyEggs', 'Nothing was counted; an opening records at least one egg or nymph.');
    await this.em.transactional(async (tx) => {
      const sac = await this.sacs.find(access, sacId, tx);
      if (await tx.count(SacOpening, { sac }))
        throw new ConflictException({ message: 'This sac has already been opened; record later changes as brood counts.' });
      const on = todayIn(viewer.timeZone, openedAt);
      if (on < sac.layDate) throw fieldError('openedAt', `The opening (${on}) is dated before the sac was laid (${sac.layDate}).`);
      const recordedBy = tx.getReference(User, viewer.id);
      const o = tx.create(SacOpening, {
        sac,
        openedAt,
        healthyEggs: dto.healthyEggs,
        eggsWithLegs: dto.eggsWithLegs,
        nymphs: dto.nymphs,
        darkEggs: dto.darkEggs,
        spoiledEggs: dto.spoiledEggs,
        keptBack: dto.keptBack,
        notes: dto.notes ?? null,
        recordedBy,
      });
      tx.create(BroodCount, { sac, at: openedAt, stage: sac.broodStage, alive: viable, source: 'opening', recordedBy, note: 'First count, at the opening.' });
      this.activity.record(tx, {
        projectId: access.project.id,
        actorId: viewer.id,
        kind: 'sac.opened',
        subjectType: 'sac',
        subjectId: sac.id,
        at: openedAt,
        summary: `Sac laid ${sac.layDate} opened: ${viable} viable (${dto.keptBack} kept back in incubation), ${dto.darkEggs} dark and ${dto.spoiledEggs} spoiled eggs.`,
        data: { openingId: o.id, viable, keptBack: dto.keptBack, darkEggs: dto.darkEggs, spoiledEggs: dto.spoiledEggs },
      });
    });
    return this.get(access, sacId);
  }

  async addPhoto(access: ProjectAccess, viewer: AuthUser, sacId: string, file: { buffer?: Buffer } | undefined): Promise<PhotoRef> {
    const sac = await this.sacs.find(access, sacId);
    const o = await this.em.findOne(SacOpening, { sac });
    if (!o) throw new NotFoundException({ message: 'Record the opening first; its photos belong to it.' });
    return this.photos.store(viewer, OPENING_PHOTO, o.id, file);
  }
}
