import { ConflictException, Injectable, NotFoundException } from '@nestjs/common';
import { EntityManager } from '@mikro-orm/postgresql';
import { todayIn, type OpeningResponse, type PhotoRef } from '@broodsilk/shared';
import type { AuthUser } from '../common/auth-user';
import type { ProjectAccess } from '../projects/project-access.service';
import { ActivityService } from '../activity/activity.service';
import { PhotosService } from '../photos/photos.service';
import { User } from '../users/user.entity';
import { SacOpening } from './sac-opening.entity';
import type { Sac } from './sac.entity';
import { BroodCount } from './brood-count.entity';
import { SacsService } from './sacs.service';
import { Clock } from '../common/clock';
import { assertNotFuture } from './sac-rules';
import { fieldError } from '../common/field-errors';
import { toOpeningResponse, viableOf } from './brood.mapper';
import type { OpeningDto } from './dto/opening.dto';
import { KeptBackBatch } from './kept-back-batch.entity';
import { checkOpeningAgainstSpecies } from './opening-plausibility';
import { refusal } from '../common/refusal';

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
    const versions = await this.versions(this.em, sac);
    if (!versions.length) throw new NotFoundException(refusal('opening.notYet'));
    const [current, ...struck] = versions;
    const photos = await this.photos.refsFor(
      OPENING_PHOTO,
      versions.map((o) => o.id),
    );
    return toOpeningResponse(
      current!,
      versions.flatMap((o) => photos.get(o.id) ?? []),
      struck,
    );
  }

  /** The sac's openings, the one in force first, then those it struck (newest first). */
  private async versions(em: EntityManager, sac: Sac): Promise<SacOpening[]> {
    const all = await em.find(SacOpening, { sac }, { populate: ['recordedBy'], orderBy: { createdAt: 'desc' } });
    const struck = new Set(all.map((o) => o.corrects?.id).filter(Boolean));
    return [...all.filter((o) => !struck.has(o.id)), ...all.filter((o) => struck.has(o.id))];
  }

  /** Records the opening and starts the brood with its first count (the viable young), in one transaction. */
  async open(access: ProjectAccess, viewer: AuthUser, sacId: string, dto: OpeningDto): Promise<OpeningResponse> {
    this.sacs.assertMayPullAndOpen(access);
    const now = this.clock.now();
    const given = dto.openedAt ? new Date(dto.openedAt) : null;
    if (given) assertNotFuture('openedAt', 'sac.futureOpening', given, now);
    const viable = viableOf(dto);
    if (dto.keptBack > viable) {
      throw fieldError('keptBack', refusal('opening.keptBackNotViable', { keptBack: dto.keptBack, viable }));
    }
    if (viable + dto.darkEggs + dto.spoiledEggs === 0) throw fieldError('healthyEggs', refusal('opening.nothingCounted'));
    if (dto.corrects && !dto.reason?.trim()) throw fieldError('reason', refusal('opening.correctionWhy'));
    if (!dto.corrects && dto.reason) throw fieldError('reason', refusal('opening.reasonOnlyCorrection'));
    await this.em.transactional(async (tx) => {
      const sac = await this.sacs.find(access, sacId, tx);
      const [current] = await this.versions(tx, sac);
      const target = dto.corrects ? this.correctionTarget(current, dto.corrects) : null;
      if (current && !target) throw new ConflictException(refusal('opening.alreadyOpened'));
      // A correction keeps the opening's time unless it gives another.
      const openedAt = given ?? target?.openedAt ?? now;
      const on = todayIn(viewer.timeZone, openedAt);
      if (on < sac.layDate) throw fieldError('openedAt', refusal('opening.beforeLaid', { on, layDate: sac.layDate }));
      const warningReason = await checkOpeningAgainstSpecies(tx, sac, dto);
      const batch = await this.keepBack(tx, sac, dto.keptBack);
      const recordedBy = tx.getReference(User, viewer.id);
      const reason = target ? dto.reason!.trim() : null;
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
        estimated: dto.estimated ?? false,
        warningReason,
        recordedBy,
        corrects: target,
        reason,
      });
      // The brood's first count follows the opening; a corrected opening strikes the old first count.
      const firstCount = target ? await tx.findOne(BroodCount, { sac, source: 'opening', at: target.openedAt }, { orderBy: { createdAt: 'desc' } }) : null;
      if (target && firstCount && (await tx.count(BroodCount, { corrects: firstCount }))) {
        throw new ConflictException(refusal('opening.firstCountCorrected'));
      }
      // The kept-back eggs are their own batch: they join the brood's count only when the batch does.
      const alive = viable - dto.keptBack;
      tx.create(BroodCount, {
        sac,
        at: openedAt,
        stage: firstCount?.stage ?? sac.broodStage,
        alive,
        estimated: dto.estimated ?? false,
        source: 'opening',
        recordedBy,
        note: 'First count, at the opening.',
        corrects: firstCount,
        reason,
      });
      const about = dto.estimated ? 'about ' : '';
      const kept = dto.keptBack ? ` and ${dto.keptBack} kept back for more incubation` : '';
      const summary = `${about}${alive} viable young${kept}, ${about}${dto.darkEggs} dark and ${dto.spoiledEggs} spoiled eggs`;
      this.activity.record(tx, {
        projectId: access.project.id,
        actorId: viewer.id,
        kind: target ? 'sac.opening-corrected' : 'sac.opened',
        subjectType: 'sac',
        subjectId: sac.id,
        at: target ? now : openedAt,
        summary: target
          ? `Opening of the sac laid ${sac.layDate} corrected from ${viableOf(target)} to ${summary} (${reason}).`
          : `Sac laid ${sac.layDate} opened: ${summary}.`,
        data: {
          openingId: o.id,
          viable,
          estimated: dto.estimated ?? false,
          ...(batch ? { keptBackBatchId: batch.id } : {}),
          keptBack: dto.keptBack,
          darkEggs: dto.darkEggs,
          spoiledEggs: dto.spoiledEggs,
          ...(target ? { corrects: target.id } : {}),
        },
      });
    });
    return this.get(access, sacId);
  }

  /**
   * Eggs kept back start the sac's batch (one per sac, its size read from the opening in force).
   * A correction may not keep back fewer than already joined the brood from it.
   */
  private async keepBack(tx: EntityManager, sac: Sac, keptBack: number): Promise<KeptBackBatch | null> {
    const batch = await tx.findOne(KeptBackBatch, { sac });
    if (batch?.state === 'joined' && keptBack < batch.joined!) {
      throw fieldError('keptBack', refusal('opening.keptBackBelowJoined', { joined: batch.joined!, keptBack }));
    }
    if (batch || keptBack === 0) return batch;
    return tx.create(KeptBackBatch, { sac });
  }

  private correctionTarget(current: SacOpening | undefined, id: string): SacOpening {
    if (!current) throw fieldError('corrects', refusal('opening.nothingToCorrect'));
    if (current.id !== id) throw new ConflictException(refusal('opening.onlyInForce'));
    return current;
  }

  async addPhoto(access: ProjectAccess, viewer: AuthUser, sacId: string, file: { buffer?: Buffer } | undefined): Promise<PhotoRef> {
    this.sacs.assertMayPullAndOpen(access);
    const sac = await this.sacs.find(access, sacId);
    const [o] = await this.versions(this.em, sac);
    if (!o) throw new NotFoundException(refusal('opening.photosNeedOpening'));
    return this.photos.store(viewer, OPENING_PHOTO, o.id, file);
  }
}
