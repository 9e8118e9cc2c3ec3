import { ConflictException, ForbiddenException, Injectable, NotFoundException } from '@nestjs/common';
import { EntityManager } from '@mikro-orm/postgresql';
import { sacLayWarnings, sacPermissions, todayIn, type IncubatorRightsResponse, type SacResponse } from '@broodsilk/shared';
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
import { assertSacChoices, assertSacDates } from './sac-rules';
import { bandColumns } from './sac-band';
import { fieldError } from '../common/field-errors';
import type { CreateSacDto } from './dto/create-sac.dto';
import type { UpdateSacDto } from './dto/update-sac.dto';
import { assertTakesNew } from '../projects/project-open';
import type { PullSacDto } from './dto/pull-sac.dto';
import type { IncubatorRightsDto } from './dto/incubator-rights.dto';
import { label, serverWordsFor } from '@broodsilk/shared';
import { refusal } from '../common/refusal';

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
    return this.views.build(this.em, sacs, viewer.timeZone, this.clock.now(), () => access.role);
  }

  /** The sac within the project the guard established (the guard found the project from the sac). */
  async find(access: ProjectAccess, id: string, em: EntityManager = this.em): Promise<Sac> {
    const sac = await em.findOne(Sac, { id, project: access.project.id }, { populate: SAC_POPULATE });
    if (!sac) throw new NotFoundException(refusal('sac.notFound'));
    return sac;
  }

  async get(access: ProjectAccess, viewer: AuthUser, id: string): Promise<SacResponse> {
    return this.views.one(this.em, await this.find(access, id), viewer.timeZone, access.role);
  }

  /** The pull and the opening: the owner, or a caretaker where the project allows it (403 otherwise). */
  assertMayPullAndOpen(access: ProjectAccess): void {
    if (!sacPermissions(access.role, access.project.caretakersMayPullAndOpen).pullAndOpen) throw new ForbiddenException(refusal('sac.pullAndOpenRefused'));
  }

  /** Records the pull of a sac still with the mother, now or at an earlier instant. */
  async pull(access: ProjectAccess, viewer: AuthUser, id: string, dto: PullSacDto): Promise<SacResponse> {
    this.assertMayPullAndOpen(access);
    const now = this.clock.now();
    const pulledAt = dto.pulledAt ? new Date(dto.pulledAt) : now;
    await this.em.transactional(async (tx) => {
      const sac = await this.find(access, id, tx);
      if (sac.pulledAt) throw new ConflictException(refusal('sac.alreadyPulled', { on: sac.pulledOn! }));
      if (sac.outcome !== 'in-progress') throw new ConflictException(refusal('sac.endedNothingToPull'));
      assertSacDates({ layDate: sac.layDate, pulledAt, pullFromDay: sac.pullFromDay ?? null, pullToDay: sac.pullToDay ?? null }, viewer.timeZone, now);
      tx.assign(sac, { pulledAt, pulledOn: todayIn(viewer.timeZone, pulledAt), leftWithMother: false });
      this.activity.record(tx, {
        projectId: access.project.id,
        actorId: viewer.id,
        kind: 'sac.pulled',
        subjectType: 'sac',
        subjectId: sac.id,
        summary: `Sac laid ${sac.layDate} pulled on ${sac.pulledOn} and moved to the incubator.`,
        data: { pulledOn: sac.pulledOn },
        at: pulledAt,
      });
    });
    this.em.clear();
    return this.get(access, viewer, id);
  }

  /** The owner's switch letting caretakers record the pull and the opening. */
  async setIncubatorRights(access: ProjectAccess, viewer: AuthUser, dto: IncubatorRightsDto): Promise<IncubatorRightsResponse> {
    await this.em.transactional(async (tx) => {
      const project = await tx.findOneOrFail(Project, access.project.id);
      project.caretakersMayPullAndOpen = dto.caretakersMayPullAndOpen;
      this.activity.record(tx, {
        projectId: project.id,
        actorId: viewer.id,
        kind: 'project.incubator-rights',
        subjectType: 'project',
        subjectId: project.id,
        summary: dto.caretakersMayPullAndOpen
          ? 'Caretakers may now record the pull and the opening of this project’s sacs.'
          : 'Only the keeper records the pull and the opening of this project’s sacs now.',
        data: { caretakersMayPullAndOpen: dto.caretakersMayPullAndOpen },
      });
    });
    return { projectId: access.project.id, caretakersMayPullAndOpen: dto.caretakersMayPullAndOpen };
  }

  async create(access: ProjectAccess, viewer: AuthUser, dto: CreateSacDto): Promise<SacResponse> {
    const now = this.clock.now();
    const pulledAt = dto.pulledAt ? new Date(dto.pulledAt) : null;
    assertSacDates({ layDate: dto.layDate, pulledAt, pullFromDay: dto.pullFromDay ?? null, pullToDay: dto.pullToDay ?? null }, viewer.timeZone, now);
    assertTakesNew(access.project, 'sacs');
    assertSacChoices({
      pulledAt,
      leftWithMother: dto.leftWithMother ?? false,
      temperatureBand: dto.temperatureBand ?? null,
      humidityBand: dto.humidityBand ?? null,
    });
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
        rollPastLegs: dto.rollPastLegs ?? false,
        leftWithMother: dto.leftWithMother ?? false,
        container: dto.container?.trim() || null,
        ...bandColumns(dto),
        notes: dto.notes ?? null,
        recordedBy: tx.getReference(User, viewer.id),
      });
      this.activity.record(tx, {
        projectId: access.project.id,
        actorId: viewer.id,
        kind: 'sac.laid',
        subjectType: 'sac',
        subjectId: sac.id,
        summary: `Sac laid on ${dto.layDate}${pulledAt ? `, pulled on ${sac.pulledOn}` : sac.leftWithMother ? ', left with the mother on purpose' : ', still with the mother'}.`,
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
      const wasLeft = sac.leftWithMother;
      const pulledAt = dto.pulledAt === undefined ? (sac.pulledAt ?? null) : dto.pulledAt === null ? null : new Date(dto.pulledAt);
      // Each end of the window falls back to the stored one, so one end can be moved alone.
      const next = {
        layDate: dto.layDate ?? sac.layDate,
        pulledAt,
        pullFromDay: dto.pullFromDay !== undefined ? dto.pullFromDay : (sac.pullFromDay ?? null),
        pullToDay: dto.pullToDay !== undefined ? dto.pullToDay : (sac.pullToDay ?? null),
      };
      assertSacDates(next, viewer.timeZone, now);
      const pulledChanged = (sac.pulledAt?.getTime() ?? null) !== (pulledAt?.getTime() ?? null);
      // A new pull ends the keeper's choice to leave the sac with the mother, unless this request says otherwise (then it is refused).
      const leftWithMother = dto.leftWithMother ?? (pulledChanged && pulledAt ? false : sac.leftWithMother);
      const band = (given: typeof dto.temperatureBand, min?: number | null, max?: number | null) =>
        given !== undefined ? given : min != null && max != null ? { min, max } : null;
      assertSacChoices({
        pulledAt,
        leftWithMother,
        temperatureBand: band(dto.temperatureBand, sac.bandTemperatureMinC, sac.bandTemperatureMaxC),
        humidityBand: band(dto.humidityBand, sac.bandHumidityMin, sac.bandHumidityMax),
      });
      const outcome = dto.outcome ?? sac.outcome;
      const failureReason = outcome === 'failed' ? ((dto.failureReason !== undefined ? dto.failureReason : sac.failureReason) ?? null) : null;
      if (outcome === 'failed' && !failureReason) throw fieldError('failureReason', refusal('sac.failureReasonNeeded'));
      if (outcome !== 'failed' && dto.failureReason) throw fieldError('failureReason', refusal('sac.failureReasonOnlyFailed'));
      const failsNow = outcome === 'failed' && wasOutcome !== 'failed';
      if (dto.partnerMessage !== undefined && !failsNow) throw fieldError('partnerMessage', refusal('sac.partnerMessageOnlyFailed'));

      tx.assign(sac, {
        ...next,
        pulledOn: !pulledChanged ? (sac.pulledOn ?? null) : pulledAt ? todayIn(viewer.timeZone, pulledAt) : null,
        outcome,
        failureReason,
        ...(dto.rollIntervalHours !== undefined ? { rollIntervalHours: dto.rollIntervalHours } : {}),
        ...(dto.rollingOff !== undefined ? { rollingOff: dto.rollingOff } : {}),
        ...(dto.rollPastLegs !== undefined ? { rollPastLegs: dto.rollPastLegs } : {}),
        ...(dto.container !== undefined ? { container: dto.container?.trim() || null } : {}),
        ...bandColumns(dto),
        leftWithMother,
        ...(dto.notes !== undefined ? { notes: dto.notes } : {}),
      });
      const { kind, summary } = describeChange(sac, wasPulled, pulledChanged, wasOutcome !== sac.outcome, wasLeft);
      this.activity.record(tx, {
        projectId: access.project.id,
        actorId: viewer.id,
        kind,
        subjectType: 'sac',
        subjectId: sac.id,
        summary,
        data: {
          changed: Object.keys(dto),
          outcome: sac.outcome,
          pulledOn: sac.pulledOn ?? null,
          ...(kind === 'sac.failed' ? { layDate: sac.layDate, failureReason: sac.failureReason ?? null } : {}),
          ...(kind === 'sac.failed' && dto.partnerMessage?.trim() ? { partnerMessage: dto.partnerMessage } : {}),
        },
      });
    });
    this.em.clear();
    return this.get(access, viewer, id);
  }
}

const failureWords = (sac: Sac): string => (sac.failureReason ? label(serverWordsFor('en'), 'sacFailure', sac.failureReason).toLowerCase() : '');

/** One activity kind per write: the most telling change wins. */
function describeChange(sac: Sac, wasPulled: boolean, pulledChanged: boolean, outcomeChanged: boolean, wasLeft: boolean): { kind: string; summary: string } {
  if (outcomeChanged && sac.outcome === 'failed')
    return { kind: 'sac.failed', summary: serverWordsFor('en')('text.sacFailed', { layDate: sac.layDate, reason: failureWords(sac) }) };
  if (pulledChanged && sac.pulledAt) return { kind: 'sac.pulled', summary: `Sac laid ${sac.layDate} pulled on ${sac.pulledOn} and moved to the incubator.` };
  if (pulledChanged && wasPulled) return { kind: 'sac.updated', summary: `Sac laid ${sac.layDate}: pull removed, it is with the mother.` };
  if (!wasLeft && sac.leftWithMother) return { kind: 'sac.left-with-mother', summary: `Sac laid ${sac.layDate}: left with the mother on purpose.` };
  if (outcomeChanged && sac.outcome === 'emerged') return { kind: 'sac.updated', summary: `Sac laid ${sac.layDate}: the young have emerged.` };
  return { kind: 'sac.updated', summary: `Sac laid ${sac.layDate} updated.` };
}
