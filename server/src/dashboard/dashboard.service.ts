import { Injectable } from '@nestjs/common';
import { EntityManager } from '@mikro-orm/postgresql';
import {
  DASHBOARD_PULL_WINDOW_DAYS,
  addDays,
  todayIn,
  type DashboardResponse,
  type DashboardSac,
  type ProjectSummary,
  type RollStatus,
} from '@broodsilk/shared';
import type { AuthUser } from '../common/auth-user';
import { ProjectMember } from '../projects/project-member.entity';
import { Project } from '../projects/project.entity';
import { ProjectStageService } from '../projects/project-stage.service';
import { toProjectSummary } from '../projects/projects.mapper';
import { partnerNamesOf } from '../projects/partner-names';
import { AnimalsService } from '../animals/animals.service';
import { ActivityService } from '../activity/activity.service';
import { Sac } from '../sacs/sac.entity';
import { SAC_POPULATE, SacViewsService } from '../sacs/sac-views.service';
import { Clock } from '../common/clock';

const ROLL_ORDER: Record<RollStatus, number> = { overdue: 0, due: 1, 'due-soon': 2, upcoming: 3 };
const HANDS_ON = new Set(['owner', 'caretaker']);

@Injectable()
export class DashboardService {
  constructor(
    private readonly em: EntityManager,
    private readonly views: SacViewsService,
    private readonly stages: ProjectStageService,
    private readonly animals: AnimalsService,
    private readonly activity: ActivityService,
    private readonly clock: Clock,
  ) {}

  async forUser(viewer: AuthUser): Promise<DashboardResponse> {
    const now = this.clock.now();
    const today = todayIn(viewer.timeZone, now);
    const memberships = await this.em.find(ProjectMember, { user: viewer.id });
    const roleOf = new Map(memberships.map((m) => [m.project.id, m.role]));
    const projects = await this.em.find(
      Project,
      { id: { $in: [...roleOf.keys()] } },
      { populate: ['owner', 'female.species', 'male.species'], orderBy: { createdAt: 'desc', id: 'asc' } },
    );
    const standings = await this.stages.standings(projects);
    const partners = await partnerNamesOf(
      this.em,
      projects.map((p) => p.id),
    );
    const summaries: ProjectSummary[] = projects.map((p) => toProjectSummary(p, standings.get(p.id)!.stage, roleOf.get(p.id)!, partners.get(p.id) ?? []));
    const openIds = new Set(summaries.filter((s) => s.stage.stage !== 'closed' && s.stage.stage !== 'ended-early').map((s) => s.id));

    const sacs = await this.em.find(Sac, { project: { $in: [...openIds] }, outcome: 'in-progress' }, { populate: SAC_POPULATE });
    const responses = await this.views.build(this.em, sacs, viewer.timeZone, now);
    const items: DashboardSac[] = sacs.map((s, i) => ({
      projectId: s.project.id,
      projectTitle: s.project.title,
      myRole: roleOf.get(s.project.id)!,
      sac: responses[i],
    }));
    const handsOn = items.filter((x) => HANDS_ON.has(x.myRole));
    const withMother = (x: DashboardSac) => !x.sac.pulled;
    const horizon = addDays(today, DASHBOARD_PULL_WINDOW_DAYS);

    return {
      today,
      dueToday: {
        rolls: handsOn
          .filter((x) => x.sac.roll && x.sac.roll.status !== 'upcoming')
          .sort((a, b) => ROLL_ORDER[a.sac.roll!.status] - ROLL_ORDER[b.sac.roll!.status] || a.sac.roll!.due.localeCompare(b.sac.roll!.due)),
        pullWindows: handsOn
          .filter(withMother)
          .flatMap((x) => [
            ...(x.sac.pullWindow.opensOn === today ? [{ ...x, event: 'opens-today' as const }] : []),
            ...(x.sac.pullWindow.closesOn === today ? [{ ...x, event: 'closes-today' as const }] : []),
          ]),
      },
      openProjects: summaries.filter((s) => openIds.has(s.id)),
      upcomingPullWindows: items
        .filter((x) => withMother(x) && x.sac.pullWindow.state !== 'past' && x.sac.pullWindow.opensOn <= horizon)
        .sort((a, b) => a.sac.pullWindow.opensOn.localeCompare(b.sac.pullWindow.opensOn)),
      matureMales: await this.animals.malesByClock(viewer),
      recentActivity: await this.activity.recentFromOthers(viewer.id, 20),
    };
  }
}
