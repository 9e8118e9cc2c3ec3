import { ConflictException, Injectable } from '@nestjs/common';
import { EntityManager } from '@mikro-orm/postgresql';
import { pairingBeforeMaturingWarnings, todayIn, type PairingResponse } from '@broodsilk/shared';
import type { AuthUser } from '../common/auth-user';
import { fieldError } from '../common/field-errors';
import { User } from '../users/user.entity';
import { ActivityService } from '../activity/activity.service';
import { acceptWarnings } from '../plausibility/plausibility';
import type { ProjectAccess } from './project-access.service';
import { Project } from './project.entity';
import { Pairing } from './pairing.entity';
import { struckPairings, toPairingResponse } from './pairings.mapper';
import { pairingMale } from './pairing-male';
import { assertTakesNew } from './project-open';
import type { CreatePairingDto } from './dto/create-pairing.dto';
import { Clock } from '../common/clock';
import { label, serverWordsFor } from '@broodsilk/shared';
import { refusal } from '../common/refusal';

// A clock a few minutes fast on the keeper's phone is not a pairing in the future.
const FUTURE_SLACK_MS = 5 * 60_000;

@Injectable()
export class PairingsService {
  constructor(
    private readonly em: EntityManager,
    private readonly activity: ActivityService,
    private readonly clock: Clock,
  ) {}

  /** Newest first, corrected pairings included (flagged with the pairing that struck them). */
  async list(access: ProjectAccess): Promise<PairingResponse[]> {
    const rows = await this.em.find(
      Pairing,
      { project: access.project.id },
      { populate: ['recordedBy', 'male'], orderBy: { startedAt: 'desc', createdAt: 'desc' } },
    );
    const struck = struckPairings(rows);
    return rows.map((p) => toPairingResponse(p, struck.get(p.id) ?? null));
  }

  async create(viewer: AuthUser, access: ProjectAccess, dto: CreatePairingDto): Promise<PairingResponse> {
    const startedAt = new Date(dto.startedAt);
    if (startedAt.getTime() > this.clock.now().getTime() + FUTURE_SLACK_MS) throw fieldError('startedAt', refusal('pairing.startFuture'));
    if (dto.corrects && !dto.reason?.trim()) throw fieldError('reason', refusal('pairing.correctionWhy'));
    if (!dto.corrects && dto.reason) throw fieldError('reason', refusal('pairing.reasonOnlyCorrection'));
    const id = await this.em.transactional(async (tx) => {
      const p = await tx.findOneOrFail(Project, access.project.id, { populate: ['owner', 'male'] });
      // A correction mends the record of a pairing that happened, so it is taken after the end too.
      if (!dto.corrects) assertTakesNew(p, 'pairings');
      const target = dto.corrects ? await this.correctionTarget(tx, p, dto.corrects) : null;
      // The owner's calendar day, so every member sees the same stage and warnings.
      const startedOn = todayIn(p.owner.timeZone, startedAt);
      const male = await pairingMale(tx, p, dto.maleId ?? target?.male.id ?? p.male.id, startedOn);
      const maturedOn = male.maturity === 'mature' ? (male.maturedOn ?? null) : null;
      const warningReason = acceptWarnings(pairingBeforeMaturingWarnings(startedOn, maturedOn), dto);
      const pairing = tx.create(Pairing, {
        project: p,
        male,
        startedAt,
        startedOn,
        durationMinutes: dto.durationMinutes,
        outcome: dto.outcome,
        notes: dto.notes ?? null,
        recordedBy: tx.getReference(User, viewer.id),
        corrects: target,
        reason: target ? dto.reason!.trim() : null,
        warningReason,
      });
      const t = serverWordsFor('en');
      const outcome = label(t, 'pairingOutcome', dto.outcome);
      this.activity.record(tx, {
        projectId: p.id,
        actorId: viewer.id,
        kind: target ? 'pairing.corrected' : 'pairing.recorded',
        subjectType: 'pairing',
        subjectId: pairing.id,
        summary: target
          ? t('text.pairingCorrected', {
              date: target.startedOn,
              was: label(t, 'pairingOutcome', target.outcome),
              newDate: startedOn,
              minutes: dto.durationMinutes,
              outcome,
              reason: dto.reason!.trim(),
            })
          : t('text.pairingOnWith', { date: startedOn, male: male.label, minutes: dto.durationMinutes, outcome }),
        data: {
          on: startedOn,
          maleId: male.id,
          male: male.label,
          outcome: dto.outcome,
          durationMinutes: dto.durationMinutes,
          ...(target ? { corrects: target.id } : {}),
        },
      });
      return pairing.id;
    });
    return toPairingResponse(await this.em.findOneOrFail(Pairing, id, { populate: ['recordedBy', 'male'] }));
  }

  private async correctionTarget(tx: EntityManager, project: Project, id: string): Promise<Pairing> {
    const target = await tx.findOne(Pairing, { id, project });
    if (!target) throw fieldError('corrects', refusal('pairing.noSuchPairing'));
    if (await tx.count(Pairing, { corrects: target })) throw new ConflictException(refusal('pairing.alreadyCorrected'));
    return target;
  }
}
