import type {
  ProjectAnimal,
  ProjectMemberResponse,
  ProjectResponse,
  ProjectRole,
  ProjectSummary,
  DerivedProjectStage,
  PairingWarning,
} from '@broodsilk/shared';
import type { Animal } from '../animals/animal.entity';
import { toAnimalResponse } from '../animals/animals.mapper';
import type { Project } from './project.entity';
import type { ProjectMember } from './project-member.entity';
import { memberName } from './partner-names';

const animalRef = (a: Animal) => ({ id: a.id, label: a.label, scientificName: a.species.scientificName });

/** Needs `owner`, `female.species`, `male.species` loaded. */
export function toProjectSummary(p: Project, stage: DerivedProjectStage, myRole: ProjectRole, partners: string[]): ProjectSummary {
  return {
    id: p.id,
    title: p.title,
    stage,
    myRole,
    owner: { id: p.owner.id, name: p.owner.displayName },
    partners,
    female: animalRef(p.female),
    male: animalRef(p.male),
    endedOn: p.endedOn ?? null,
    closedOn: p.closedOn ?? null,
    createdAt: p.createdAt.toISOString(),
    updatedAt: p.updatedAt.toISOString(),
  };
}

/** What members see of an animal: no price paid, no photos, not editable here. Needs species, recordedBy, ownerUser. */
export function toProjectAnimal(a: Animal, today: string, viewerId: string): ProjectAnimal {
  const r = toAnimalResponse(a, today, viewerId);
  const {
    pricePaidMinor: _p,
    priceCurrency: _c,
    photos: _ph,
    editable: _e,
    recordedBy: _r,
    acquiredFrom: _f,
    acquiredOn: _o,
    notes: _n,
    updatedAt: _u,
    premoltNote: _pm,
    owner,
    ...summary
  } = r;
  return {
    ...summary,
    owner: { name: owner.name, ...(owner.userId ? { userId: owner.userId } : {}) },
    dueBackOn: r.dueBackOn,
    maleClock: r.maleClock,
    readiness: r.readiness,
  };
}

/** Needs `user` loaded. E-mail addresses are the owner's business only. */
export function toMemberResponse(m: ProjectMember, viewerRole: ProjectRole): ProjectMemberResponse {
  return {
    id: m.id,
    role: m.role,
    name: m.user?.displayName ?? m.name,
    email: viewerRole === 'owner' ? (m.user?.email ?? m.email ?? null) : null,
    userId: m.user?.id ?? null,
    hasAccount: !!m.user,
  };
}

export function toProjectResponse(
  p: Project,
  stage: DerivedProjectStage,
  myRole: ProjectRole,
  today: string,
  viewerId: string,
  warnings: PairingWarning[],
  members: ProjectMember[],
  males: readonly Animal[],
): ProjectResponse {
  return {
    ...toProjectSummary(p, stage, myRole, members.filter((m) => m.role === 'partner').map(memberName)),
    notes: p.notes ?? null,
    endedEarlyNote: p.endedEarlyNote ?? null,
    warningReason: p.warningReason ?? null,
    femaleAnimal: toProjectAnimal(p.female, today, viewerId),
    maleAnimal: toProjectAnimal(p.male, today, viewerId),
    males: males.map((m) => toProjectAnimal(m, today, viewerId)),
    warnings,
    members: members.map((m) => toMemberResponse(m, myRole)),
  };
}
