import { Injectable } from '@nestjs/common';
import { EntityManager } from '@mikro-orm/postgresql';
import {
  DASHBOARD_MATURE_MALES,
  DASHBOARD_OPEN_PROJECTS,
  DASHBOARD_PULL_WINDOW_DAYS,
  addDays,
  todayIn,
  type DashboardResponse,
  type DashboardSac,
  type DashboardSacView,
  type SacResponse,
  type PullWindowEvent,
  type RollStatus,
  isHandsOn,
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
import { SacViewsService } from '../sacs/sac-views.service';
import { Clock } from '../common/clock';
import { loadAccountFacts } from '../accounts/account-loader';
import { accountTodos } from '../accounts/account-todos';
import { isSettled } from '../accounts/balances.mapper';
import { projectsWithBrood } from '../accounts/projects-with-brood';
import { termsAwaitingAcceptance } from '../projects/terms-todos';

const ROLL_ORDER: Record<RollStatus, number> = { overdue: 0, due: 1, 'due-soon': 2, upcoming: 3 };
const MONEY = new Set(['owner', 'partner']);

function toDashboardSacView({ id, layDate, dayNumber, pullWindow, roll, readingAlerts, band }: SacResponse): DashboardSacView {
  return { id, layDate, dayNumber, pullWindow, roll, readingAlerts, band };
}

/** Opens today, closes today, or open in between: each a reason to look at the sac today. */
function pullWindowEvents(x: DashboardSac, today: string): (DashboardSac & { event: PullWindowEvent })[] {
  const w = x.sac.pullWindow;
  if (w.opensOn === today) return [{ ...x, event: 'opens-today' }, ...(w.closesOn === today ? [{ ...x, event: 'closes-today' as const }] : [])];
  if (w.closesOn === today) return [{ ...x, event: 'closes-today' }];
  return w.opensOn < today && today < w.closesOn ? [{ ...x, event: 'open' }] : [];
}

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
    const projects = await this.em.find(Project, { id: { $in: [...roleOf.keys()] } }, { orderBy: { createdAt: 'desc', id: 'asc' } });
    // Open: neither closed nor ended early (the stage's first two rules, what isProjectOpen reads from a
    // stage), known without deriving any stage; only the listed ones get theirs.
    const open = projects.filter((p) => !p.closedOn && !p.endedEarlyReason);
    const listed = open.slice(0, DASHBOARD_OPEN_PROJECTS);
    // Every open project's female with her species: the sac lines below read the pull window from it.
    await this.em.populate(open, ['female.species']);
    await this.em.populate(listed, ['owner', 'male.species']);
    // Each account once: for the money to-dos (owners and partners, every project) and the listed
    // projects' "shares settled" fact (only a project with a brood can be settled).
    const withBrood = await projectsWithBrood(
      this.em,
      listed.map((p) => p.id),
    );
    const accounts = await loadAccountFacts(
      this.em,
      projects.filter((p) => MONEY.has(roleOf.get(p.id)!) || withBrood.has(p.id)),
    );
    const settled = new Map(listed.map((p) => [p.id, withBrood.has(p.id) && isSettled(accounts.get(p.id)!)]));
    const standings = await this.stages.standings(listed, { sharesSettled: settled });
    const partners = await partnerNamesOf(
      this.em,
      listed.map((p) => p.id),
    );
    const openIds = new Set(open.map((p) => p.id));

    // Their projects, females and species are loaded above: a join (SAC_POPULATE) would hydrate them all again.
    const sacs = await this.em.find(Sac, { project: { $in: [...openIds] }, outcome: 'in-progress' });
    const responses = await this.views.build(this.em, sacs, viewer.timeZone, now, (projectId) => roleOf.get(projectId)!);
    // A sac the keeper chose to leave with the mother has no pull window to watch.
    const watchedWithMother = new Set(responses.filter((r) => !r.pulled && !r.leftWithMother).map((r) => r.id));
    const items: DashboardSac[] = sacs.map((s, i) => ({
      projectId: s.project.id,
      projectTitle: s.project.title,
      myRole: roleOf.get(s.project.id)!,
      sac: toDashboardSacView(responses[i]),
    }));
    const handsOn = items.filter((x) => isHandsOn(x.myRole));
    const withMother = (x: DashboardSac) => watchedWithMother.has(x.sac.id);
    const horizon = addDays(today, DASHBOARD_PULL_WINDOW_DAYS);
    const todos = projects.filter((p) => MONEY.has(roleOf.get(p.id)!)).map((p) => accountTodos(accounts.get(p.id)!, viewer.id));

    const males = await this.animals.malesByClock(viewer);
    return {
      today,
      dueToday: {
        rolls: handsOn
          .filter((x) => x.sac.roll && x.sac.roll.status !== 'upcoming')
          .sort((a, b) => ROLL_ORDER[a.sac.roll!.status] - ROLL_ORDER[b.sac.roll!.status] || a.sac.roll!.due.localeCompare(b.sac.roll!.due)),
        pullWindows: handsOn.filter(withMother).flatMap((x) => pullWindowEvents(x, today)),
        readings: handsOn.filter((x) => x.sac.readingAlerts.length > 0),
        termsToAccept: await termsAwaitingAcceptance(
          this.em,
          viewer.id,
          projects.map((p) => p.id),
        ),
        handOversToConfirm: todos.flatMap((a) => a.handOvers),
        payments: todos.flatMap((a) => a.payments),
      },
      openProjects: listed.map((p) => toProjectSummary(p, standings.get(p.id)!.stage, roleOf.get(p.id)!, partners.get(p.id) ?? [])),
      openProjectCount: open.length,
      upcomingPullWindows: items
        .filter((x) => withMother(x) && x.sac.pullWindow.state !== 'past' && x.sac.pullWindow.opensOn <= horizon)
        .sort((a, b) => a.sac.pullWindow.opensOn.localeCompare(b.sac.pullWindow.opensOn)),
      matureMales: males.slice(0, DASHBOARD_MATURE_MALES),
      matureMaleCount: males.length,
      recentActivity: await this.activity.recentFromOthers(viewer.id, 20),
    };
  }
}
