import { BadRequestException, Injectable } from '@nestjs/common';
import { EntityManager } from '@mikro-orm/postgresql';
import type { BroodCountResponse, BroodCountsResponse } from '@broodsilk/shared';
import type { AuthUser } from '../common/auth-user';
import type { ProjectAccess } from '../projects/project-access.service';
import { ActivityService } from '../activity/activity.service';
import { User } from '../users/user.entity';
import { BroodCount } from './brood-count.entity';
import { SacOpening } from './sac-opening.entity';
import { SacsService } from './sacs.service';
import { Clock } from '../common/clock';
import { assertNotFuture } from './sac-rules';
import { fieldError } from '../common/field-errors';
import { toBroodCountResponse } from './brood.mapper';
import type { BroodCountDto } from './dto/brood-count.dto';

@Injectable()
export class BroodCountsService {
  constructor(
    private readonly em: EntityManager,
    private readonly sacs: SacsService,
    private readonly activity: ActivityService,
    private readonly clock: Clock,
  ) {}

  /** Oldest first; `current` is the latest alive count (the count of young in care). */
  async list(access: ProjectAccess, sacId: string): Promise<BroodCountsResponse> {
    const sac = await this.sacs.find(access, sacId);
    const counts = await this.em.find(BroodCount, { sac }, { populate: ['recordedBy'], orderBy: { at: 'asc', createdAt: 'asc' } });
    return { current: counts.at(-1)?.alive ?? null, counts: counts.map(toBroodCountResponse) };
  }

  async add(access: ProjectAccess, viewer: AuthUser, sacId: string, dto: BroodCountDto): Promise<BroodCountResponse> {
    const now = this.clock.now();
    const at = dto.at ? new Date(dto.at) : now;
    assertNotFuture('at', 'time of the count', at, now);
    const lost = dto.lost ?? 0;
    if (lost > 0 && !dto.lossReason) throw fieldError('lossReason', 'Say why young were lost (died, failed-molt, cannibalism, mould, escaped or other).');
    if (lost === 0 && dto.lossReason) throw fieldError('lossReason', 'A loss reason goes with a number lost above 0.');
    const id = await this.em.transactional(async (tx) => {
      const sac = await this.sacs.find(access, sacId, tx);
      const opening = await tx.findOne(SacOpening, { sac });
      if (!opening) throw new BadRequestException({ message: 'Record the opening first: it starts the brood and its first count.' });
      if (at < opening.openedAt) throw fieldError('at', `A count cannot come before the opening (${opening.openedAt.toISOString()}).`);
      const c = tx.create(BroodCount, {
        sac,
        at,
        stage: dto.stage,
        alive: dto.alive,
        lost,
        lossReason: dto.lossReason ?? null,
        note: dto.note ?? null,
        source: 'count',
        recordedBy: tx.getReference(User, viewer.id),
      });
      this.activity.record(tx, {
        projectId: access.project.id,
        actorId: viewer.id,
        kind: 'brood.counted',
        subjectType: 'sac',
        subjectId: sac.id,
        at,
        summary: `Brood of the sac laid ${sac.layDate}: ${dto.alive} alive at ${dto.stage}${lost ? `, ${lost} lost (${dto.lossReason})` : ''}.`,
        data: { countId: c.id, stage: dto.stage, alive: dto.alive, lost },
      });
      return c.id;
    });
    return toBroodCountResponse(await this.em.findOneOrFail(BroodCount, id, { populate: ['recordedBy'] }));
  }
}
