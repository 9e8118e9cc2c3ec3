import { BadRequestException, ConflictException, Injectable } from '@nestjs/common';
import { EntityManager } from '@mikro-orm/postgresql';
import { checkCount, todayIn, type BroodCountResponse, type BroodCountsResponse } from '@broodsilk/shared';
import type { AuthUser } from '../common/auth-user';
import type { ProjectAccess } from '../projects/project-access.service';
import { ActivityService } from '../activity/activity.service';
import { acceptWarnings } from '../plausibility/plausibility';
import { User } from '../users/user.entity';
import { BroodCount } from './brood-count.entity';
import { SacOpening } from './sac-opening.entity';
import type { Sac } from './sac.entity';
import { SacsService } from './sacs.service';
import { CareLogService } from './care-log.service';
import { Clock } from '../common/clock';
import { assertNotFuture } from './sac-rules';
import { badRequest, fieldError } from '../common/field-errors';
import { toBroodCountResponse } from './brood.mapper';
import type { BroodCountDto } from './dto/brood-count.dto';
import { broodStageLabel, label, serverWordsFor } from '@broodsilk/shared';
import { KeptBackBatch } from './kept-back-batch.entity';
import { refusal } from '../common/refusal';

const byInstant = (a: BroodCount, b: BroodCount) => a.at.getTime() - b.at.getTime() || a.createdAt.getTime() - b.createdAt.getTime();

/** Which count corrected which: struck count id → the correcting count's id. */
export const struckCounts = (counts: readonly BroodCount[]) => new Map(counts.filter((c) => c.corrects).map((c) => [c.corrects!.id, c.id]));

@Injectable()
export class BroodCountsService {
  constructor(
    private readonly em: EntityManager,
    private readonly sacs: SacsService,
    private readonly activity: ActivityService,
    private readonly clock: Clock,
    private readonly careLog: CareLogService,
  ) {}

  /** Oldest first, struck counts included (flagged); `current` is the latest count not struck. */
  async list(access: ProjectAccess, sacId: string): Promise<BroodCountsResponse> {
    const sac = await this.sacs.find(access, sacId);
    const counts = await this.em.find(BroodCount, { sac }, { populate: ['recordedBy'], orderBy: { at: 'asc', createdAt: 'asc' } });
    const struck = struckCounts(counts);
    const current = counts.filter((c) => !struck.has(c.id)).at(-1);
    return {
      current: current?.alive ?? null,
      currentEstimated: current?.estimated ?? false,
      counts: counts.map((c) => toBroodCountResponse(c, struck.get(c.id) ?? null)),
    };
  }

  async add(access: ProjectAccess, viewer: AuthUser, sacId: string, dto: BroodCountDto): Promise<BroodCountResponse> {
    const now = this.clock.now();
    const lost = dto.lost ?? 0;
    if (lost > 0 && !dto.lossReason) throw fieldError('lossReason', refusal('broodCount.lossReasonNeeded'));
    if (lost === 0 && dto.lossReason) throw fieldError('lossReason', refusal('broodCount.lossReasonOnlyLoss'));
    if (dto.corrects && !dto.reason?.trim()) throw fieldError('reason', refusal('broodCount.correctionWhy'));
    if (!dto.corrects && dto.reason) throw fieldError('reason', refusal('broodCount.reasonOnlyCorrection'));
    const id = await this.em.transactional(async (tx) => {
      const sac = await this.sacs.find(access, sacId, tx);
      const opening = await tx.findOne(SacOpening, { sac, corrects: null });
      if (!opening) throw new BadRequestException(refusal('broodCount.openingFirst'));
      const counts = await tx.find(BroodCount, { sac }, { orderBy: { at: 'asc', createdAt: 'asc' } });
      const target = dto.corrects ? correctionTarget(counts, dto.corrects) : null;
      const at = dto.at ? new Date(dto.at) : (target?.at ?? now);
      assertNotFuture('at', 'sac.futureCount', at, now);
      if (at < opening.openedAt) throw fieldError('at', refusal('broodCount.beforeOpening', { openedAt: opening.openedAt.toISOString() }));
      const batch = await tx.findOne(KeptBackBatch, { sac, state: 'joined' });
      const warningReason = this.checkAgainstPrevious(counts, target, at, viewer.timeZone, dto, batch);
      const c = tx.create(BroodCount, {
        sac,
        at,
        stage: dto.stage,
        alive: dto.alive,
        lost,
        lossReason: dto.lossReason ?? null,
        note: dto.note ?? null,
        source: 'count',
        estimated: dto.estimated ?? false,
        corrects: target,
        reason: target ? dto.reason!.trim() : null,
        warningReason,
        recordedBy: tx.getReference(User, viewer.id),
      });
      await this.careLog.stageFromCount(tx, sac, dto.stage, at, viewer.id);
      this.activity.record(tx, {
        projectId: access.project.id,
        actorId: viewer.id,
        kind: target ? 'brood.corrected' : 'brood.counted',
        subjectType: 'sac',
        subjectId: sac.id,
        at: target ? now : at,
        summary: countSummary(sac, dto, lost, target),
        data: { countId: c.id, stage: dto.stage, alive: dto.alive, lost, ...(target ? { corrects: target.id, was: target.alive } : {}) },
      });
      return c.id;
    });
    return toBroodCountResponse(await this.em.findOneOrFail(BroodCount, id, { populate: ['recordedBy'] }));
  }

  /**
   * The count may not exceed the latest count before it (struck ones and the corrected one aside)
   * plus a kept-back batch that joined the brood since: 400 after an exact count, a warning after
   * an estimate. Returns the acknowledged warning's reason.
   */
  private checkAgainstPrevious(
    counts: BroodCount[],
    target: BroodCount | null,
    at: Date,
    timeZone: string,
    dto: BroodCountDto,
    joinedBatch: KeptBackBatch | null,
  ): string | null {
    const struck = struckCounts(counts);
    const previous = counts
      .filter((c) => !struck.has(c.id) && c !== target && c.at <= at)
      .sort(byInstant)
      .at(-1);
    // A kept-back batch that joined the brood after `previous` (and by the time of this count) adds its young.
    const joinedAt = joinedBatch?.endedAt;
    const joinedSince = joinedAt && joinedAt <= at && (!previous || joinedAt > previous.at) ? joinedBatch.joined! : 0;
    const check = checkCount(
      dto.alive,
      previous ? { alive: previous.alive, on: todayIn(timeZone, previous.at), estimated: previous.estimated } : null,
      joinedSince,
    );
    if (check && 'refuse' in check) throw badRequest([{ field: 'alive', ...check.refuse }]);
    return acceptWarnings(check ? [check.warn] : [], dto);
  }
}

function correctionTarget(counts: BroodCount[], id: string): BroodCount {
  const target = counts.find((c) => c.id === id);
  if (!target) throw fieldError('corrects', refusal('broodCount.noSuchCount'));
  if (target.source === 'opening') throw fieldError('corrects', refusal('broodCount.firstFromOpening'));
  if (counts.some((c) => c.corrects?.id === id)) throw new ConflictException(refusal('broodCount.alreadyCorrected'));
  return target;
}

function countSummary(sac: Sac, dto: BroodCountDto, lost: number, target: BroodCount | null): string {
  const t = serverWordsFor('en');
  const values = { about: dto.estimated ? t('text.about') : '', alive: dto.alive, stage: broodStageLabel(t, dto.stage), lost };
  const what = lost
    ? t('text.broodCountLost', { ...values, reason: dto.lossReason ? label(t, 'broodLoss', dto.lossReason).toLowerCase() : '' })
    : t('text.broodCount', values);
  if (target) return `Brood of the sac laid ${sac.layDate}: count of ${target.alive} corrected to ${what} (${dto.reason!.trim()}).`;
  return `Brood of the sac laid ${sac.layDate}: ${what}.`;
}
