import { Injectable, NotFoundException } from '@nestjs/common';
import { EntityManager } from '@mikro-orm/postgresql';
import { sacLayWarnings, todayIn, type SacResponse } from '@broodsilk/shared';
import type { AuthUser } from '../common/auth-user';
import type { ProjectAccess } from '../projects/project-access.service';
import { ActivityService } from '../activity/activity.service';
import { User } from '../users/user.entity';
import { Project } from '../projects/project.entity';
import { ProjectStageService } from '../projects/project-stage.service';
import { acceptWarnings } from '../plausibility/plausibility';
import { effectiveBreeding } from '../species/effective-breeding';
import { ownBreeding } from '../species/species.mapper';
import { Sac } from './sac.entity';
import { SAC_POPULATE, SacViewsService } from './sac-views.service';
import { Clock } from '../common/clock';
import { assertSacDates } from './sac-rules';
import { fieldError } from '../common/field-errors';
import type { CreateSacDto } from './dto/create-sac.dto';
import type { UpdateSacDto } from './dto/update-sac.dto';
import { label, wordsFor } from '@broodsilk/shared';

export const SAC_NOT_FOUND = 'There is no such sac in this project.';

@Injectable()
export class SacsService {
  constructor(
    private readonly em: EntityManager,
    private readonly views: SacViewsService,
    private readonly activity: ActivityService,
    private readonly clock: Clock,
    private readonly stages: ProjectStageService,
  ) {}

  async list(access: ProjectAccess, viewer: AuthUser): Promise<SacResponse[]> {
    const sacs = await this.em.find(Sac, { project: access.project.id }, { populate: SAC_POPULATE, orderBy: { layDate: 'desc', createdAt: 'desc' } });
    return this.views.build(this.em, sacs, viewer.timeZone);
  }

  /** The sac within the project the guard established (the guard found the project from the sac). */
  async find(access: ProjectAccess, id: string, em: EntityManager = this.em): Promise<Sac> {
    const sac = await em.findOne(Sac, { id, project: access.project.id }, { populate: SAC_POPULATE });
    if (!sac) throw new NotFoundException(SAC_NOT_FOUND);
    return sac;
  }

  async get(access: ProjectAccess, viewer: AuthUser, id: string): Promise<SacResponse> {
    return this.views.one(this.em, await this.find(access, id), viewer.timeZone);
  }

  async create(access: ProjectAccess, viewer: AuthUser, dto: CreateSacDto): Promise<SacResponse> {
    const now = this.clock.now();
    const pulledAt = dto.pulledAt ? new Date(dto.pulledAt) : null;
    assertSacDates({ layDate: dto.layDate, pulledAt, pullFromDay: dto.pullFromDay ?? null, pullToDay: dto.pullToDay ?? null }, viewer.timeZone, now);
    const id = await this.em.transactional(async (tx) => {
      const warningReason = await this.layDateWarnings(tx, access.project.id, dto);
      const sac = tx.create(Sac, {
        project: access.project.id,
        warningReason,
        layDate: dto.layDate,
        pulledAt,
        pulledOn: pulledAt ? todayIn(viewer.timeZone, pulledAt) : null,
        pullFromDay: dto.pullFromDay ?? null,
        pullToDay: dto.pullToDay ?? null,
        rollIntervalHours: dto.rollIntervalHours ?? 12,
        rollingOff: dto.rollingOff ?? false,
        notes: dto.notes ?? null,
        recordedBy: tx.getReference(User, viewer.id),
      });
      this.activity.record(tx, {
        projectId: access.project.id,
        actorId: viewer.id,
        kind: 'sac.laid',
        subjectType: 'sac',
        subjectId: sac.id,
        summary: `Sac laid on ${dto.layDate}${pulledAt ? `, pulled on ${sac.pulledOn}` : ', left with the mother'}.`,
        data: { layDate: dto.layDate, pulledOn: sac.pulledOn },
      });
      return sac.id;
    });
    return this.get(access, viewer, id);
  }

  /** A sac follows a successful pairing by the species' usual time (see sacLayWarnings); returns the acknowledged reason. */
  private async layDateWarnings(tx: EntityManager, projectId: string, dto: CreateSacDto): Promise<string | null> {
    const project = await tx.findOneOrFail(Project, projectId, { populate: ['female.species'] });
    const species = project.female.species;
    const minDays = effectiveBreeding(species.group, ownBreeding(species)).pairingToSacDays.value.min;
    const pairings = await this.stages.pairingsInForce(projectId, tx);
    return acceptWarnings(sacLayWarnings({ layDate: dto.layDate, pairings, minDays }), dto);
  }

  async update(access: ProjectAccess, viewer: AuthUser, id: string, dto: UpdateSacDto): Promise<SacResponse> {
    const now = this.clock.now();
    await this.em.transactional(async (tx) => {
      const sac = await this.find(access, id, tx);
      const wasPulled = !!sac.pulledAt;
      const wasOutcome = sac.outcome;
      const pulledAt = dto.pulledAt === undefined ? (sac.pulledAt ?? null) : dto.pulledAt === null ? null : new Date(dto.pulledAt);
      // Each end of the window falls back to the stored one, so one end can be moved alone.
      const next = {
        layDate: dto.layDate ?? sac.layDate,
        pulledAt,
        pullFromDay: dto.pullFromDay !== undefined ? dto.pullFromDay : (sac.pullFromDay ?? null),
        pullToDay: dto.pullToDay !== undefined ? dto.pullToDay : (sac.pullToDay ?? null),
      };
      assertSacDates(next, viewer.timeZone, now);
      const outcome = dto.outcome ?? sac.outcome;
      const failureReason = outcome === 'failed' ? ((dto.failureReason !== undefined ? dto.failureReason : sac.failureReason) ?? null) : null;
      if (outcome === 'failed' && !failureReason) throw fieldError('failureReason', 'Say why the sac failed: infertile, spoiled, eaten or other.');
      if (outcome !== 'failed' && dto.failureReason) throw fieldError('failureReason', 'A failure reason only goes with the outcome "failed".');

      const pulledChanged = (sac.pulledAt?.getTime() ?? null) !== (pulledAt?.getTime() ?? null);
      tx.assign(sac, {
        ...next,
        pulledOn: !pulledChanged ? (sac.pulledOn ?? null) : pulledAt ? todayIn(viewer.timeZone, pulledAt) : null,
        outcome,
        failureReason,
        ...(dto.rollIntervalHours !== undefined ? { rollIntervalHours: dto.rollIntervalHours } : {}),
        ...(dto.rollingOff !== undefined ? { rollingOff: dto.rollingOff } : {}),
        ...(dto.notes !== undefined ? { notes: dto.notes } : {}),
      });
      const { kind, summary } = describeChange(sac, wasPulled, pulledChanged, wasOutcome !== sac.outcome);
      this.activity.record(tx, {
        projectId: access.project.id,
        actorId: viewer.id,
        kind,
        subjectType: 'sac',
        subjectId: sac.id,
        summary,
        data: { changed: Object.keys(dto), outcome: sac.outcome, pulledOn: sac.pulledOn ?? null },
      });
    });
    this.em.clear();
    return this.get(access, viewer, id);
  }
}

const failureWords = (sac: Sac): string => (sac.failureReason ? label(wordsFor('en'), 'sacFailure', sac.failureReason).toLowerCase() : '');

/** One activity kind per write: the most telling change wins. */
function describeChange(sac: Sac, wasPulled: boolean, pulledChanged: boolean, outcomeChanged: boolean): { kind: string; summary: string } {
  if (outcomeChanged && sac.outcome === 'failed')
    return { kind: 'sac.failed', summary: wordsFor('en')('text.sacFailed', { layDate: sac.layDate, reason: failureWords(sac) }) };
  if (pulledChanged && sac.pulledAt) return { kind: 'sac.pulled', summary: `Sac laid ${sac.layDate} pulled on ${sac.pulledOn} and moved to the incubator.` };
  if (pulledChanged && wasPulled) return { kind: 'sac.updated', summary: `Sac laid ${sac.layDate}: pull removed, it is with the mother.` };
  if (outcomeChanged && sac.outcome === 'emerged') return { kind: 'sac.updated', summary: `Sac laid ${sac.layDate}: the young have emerged.` };
  return { kind: 'sac.updated', summary: `Sac laid ${sac.layDate} updated.` };
}
