import { ConflictException, Injectable } from '@nestjs/common';
import { EntityManager } from '@mikro-orm/postgresql';
import { todayIn, type PairingResponse } from '@broodsilk/shared';
import type { AuthUser } from '../common/auth-user';
import { badRequest } from '../common/field-errors';
import { User } from '../users/user.entity';
import { ActivityService } from '../activity/activity.service';
import type { ProjectAccess } from './project-access.service';
import { Project } from './project.entity';
import { Pairing } from './pairing.entity';
import { toPairingResponse } from './pairings.mapper';
import type { CreatePairingDto } from './dto/create-pairing.dto';
import { Clock } from '../common/clock';

// A clock a few minutes fast on the keeper's phone is not a pairing in the future.
const FUTURE_SLACK_MS = 5 * 60_000;

@Injectable()
export class PairingsService {
  constructor(
    private readonly em: EntityManager,
    private readonly activity: ActivityService,
    private readonly clock: Clock,
  ) {}

  async list(access: ProjectAccess): Promise<PairingResponse[]> {
    const rows = await this.em.find(Pairing, { project: access.project.id }, { populate: ['recordedBy'], orderBy: { startedAt: 'desc', createdAt: 'desc' } });
    return rows.map(toPairingResponse);
  }

  async create(viewer: AuthUser, access: ProjectAccess, dto: CreatePairingDto): Promise<PairingResponse> {
    const startedAt = new Date(dto.startedAt);
    if (startedAt.getTime() > this.clock.now().getTime() + FUTURE_SLACK_MS)
      throw badRequest([{ field: 'startedAt', message: 'The pairing start is in the future; record a pairing once it has happened.' }]);
    const id = await this.em.transactional(async (tx) => {
      const p = await tx.findOneOrFail(Project, access.project.id, { populate: ['owner', 'male'] });
      if (p.endedEarlyReason || p.closedOn) throw new ConflictException({ message: 'This project has ended, so no more pairings can be recorded in it.' });
      // The owner's calendar day, so every member sees the same stage and warnings.
      const startedOn = todayIn(p.owner.timeZone, startedAt);
      const pairing = tx.create(Pairing, {
        project: p,
        startedAt,
        startedOn,
        durationMinutes: dto.durationMinutes,
        outcome: dto.outcome,
        notes: dto.notes ?? null,
        recordedBy: tx.getReference(User, viewer.id),
      });
      this.activity.record(tx, {
        projectId: p.id,
        actorId: viewer.id,
        kind: 'pairing.recorded',
        subjectType: 'pairing',
        subjectId: pairing.id,
        summary: `Pairing on ${startedOn} (${dto.durationMinutes} min): ${dto.outcome}.`,
        data: { on: startedOn, outcome: dto.outcome, durationMinutes: dto.durationMinutes },
      });
      return pairing.id;
    });
    return toPairingResponse(await this.em.findOneOrFail(Pairing, id, { populate: ['recordedBy'] }));
  }
}
