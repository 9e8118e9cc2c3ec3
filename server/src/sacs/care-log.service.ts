import { BadRequestException, ConflictException, Injectable } from '@nestjs/common';
import { EntityManager } from '@mikro-orm/postgresql';
import { isBroodStageAtLeast, todayIn, type CareLogEntryResponse, type KeysetPage, type KeysetQuery } from '@broodsilk/shared';
import { decodeCursor, encodeCursor, pageSize } from '../common/paging/keyset-cursor';
import type { AuthUser } from '../common/auth-user';
import type { ProjectAccess } from '../projects/project-access.service';
import { ActivityService } from '../activity/activity.service';
import { User } from '../users/user.entity';
import type { Sac } from './sac.entity';
import { SacLogEntry } from './sac-log-entry.entity';
import { SacsService } from './sacs.service';
import { Clock } from '../common/clock';
import { assertNotFuture } from './sac-rules';
import { fieldError } from '../common/field-errors';
import { assertStageMove, entryValues } from './care-log-rules';
import { careLogSummary, toCareLogResponse } from './care-log.mapper';
import { bandOf } from './sac-band';
import type { CareLogEntryDto } from './dto/care-log-entry.dto';
import { fieldRefusal, refusal } from '../common/refusal';

@Injectable()
export class CareLogService {
  constructor(
    private readonly em: EntityManager,
    private readonly sacs: SacsService,
    private readonly activity: ActivityService,
    private readonly clock: Clock,
  ) {}

  /**
   * Newest first by (at, created_at, id), one page at a time by keyset: the page after a cursor holds
   * the entries strictly older than the cursor's entry, so a page costs the same however far back it
   * is (index on sac_id, at, created_at, id). Struck entries stay, flagged with the strike that
   * corrected them, even when the strike is on another page.
   */
  async list(access: ProjectAccess, sacId: string, page: KeysetQuery = {}): Promise<KeysetPage<CareLogEntryResponse>> {
    const sac = await this.sacs.find(access, sacId);
    const limit = pageSize(page);
    const qb = this.em
      .createQueryBuilder(SacLogEntry, 'e')
      .select('*')
      .leftJoinAndSelect('e.author', 'a')
      .where({ sac: sac.id })
      .orderBy({ at: 'desc', createdAt: 'desc', id: 'desc' })
      .limit(limit + 1);
    if (page.after) {
      const afterId = decodeCursor(page.after, 'entry', 'uuid') as string;
      if (!(await this.em.count(SacLogEntry, { id: afterId, sac: sac.id }))) throw new BadRequestException(refusal('careLog.cursorNotInLog'));
      qb.andWhere('(e.at, e.created_at, e.id) < (select l.at, l.created_at, l.id from sac_log_entries l where l.id = ?)', [afterId]);
    }
    const rows = await qb.getResultList();
    const entries = rows.slice(0, limit);
    const strikes = entries.length ? await this.em.find(SacLogEntry, { strikes: { $in: entries.map((e) => e.id) } }) : [];
    const struckBy = new Map(strikes.map((e) => [e.strikes!.id, e]));
    const band = bandOf(sac);
    return {
      items: entries.map((e) => toCareLogResponse(e, struckBy.get(e.id), band)),
      nextCursor: rows.length > limit ? encodeCursor({ entry: entries[entries.length - 1].id }) : null,
    };
  }

  async add(access: ProjectAccess, viewer: AuthUser, sacId: string, dto: CareLogEntryDto): Promise<CareLogEntryResponse> {
    const now = this.clock.now();
    const at = dto.at ? new Date(dto.at) : now;
    assertNotFuture('at', 'sac.futureEntry', at, now);
    const values = entryValues(dto);
    const id = await this.em.transactional(async (tx) => {
      const sac = await this.sacs.find(access, sacId, tx);
      const atDate = todayIn(viewer.timeZone, at);
      if (atDate < sac.layDate) throw fieldError('at', refusal('careLog.beforeLaid', { at: atDate, layDate: sac.layDate }));
      const strikes = dto.kind === 'strike' ? await this.strikeTarget(tx, sac, dto) : null;
      if (dto.kind === 'roll') this.assertRollable(sac, at);
      if (dto.kind === 'stage') assertStageMove(sac.broodStage, values.stage!);
      const entry = tx.create(SacLogEntry, {
        sac,
        kind: dto.kind,
        at,
        author: tx.getReference(User, viewer.id),
        ...values,
        text: dto.kind === 'strike' ? dto.reason?.trim() || null : values.text,
        strikes,
      });
      if (dto.kind === 'stage' || strikes?.kind === 'stage') {
        await tx.flush();
        sac.broodStage = await this.stageFromLog(tx, sac);
      }
      this.activity.record(tx, {
        projectId: access.project.id,
        actorId: viewer.id,
        kind: `care.${dto.kind}`,
        subjectType: 'sac',
        subjectId: sac.id,
        summary: careLogSummary(entry, sac.layDate),
        data: {
          entryId: entry.id,
          at: at.toISOString(),
          layDate: sac.layDate,
          ...(entry.temperatureC != null ? { temperatureC: entry.temperatureC } : {}),
          ...(entry.stage ? { stage: entry.stage } : {}),
          ...(strikes ? { strikes: strikes.id } : {}),
        },
        at,
      });
      return entry.id;
    });
    const saved = await this.em.findOneOrFail(SacLogEntry, id, { populate: ['author', 'sac'] });
    return toCareLogResponse(saved, undefined, bandOf(saved.sac));
  }

  private async strikeTarget(tx: EntityManager, sac: Sac, dto: CareLogEntryDto): Promise<SacLogEntry> {
    if (!dto.strikes) throw fieldError('strikes', refusal('careLog.strikeWhich'));
    if (!dto.reason?.trim()) throw fieldError('reason', refusal('careLog.strikeWhy'));
    const target = await tx.findOne(SacLogEntry, { id: dto.strikes, sac });
    if (!target) throw fieldError('strikes', refusal('careLog.noSuchEntry'));
    if (target.kind === 'strike') throw fieldError('strikes', refusal('careLog.strikeOfStrike'));
    if (await tx.count(SacLogEntry, { strikes: target })) throw new ConflictException(refusal('careLog.alreadyStruck'));
    return target;
  }

  private assertRollable(sac: Sac, at: Date): void {
    if (!sac.pulledAt) throw new BadRequestException({ ...refusal('careLog.withMother'), details: [fieldRefusal('kind', 'careLog.noRollsWithMother')] });
    if (at < sac.pulledAt) throw fieldError('at', refusal('careLog.rollBeforePull', { pulledAt: sac.pulledAt.toISOString() }));
  }

  /**
   * A count at a later stage than the sac's moves the sac's stage with a stage entry at the count's
   * instant: the brood stage stays one fact, whichever screen names it (incubator, count form).
   */
  async stageFromCount(tx: EntityManager, sac: Sac, stage: Sac['broodStage'], at: Date, viewerId: string): Promise<void> {
    if (!isBroodStageAtLeast(stage, sac.broodStage) || stage === sac.broodStage) return;
    tx.create(SacLogEntry, { sac, kind: 'stage', at, author: tx.getReference(User, viewerId), stage, text: 'Stage named with a brood count.' });
    await tx.flush();
    sac.broodStage = await this.stageFromLog(tx, sac);
  }

  /** The brood stage is the latest stage entry not struck (eggs when there is none). */
  private async stageFromLog(tx: EntityManager, sac: Sac): Promise<Sac['broodStage']> {
    const entries = await tx.find(SacLogEntry, { sac, kind: 'stage' }, { orderBy: { at: 'desc', createdAt: 'desc' } });
    const struck = new Set((await tx.find(SacLogEntry, { sac, kind: 'strike' })).map((s) => s.strikes?.id));
    return entries.find((e) => !struck.has(e.id))?.stage ?? 'eggs';
  }
}
