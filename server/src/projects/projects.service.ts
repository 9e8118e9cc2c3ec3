import { ConflictException, Injectable } from '@nestjs/common';
import { EntityManager, LockMode } from '@mikro-orm/postgresql';
import { mayStartProject, secondProjectWarnings, todayIn, type FieldError, type ProjectResponse, type ProjectSummary } from '@broodsilk/shared';
import type { AuthUser } from '../common/auth-user';
import { Animal } from '../animals/animal.entity';
import { badRequest } from '../common/field-errors';
import { User } from '../users/user.entity';
import { ActivityService } from '../activity/activity.service';
import { acceptWarnings } from '../plausibility/plausibility';
import { ProjectFactsRegistry } from './project-facts.registry';
import { Project } from './project.entity';
import { ProjectMember } from './project-member.entity';
import type { ProjectAccess } from './project-access.service';
import { ProjectStageService } from './project-stage.service';
import { TermsService } from './terms.service';
import { toProjectResponse, toProjectSummary } from './projects.mapper';
import { partnerNamesOf } from './partner-names';
import type { CreateProjectDto } from './dto/create-project.dto';
import type { UpdateProjectDto } from './dto/update-project.dto';
import type { EndProjectDto } from './dto/end-project.dto';
import { Clock } from '../common/clock';
import { label, serverWordsFor } from '@broodsilk/shared';
import { fieldRefusal, refusal, refusalFrom, term } from '../common/refusal';

const PROJECT_POPULATE = ['owner', 'female.species', 'male.species'] as const;
const DETAIL_POPULATE = ['owner', 'female.species', 'female.recordedBy', 'female.ownerUser', 'male.species', 'male.recordedBy', 'male.ownerUser'] as const;

@Injectable()
export class ProjectsService {
  constructor(
    private readonly em: EntityManager,
    private readonly clock: Clock,
    private readonly stages: ProjectStageService,
    private readonly terms: TermsService,
    private readonly activity: ActivityService,
    private readonly registry: ProjectFactsRegistry,
  ) {}

  private today(viewer: AuthUser): string {
    return todayIn(viewer.timeZone, this.clock.now());
  }

  /** Every project the viewer is a member of, newest first, with its stage. */
  async list(viewer: AuthUser): Promise<ProjectSummary[]> {
    const memberships = await this.em.find(ProjectMember, { user: viewer.id }, { populate: ['project'] });
    const projects = await this.em.find(
      Project,
      { id: { $in: memberships.map((m) => m.project.id) } },
      { populate: PROJECT_POPULATE, orderBy: { createdAt: 'desc', id: 'asc' } },
    );
    const standings = await this.stages.standings(projects);
    const roleOf = new Map(memberships.map((m) => [m.project.id, m.role]));
    const partners = await partnerNamesOf(
      this.em,
      projects.map((p) => p.id),
    );
    return projects.map((p) => toProjectSummary(p, standings.get(p.id)!.stage, roleOf.get(p.id)!, partners.get(p.id) ?? []));
  }

  /**
   * `afterWrite`: the project was just changed in a transaction's own entity manager, so this
   * request's copy is reloaded. A plain read needs no reload, and reloading made MikroORM fetch
   * every populated relation again one by one (15 statements more for the project page).
   */
  async get(viewer: AuthUser, access: ProjectAccess, { afterWrite = false }: { afterWrite?: boolean } = {}): Promise<ProjectResponse> {
    const p = await this.em.findOneOrFail(Project, { id: access.project.id }, { populate: DETAIL_POPULATE, refresh: afterWrite });
    const standing = (await this.stages.standings([p])).get(p.id)!;
    const today = this.today(viewer);
    const clause = (await this.terms.inForceClause(p.id)) ?? 'nothing-owed';
    const members = await this.em.find(ProjectMember, { project: p.id }, { populate: ['user'], orderBy: { createdAt: 'asc' } });
    return toProjectResponse(p, standing.stage, access.role, today, viewer.id, this.stages.warnings(p, standing, today, clause), members, standing.males);
  }

  /** The owner must have recorded both animals; the owner becomes the first party, role `owner`. */
  async create(viewer: AuthUser, dto: CreateProjectDto): Promise<ProjectResponse> {
    const project = await this.em.transactional(async (tx) => {
      const [female, male] = await Promise.all([
        tx.findOne(Animal, { id: dto.femaleId, recordedBy: viewer.id }),
        tx.findOne(Animal, { id: dto.maleId, recordedBy: viewer.id }),
      ]);
      const errors: FieldError[] = [];
      const check = (a: Animal | null, field: 'femaleId' | 'maleId', sex: 'female' | 'male') => {
        if (!a) errors.push(fieldRefusal(field, sex === 'female' ? 'project.noSuchFemale' : 'project.noSuchMale'));
        // The male's sentences are the pairing's own ("… is recorded as female, not male").
        else if (a.sex !== sex)
          errors.push(
            sex === 'female'
              ? fieldRefusal(field, a.sex === 'male' ? 'project.femaleIsMale' : 'project.femaleIsUnsexed', { animal: a.label })
              : fieldRefusal(field, a.sex === 'female' ? 'pairing.maleIsFemale' : 'pairing.maleIsUnsexed', { male: a.label }),
          );
        else if (!mayStartProject(a))
          errors.push(fieldRefusal(field, 'project.animalNotStartable', { animal: a.label, status: term(`refusal.animalStatusWord.${a.status}`) }));
      };
      check(female, 'femaleId', 'female');
      check(male, 'maleId', 'male');
      if (errors.length) throw badRequest(errors);
      const warningReason = await this.femaleBusyWarnings(tx, female!, dto);
      const owner = await tx.findOneOrFail(User, viewer.id);
      const p = tx.create(Project, { owner, female: female!, male: male!, title: dto.title.trim(), notes: dto.notes ?? null, warningReason });
      tx.create(ProjectMember, { project: p, user: owner, role: 'owner', name: owner.displayName, email: owner.email });
      this.activity.record(tx, {
        projectId: p.id,
        actorId: viewer.id,
        kind: 'project.created',
        subjectType: 'project',
        subjectId: p.id,
        summary: `${owner.displayName} started the project "${p.title}" with ${female!.label} and ${male!.label}.`,
        data: { femaleId: female!.id, maleId: male!.id },
      });
      return p;
    });
    return this.get(viewer, { project, role: 'owner' } as ProjectAccess, { afterWrite: true });
  }

  /** Other open projects of the female with a developing sac warn (see secondProjectWarnings); returns the acknowledged reason. */
  private async femaleBusyWarnings(tx: EntityManager, female: Animal, dto: CreateProjectDto): Promise<string | null> {
    const open = await tx.find(Project, { female, endedEarlyReason: null, closedOn: null }, { fields: ['title'] });
    const facts = await this.registry.collect(
      tx,
      open.map((p) => p.id),
    );
    return acceptWarnings(
      secondProjectWarnings(
        female.label,
        open.map((p) => ({ title: p.title, sacs: facts.get(p.id)?.sacs ?? [] })),
      ),
      dto,
    );
  }

  async update(viewer: AuthUser, access: ProjectAccess, dto: UpdateProjectDto): Promise<ProjectResponse> {
    await this.em.transactional(async (tx) => {
      const p = await tx.findOneOrFail(Project, access.project.id);
      const changed: string[] = [];
      if (dto.title !== undefined && dto.title.trim() !== p.title) {
        p.title = dto.title.trim();
        changed.push('title');
      }
      if (dto.notes !== undefined && dto.notes !== (p.notes ?? null)) {
        p.notes = dto.notes;
        changed.push('notes');
      }
      if (changed.length) {
        this.activity.record(tx, {
          projectId: p.id,
          actorId: viewer.id,
          kind: 'project.updated',
          subjectType: 'project',
          subjectId: p.id,
          summary: `Changed the project's ${changed.join(' and ')}.`,
          data: { changed },
        });
      }
    });
    return this.get(viewer, access, { afterWrite: true });
  }

  /** The owner calls the project off, with a reason; `reopen` undoes it, `close` makes it final. */
  end(viewer: AuthUser, access: ProjectAccess, dto: EndProjectDto): Promise<ProjectResponse> {
    return this.changeEnd(viewer, access, (p) => {
      if (p.closedOn) throw new ConflictException(refusal('project.closedOn', { on: p.closedOn }));
      if (p.endedEarlyReason)
        throw new ConflictException(refusalFrom('text.alreadyEnded', { date: p.endedOn ?? '', reason: term(`endedEarly.${p.endedEarlyReason}`) }));
      p.endedEarlyReason = dto.reason;
      p.endedEarlyNote = dto.note ?? null;
      p.endedOn = this.today(viewer);
      return {
        kind: 'project.ended',
        summary: serverWordsFor('en')('text.endedEarly', { reason: label(serverWordsFor('en'), 'endedEarly', dto.reason) }),
        data: { reason: dto.reason, note: dto.note ?? null, ...(dto.partnerMessage?.trim() ? { partnerMessage: dto.partnerMessage } : {}) },
      };
    });
  }

  /** The owner closes the project when it is done (also after an early end). Final: a closed project is not reopened. */
  close(viewer: AuthUser, access: ProjectAccess): Promise<ProjectResponse> {
    return this.changeEnd(viewer, access, (p) => {
      if (p.closedOn) throw new ConflictException(refusal('project.alreadyClosed', { on: p.closedOn }));
      p.closedOn = this.today(viewer);
      return { kind: 'project.closed', summary: 'Closed the project.', data: { on: p.closedOn } };
    });
  }

  /** Undoes an early end (she laid after all, a backup male turned up); the project takes pairings and sacs again. */
  reopen(viewer: AuthUser, access: ProjectAccess): Promise<ProjectResponse> {
    return this.changeEnd(viewer, access, (p) => {
      if (p.closedOn) throw new ConflictException(refusal('project.closedStaysClosed', { on: p.closedOn }));
      if (!p.endedEarlyReason) throw new ConflictException(refusal('project.notEnded'));
      const was = { reason: p.endedEarlyReason, on: p.endedOn ?? null };
      p.endedEarlyReason = null;
      p.endedEarlyNote = null;
      p.endedOn = null;
      return {
        kind: 'project.reopened',
        summary: `Reopened the project (it had ended early${was.on ? ` on ${was.on}` : ''}: ${label(serverWordsFor('en'), 'endedEarly', was.reason)}).`,
        data: was,
      };
    });
  }

  /**
   * One change to how the project ends, with its event, in one transaction. The row is locked so two
   * taps (or two tabs) cannot both pass the state check and write twice.
   */
  private async changeEnd(
    viewer: AuthUser,
    access: ProjectAccess,
    change: (p: Project) => { kind: string; summary: string; data: Record<string, unknown> },
  ): Promise<ProjectResponse> {
    await this.em.transactional(async (tx) => {
      const p = await tx.findOneOrFail(Project, access.project.id, { lockMode: LockMode.PESSIMISTIC_WRITE });
      const event = change(p);
      this.activity.record(tx, { projectId: p.id, actorId: viewer.id, subjectType: 'project', subjectId: p.id, ...event });
    });
    return this.get(viewer, access, { afterWrite: true });
  }
}
