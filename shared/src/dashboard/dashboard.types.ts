import type { CalendarDate } from '../breeding/calendar-day.js';
import type { ActivityEventResponse } from '../projects/activity.types.js';
import type { ProjectRole, ProjectSummary } from '../projects/project.types.js';
import type { MaleClockRow } from '../collection/animals.types.js';
import type { SacResponse } from '../sacs/sacs.types.js';

/** Days ahead the dashboard looks for pull windows. */
export const DASHBOARD_PULL_WINDOW_DAYS = 30;

/** Mature males the dashboard lists (most urgent clock first); the collection lists them all. */
export const DASHBOARD_MATURE_MALES = 8;

/** Open projects the dashboard lists (newest first); the projects page lists them all. */
export const DASHBOARD_OPEN_PROJECTS = 12;

/**
 * What a Today card shows of a sac; the whole sac is on its own page. (A keeper with hundreds of
 * sacs would otherwise download every sac's full record on each visit.)
 */
export type DashboardSacView = Pick<SacResponse, 'id' | 'layDate' | 'dayNumber' | 'pullWindow' | 'roll' | 'readingAlerts' | 'band'>;

/** A sac with the project it belongs to, as the dashboard lists it. */
export interface DashboardSac {
  projectId: string;
  projectTitle: string;
  myRole: ProjectRole;
  sac: DashboardSacView;
}

/** `open`: the window is open now (between the day it opens and the day it closes). */
export type PullWindowEvent = 'opens-today' | 'closes-today' | 'open';

/** A to-do in one of the viewer's projects. */
interface ProjectTodo {
  projectId: string;
  projectTitle: string;
}

/** A proposed terms version the viewer (a partner party) has not yet accepted. */
export interface TermsTodo extends ProjectTodo {
  version: number;
}

/** A hand-over whose arrival the viewer confirms (the recipient, or the owner for a party without an account). */
export interface HandOverTodo extends ProjectTodo {
  entryId: string;
  date: CalendarDate;
  count: number;
  /** The party who received the young. */
  partyName: string;
  /** The viewer received them (else the owner confirms for a party without an account); the words speak to the reader. */
  mine: boolean;
}

/** Money owed between the viewer and another party, netted (the account's debts). */
export interface PaymentTodo extends ProjectTodo {
  direction: 'owed-to-me' | 'owed-by-me';
  otherName: string;
  amountMinor: number;
  currency: string;
}

export interface DashboardResponse {
  /** The viewer's date the dashboard was computed for (their time zone). */
  today: CalendarDate;
  dueToday: {
    /** Rolls due soon, due or overdue in projects where the viewer is owner or caretaker; most late first. */
    rolls: DashboardSac[];
    /** Sacs still with the mother whose pull window is open: opens today, closes today, or open (owner or caretaker). */
    pullWindows: (DashboardSac & { event: PullWindowEvent })[];
    /** Sacs in an incubator whose latest temperature or humidity lies outside their band (owner or caretaker). */
    readings: DashboardSac[];
    termsToAccept: TermsTodo[];
    handOversToConfirm: HandOverTodo[];
    payments: PaymentTodo[];
  };
  /** The newest `DASHBOARD_OPEN_PROJECTS` projects not closed or ended early, with their stage. */
  openProjects: ProjectSummary[];
  /** How many open projects there are in all. */
  openProjectCount: number;
  /** Sacs still with the mother whose window is open or opens within 30 days; soonest first. */
  upcomingPullWindows: DashboardSac[];
  /** The viewer's own mature males with the most urgent clocks, most urgent first (`DASHBOARD_MATURE_MALES`). */
  matureMales: MaleClockRow[];
  /** How many mature males the viewer has in all. */
  matureMaleCount: number;
  /** What others did lately in the viewer's projects. */
  recentActivity: ActivityEventResponse[];
}
