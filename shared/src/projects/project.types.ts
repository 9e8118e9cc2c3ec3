import type { AcknowledgedWarnings } from '../errors/plausibility.js';
import type { CalendarDate } from '../breeding/calendar-day.js';
import type { DerivedProjectStage, EndedEarlyReason } from '../breeding/project-stage.js';
import type { PairingWarning } from '../breeding/pairing-warnings.js';
import type { AnimalSummary, FemaleReadinessView, MaleClockView } from '../collection/animals.types.js';

/** Per-project roles; account roles (keeper/admin) are separate. */
export const PROJECT_ROLES = ['owner', 'partner', 'caretaker'] as const;
export type ProjectRole = (typeof PROJECT_ROLES)[number];

/** Roles an invitation can give (a project has exactly one owner). */
export const INVITABLE_ROLES = ['partner', 'caretaker'] as const;
export type InvitableRole = (typeof INVITABLE_ROLES)[number];

export const ENDED_EARLY_REASONS: readonly EndedEarlyReason[] = ['no-sac', 'female-molted', 'sac-failed', 'sac-eaten', 'male-died'];

export interface CreateProjectRequest extends AcknowledgedWarnings {
  title: string;
  femaleId: string;
  maleId: string;
  notes?: string | null;
}

export interface UpdateProjectRequest {
  title?: string;
  notes?: string | null;
}

export interface EndProjectRequest {
  reason: EndedEarlyReason;
  note?: string | null;
  /** The keeper's own words, sent to every partner with the facts. */
  partnerMessage?: string;
}

/** One of the project's animals as members see it: read-only, with clock and readiness. */
export interface ProjectAnimal extends AnimalSummary {
  owner: { name: string; userId?: string };
  dueBackOn: CalendarDate | null;
  maleClock: MaleClockView | null;
  readiness: FemaleReadinessView | null;
}

export interface ProjectSummary {
  id: string;
  title: string;
  stage: DerivedProjectStage;
  /** The viewer's role in this project. */
  myRole: ProjectRole;
  owner: { id: string; name: string };
  /** Names of the parties with the partner role, oldest first. */
  partners: string[];
  female: { id: string; label: string; scientificName: string };
  male: { id: string; label: string; scientificName: string };
  endedOn: CalendarDate | null;
  closedOn: CalendarDate | null;
  createdAt: string;
  updatedAt: string;
}

export interface ProjectResponse extends ProjectSummary {
  notes: string | null;
  endedEarlyNote: string | null;
  /** Why the project was started despite a plausibility warning. */
  warningReason: string | null;
  femaleAnimal: ProjectAnimal;
  /** The male the project started with. */
  maleAnimal: ProjectAnimal;
  /** Every male of the project: the first one, then each other male paired with her, in the order first paired. */
  males: ProjectAnimal[];
  warnings: PairingWarning[];
  members: ProjectMemberResponse[];
}

export interface ProjectMemberResponse {
  id: string;
  role: ProjectRole;
  name: string;
  /** Shown to the owner only; other members see null. */
  email: string | null;
  /** Set when the party is a keeper of this instance; null for an outside party without an account. */
  userId: string | null;
  hasAccount: boolean;
}

/** The owner adds an outside party (no account yet), e.g. a partner who lends a male. */
export interface AddMemberRequest {
  name: string;
  email?: string | null;
  role: InvitableRole;
}
