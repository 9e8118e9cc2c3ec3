import { ConflictException, Injectable, NotFoundException } from '@nestjs/common';
import { EntityManager } from '@mikro-orm/postgresql';
import type { KeptBackBatchResponse } from '@broodsilk/shared';
import type { AuthUser } from '../common/auth-user';
import type { ProjectAccess } from '../projects/project-access.service';
import { ActivityService } from '../activity/activity.service';
import { Clock } from '../common/clock';
import { fieldError } from '../common/field-errors';
import { User } from '../users/user.entity';
import { KeptBackBatch } from './kept-back-batch.entity';
import { KeptBackLogEntry } from './kept-back-log-entry.entity';
import { toKeptBackResponse } from './kept-back.mapper';
import { SacOpening } from './sac-opening.entity';
import type { Sac } from './sac.entity';
import { SacsService } from './sacs.service';
import { assertNotFuture } from './sac-rules';
import type { KeptBackEndDto, KeptBackLogDto } from './dto/kept-back.dto';
import { refusal } from '../common/refusal';

/** The eggs kept back at the opening: their own log of rolls and checks, and how the batch ended. */
@Injectable()
export class KeptBackService {
  constructor(
    private readonly em: EntityManager,
    private readonly sacs: SacsService,
    private readonly activity: ActivityService,
    private readonly clock: Clock,
  ) {}

  async get(access: ProjectAccess, sacId: string, em: EntityManager = this.em): Promise<KeptBackBatchResponse> {
    const sac = await this.sacs.find(access, sacId, em);
    const { batch, opening } = await this.batchOf(em, sac);
    await em.populate(batch, ['endedBy']);
    const entries = await em.find(KeptBackLogEntry, { batch }, { populate: ['recordedBy'], orderBy: { at: 'desc', createdAt: 'desc' } });
    return toKeptBackResponse(batch, opening, entries);
  }

  /** A roll or a check (owner and caretakers), or a strike of an earlier entry; only while the batch incubates. */
  async log(access: ProjectAccess, viewer: AuthUser, sacId: string, dto: KeptBackLogDto): Promise<KeptBackBatchResponse> {
    const now = this.clock.now();
    const at = dto.at ? new Date(dto.at) : now;
    assertNotFuture('at', 'sac.futureEntry', at, now);
    if (dto.kind === 'strike' && !dto.reason?.trim()) throw fieldError('reason', refusal('keptBack.strikeWhy'));
    if (dto.kind !== 'strike' && (dto.strikes || dto.reason)) throw fieldError('strikes', refusal('keptBack.onlyStrikeNames'));
    await this.em.transactional(async (tx) => {
      const sac = await this.sacs.find(access, sacId, tx);
      const { batch, opening } = await this.batchOf(tx, sac);
      if (batch.state !== 'incubating') throw new ConflictException(refusal('keptBack.ended', { state: batch.state }));
      if (at < opening.openedAt) throw fieldError('at', refusal('keptBack.entryBeforeKept', { openedAt: opening.openedAt.toISOString() }));
      const strikes = dto.kind === 'strike' ? await this.strikeTarget(tx, batch, dto.strikes) : null;
      const entry = tx.create(KeptBackLogEntry, {
        batch,
        kind: dto.kind,
        at,
        note: (dto.kind === 'strike' ? dto.reason : dto.note)?.trim() || null,
        recordedBy: tx.getReference(User, viewer.id),
        strikes,
      });
      const what = dto.kind === 'roll' ? 'rolled' : dto.kind === 'check' ? `checked${entry.note ? `: ${entry.note}` : ''}` : `entry struck (${entry.note})`;
      this.activity.record(tx, {
        projectId: access.project.id,
        actorId: viewer.id,
        kind: `kept-back.${dto.kind}`,
        subjectType: 'sac',
        subjectId: sac.id,
        at,
        summary: `Kept-back eggs of the sac laid ${sac.layDate} ${what}.`,
        data: { batchId: batch.id, entryId: entry.id, ...(strikes ? { strikes: strikes.id } : {}) },
      });
    });
    return this.get(access, sacId);
  }

  /** Ends the batch once: joined the brood (the next count may grow by that many) or written off. */
  async end(access: ProjectAccess, viewer: AuthUser, sacId: string, dto: KeptBackEndDto): Promise<KeptBackBatchResponse> {
    const now = this.clock.now();
    const at = dto.at ? new Date(dto.at) : now;
    assertNotFuture('at', 'sac.futureBatchEnd', at, now);
    if (dto.outcome === 'joined' && dto.joined == null) throw fieldError('joined', refusal('keptBack.joinedHowMany'));
    if (dto.outcome === 'written-off' && dto.joined != null) throw fieldError('joined', refusal('keptBack.writtenOffJoinsNothing'));
    await this.em.transactional(async (tx) => {
      const sac = await this.sacs.find(access, sacId, tx);
      const { batch, opening } = await this.batchOf(tx, sac);
      if (batch.state !== 'incubating') {
        throw new ConflictException(refusal(batch.state === 'joined' ? 'keptBack.alreadyJoined' : 'keptBack.alreadyWrittenOff'));
      }
      if (dto.joined != null && dto.joined > opening.keptBack) {
        throw fieldError('joined', refusal('keptBack.joinedTooMany', { keptBack: opening.keptBack, joined: dto.joined }));
      }
      if (at < opening.openedAt) throw fieldError('at', refusal('keptBack.endBeforeKept', { openedAt: opening.openedAt.toISOString() }));
      const reason = dto.reason.trim();
      Object.assign(batch, { state: dto.outcome, endedAt: at, joined: dto.joined ?? null, reason, endedBy: tx.getReference(User, viewer.id) });
      this.activity.record(tx, {
        projectId: access.project.id,
        actorId: viewer.id,
        kind: `kept-back.${dto.outcome}`,
        subjectType: 'sac',
        subjectId: sac.id,
        at,
        summary:
          dto.outcome === 'joined'
            ? `${dto.joined} of the ${opening.keptBack} eggs kept back from the sac laid ${sac.layDate} joined the brood (${reason}).`
            : `The ${opening.keptBack} eggs kept back from the sac laid ${sac.layDate} were written off (${reason}).`,
        data: { batchId: batch.id, outcome: dto.outcome, eggs: opening.keptBack, ...(dto.joined != null ? { joined: dto.joined } : {}) },
      });
    });
    return this.get(access, sacId);
  }

  /** The sac's batch and the opening in force (which says how many eggs it holds); 404 when none were kept back. */
  private async batchOf(em: EntityManager, sac: Sac): Promise<{ batch: KeptBackBatch; opening: SacOpening }> {
    const batch = await em.findOne(KeptBackBatch, { sac });
    const openings = batch ? await em.find(SacOpening, { sac }, { orderBy: { createdAt: 'desc' } }) : [];
    const struck = new Set(openings.map((o) => o.corrects?.id).filter(Boolean));
    const opening = openings.find((o) => !struck.has(o.id));
    if (!batch || !opening || opening.keptBack === 0) throw new NotFoundException(refusal('keptBack.none'));
    return { batch, opening };
  }

  private async strikeTarget(tx: EntityManager, batch: KeptBackBatch, id: string | undefined): Promise<KeptBackLogEntry> {
    if (!id) throw fieldError('strikes', refusal('keptBack.strikeWhich'));
    const target = await tx.findOne(KeptBackLogEntry, { id, batch });
    if (!target) throw fieldError('strikes', refusal('keptBack.noSuchEntry'));
    if (target.kind === 'strike') throw fieldError('strikes', refusal('keptBack.strikeOfStrike'));
    if (await tx.count(KeptBackLogEntry, { strikes: target })) throw new ConflictException(refusal('keptBack.alreadyStruck'));
    return target;
  }
}
