import type { CalendarDate } from '../breeding/calendar-day.js';
import type { ActivityEventResponse } from '../projects/activity.types.js';
import type { ProjectRole, ProjectSummary } from '../projects/project.types.js';
import type { MaleClockRow } from '../collection/animals.types.js';
import type { SacResponse } from '../sacs/sacs.types.js';

/** Days ahead the dashboard looks for pull windows. */
export const DASHBOARD_PULL_WINDOW_DAYS = 30;

/** A sac with the project it belongs to, as the dashboard lists it. */
export interface DashboardSac {
  projectId: string;
  projectTitle: string;
  myRole: ProjectRole;
  sac: SacResponse;
}

export type PullWindowEvent = 'opens-today' | 'closes-today';

export interface DashboardResponse {
  /** The viewer's date the dashboard was computed for (their time zone). */
  today: CalendarDate;
  dueToday: {
    /** Rolls due soon, due or overdue in projects where the viewer is owner or caretaker; most late first. */
    rolls: DashboardSac[];
    /** Sacs still with the mother whose pull window opens or closes today (owner or caretaker). */
    pullWindows: (DashboardSac & { event: PullWindowEvent })[];
  };
  /** Projects not closed or ended early, with their stage. */
  openProjects: ProjectSummary[];
  /** Sacs still with the mother whose window is open or opens within 30 days; soonest first. */
  upcomingPullWindows: DashboardSac[];
  /** The viewer's own mature males, most urgent clock first. */
  matureMales: MaleClockRow[];
  /** What others did lately in the viewer's projects. */
  recentActivity: ActivityEventResponse[];
}
