import { ConflictException, Inject, Injectable, NotFoundException, StreamableFile } from '@nestjs/common';
import type { ConfigType } from '@nestjs/config';
import { EntityManager } from '@mikro-orm/postgresql';
import { PROGRESS_TIMELINE_KINDS, serverWordsFor, type PhotoRef, type ProgressLinkResponse, type ProgressView } from '@broodsilk/shared';
import { appConfig } from '../config/app.config';
import { Clock } from '../common/clock';
import { hashLinkToken, newLinkToken } from '../common/link-token';
import { ActivityService } from '../activity/activity.service';
import { ActivityEvent } from '../activity/activity-event.entity';
import { ProjectMember } from '../projects/project-member.entity';
import type { ProjectAccess } from '../projects/project-access.service';
import { ProjectStageService } from '../projects/project-stage.service';
import { PhotosService, type PhotoVariant } from '../photos/photos.service';
import { OPENING_PHOTO } from '../sacs/opening.service';
import { SacOpening } from '../sacs/sac-opening.entity';
import { Sac } from '../sacs/sac.entity';
import { latestCountsOf } from '../sacs/sac-queries';
import { loadAccount } from '../accounts/account-loader';
import { User } from '../users/user.entity';
import { ProgressLink } from './progress-link.entity';
import { toProgressShare } from './progress-share';
import { refusal } from '../common/refusal';

/** What a revoked, rotated or made-up link answers: said to a person, revealing nothing. */
export const PROGRESS_NOT_FOUND = refusal('progress.linkNotFound').message;
/** The newest events the page lists. */
const TIMELINE_LIMIT = 100;

/** Who issues or revokes: the project's owner (a session user). */
export interface LinkActor {
  id: string;
}

/**
 * Progress links: a private, read-only page for an outside party (a project member without an
 * account). The token is shown once; only its SHA-256 is kept; a new link revokes the earlier ones.
 */
@Injectable()
export class ProgressLinksService {
  constructor(
    private readonly em: EntityManager,
    private readonly clock: Clock,
    private readonly activity: ActivityService,
    private readonly stages: ProjectStageService,
    private readonly photos: PhotosService,
    @Inject(appConfig.KEY) private readonly config: ConfigType<typeof appConfig>,
  ) {}

  /**
   * Issues a new link for `member` (an outside party, `member.project` set), revoking the earlier
   * ones, and records it on the timeline. Call it inside `em.transactional` (the caller's transaction
   * writes all or none; the party's row is locked so two issues at once leave one live link).
   */
  async issue(em: EntityManager, member: ProjectMember, by: LinkActor): Promise<ProgressLinkResponse> {
    this.assertOutside(member);
    // One issue at a time per party, so two at once cannot leave two live links (inside a transaction).
    await em.execute('select 1 from project_members where id = ? for update', [member.id]);
    await this.revokeRows(em, member);
    const { token, hash } = newLinkToken();
    em.create(ProgressLink, { member, tokenHash: hash, createdBy: em.getReference(User, by.id) });
    this.activity.record(em, {
      projectId: member.project.id,
      actorId: by.id,
      kind: 'progress-link.issued',
      subjectType: 'member',
      subjectId: member.id,
      summary: serverWordsFor('en')('text.progressLinkIssued', { name: member.name }),
    });
    return { url: `${this.config.publicUrl.replace(/\/$/, '')}/progress/${token}` };
  }

  /** Revokes every live link of `member` (their pages then 404); returns how many were live. */
  async revokeAll(em: EntityManager, member: ProjectMember, by?: LinkActor): Promise<number> {
    const n = await this.revokeRows(em, member);
    if (n && by)
      this.activity.record(em, {
        projectId: member.project.id,
        actorId: by.id,
        kind: 'progress-link.revoked',
        subjectType: 'member',
        subjectId: member.id,
        summary: serverWordsFor('en')('text.progressLinkRevoked', { name: member.name }),
      });
    return n;
  }

  /** The owner's route: issue (or rotate) the link of one party of their project. */
  async issueFor(access: ProjectAccess, memberId: string, by: LinkActor): Promise<ProgressLinkResponse> {
    return this.em.transactional(async (tx) => this.issue(tx, await this.memberOf(tx, access, memberId), by));
  }

  /** The owner's route: revoke the links of one party of their project (nothing live: still done). */
  async revokeFor(access: ProjectAccess, memberId: string, by: LinkActor): Promise<void> {
    await this.em.transactional(async (tx) => {
      const member = await this.memberOf(tx, access, memberId);
      this.assertOutside(member);
      await this.revokeAll(tx, member, by);
    });
  }

  /** The read-only page behind a token: this party's view of the project, nothing of the other parties. */
  async view(token: string): Promise<ProgressView> {
    const link = await this.linkOf(token);
    const member = link.member;
    const project = member.project;
    const em = this.em;
    const sacs = await em.find(Sac, { project: project.id }, { orderBy: { layDate: 'desc', createdAt: 'desc' } });
    const sacIds = sacs.map((s) => s.id);
    const standings = await this.stages.standings([project]);
    const counts = await latestCountsOf(em, sacIds);
    const openings = await this.openingsInForce(sacIds);
    const events = await em.find(
      ActivityEvent,
      { project: project.id, audience: 'members', kind: { $in: [...PROGRESS_TIMELINE_KINDS] } },
      { fields: ['id', 'kind', 'at'], orderBy: { at: 'desc', createdAt: 'desc', id: 'desc' }, limit: TIMELINE_LIMIT },
    );
    const account = await loadAccount(em, project);
    const photos = await this.photos.refsFor(
      OPENING_PHOTO,
      [...openings.values()].flatMap((o) => o.all),
    );
    const viaLink = (p: PhotoRef): PhotoRef => ({
      ...p,
      url: `/api/progress/${token}/photos/${p.id}`,
      thumbUrl: `/api/progress/${token}/photos/${p.id}/thumb`,
    });
    const stage = standings.get(project.id)!.stage;
    return {
      project: {
        title: project.title,
        stage: stage.stage,
        endedEarlyReason: stage.reason ?? null,
        setback: stage.setback ?? null,
        female: { scientificName: project.female.species.scientificName },
        male: { scientificName: project.male.species.scientificName },
      },
      party: { name: member.name, role: member.role },
      timeline: events.map((e) => ({ id: e.id, kind: e.kind as ProgressView['timeline'][number]['kind'], at: e.at.toISOString() })),
      sacs: sacs.map((s) => {
        const opening = openings.get(s.id);
        const count = counts.get(s.id);
        return {
          id: s.id,
          layDate: s.layDate,
          pulledOn: s.pulledOn ?? null,
          openedAt: opening?.current.toISOString() ?? null,
          outcome: s.outcome,
          failureReason: s.failureReason ?? null,
          broodStage: s.broodStage,
          currentCount: count?.alive ?? null,
          currentCountEstimated: count?.estimated ?? false,
          photos: (opening?.all ?? []).flatMap((id) => photos.get(id) ?? []).map(viaLink),
        };
      }),
      share: toProgressShare(account, member.id),
      generatedAt: this.clock.now().toISOString(),
    };
  }

  /** An opening photo of the link's project, through the link. */
  async photo(token: string, photoId: string, variant: PhotoVariant): Promise<StreamableFile> {
    const link = await this.linkOf(token);
    const sacs = await this.em.find(Sac, { project: link.member.project.id }, { fields: ['id'] });
    const openings = await this.openingsInForce(sacs.map((s) => s.id));
    return this.photos.readOfSubjects(
      OPENING_PHOTO,
      [...openings.values()].flatMap((o) => o.all),
      photoId,
      variant,
    );
  }

  private async linkOf(token: string): Promise<ProgressLink> {
    const link = await this.em.findOne(
      ProgressLink,
      { tokenHash: hashLinkToken(token), revokedAt: null },
      { populate: ['member.project.female.species', 'member.project.male.species'] },
    );
    if (!link) throw new NotFoundException(refusal('progress.linkNotFound'));
    return link;
  }

  /** Per sac: when the opening in force took place, and every opening row's id (their photos are shown). */
  private async openingsInForce(sacIds: string[]): Promise<Map<string, { current: Date; all: string[] }>> {
    const out = new Map<string, { current: Date; all: string[] }>();
    if (!sacIds.length) return out;
    const rows = await this.em.find(SacOpening, { sac: { $in: sacIds } }, { fields: ['sac', 'openedAt', 'corrects'], orderBy: { createdAt: 'desc' } });
    const struck = new Set(rows.map((o) => o.corrects?.id).filter(Boolean));
    for (const o of rows) {
      const entry = out.get(o.sac.id) ?? { current: o.openedAt, all: [] };
      if (!struck.has(o.id)) entry.current = o.openedAt;
      entry.all.push(o.id);
      out.set(o.sac.id, entry);
    }
    return out;
  }

  private async memberOf(em: EntityManager, access: ProjectAccess, memberId: string): Promise<ProjectMember> {
    const member = await em.findOne(ProjectMember, { id: memberId, project: access.project.id }, { populate: ['project', 'user'] });
    if (!member) throw new NotFoundException(refusal('project.noSuchParty'));
    return member;
  }

  private assertOutside(member: ProjectMember): void {
    if (member.user) throw new ConflictException(refusal('progress.hasAccount', { name: member.user.displayName ?? member.name }));
  }

  private async revokeRows(em: EntityManager, member: ProjectMember): Promise<number> {
    return em.nativeUpdate(ProgressLink, { member: member.id, revokedAt: null }, { revokedAt: this.clock.now() });
  }
}
