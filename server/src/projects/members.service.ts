import { BadRequestException, ConflictException, Injectable, NotFoundException } from '@nestjs/common';
import { EntityManager } from '@mikro-orm/postgresql';
import type { ProjectMemberResponse } from '@broodsilk/shared';
import type { AuthUser } from '../common/auth-user';
import { ActivityService } from '../activity/activity.service';
import type { ProjectAccess } from './project-access.service';
import { ProjectMember } from './project-member.entity';
import { TermsLine } from './terms-line.entity';
import { toMemberResponse } from './projects.mapper';
import type { AddMemberDto } from './dto/add-member.dto';
import { label, serverWordsFor } from '@broodsilk/shared';
import { refusal } from '../common/refusal';

@Injectable()
export class MembersService {
  constructor(
    private readonly em: EntityManager,
    private readonly activity: ActivityService,
  ) {}

  async list(access: ProjectAccess): Promise<ProjectMemberResponse[]> {
    const rows = await this.em.find(ProjectMember, { project: access.project.id }, { populate: ['user'], orderBy: { createdAt: 'asc' } });
    return rows.map((m) => toMemberResponse(m, access.role));
  }

  /** An outside party (no account): they can hold shares now and sign in once they accept an invitation. */
  async add(viewer: AuthUser, access: ProjectAccess, dto: AddMemberDto): Promise<ProjectMemberResponse> {
    const email = dto.email?.trim().toLowerCase() || null;
    const member = await this.em.transactional(async (tx) => {
      if (email) {
        const all = await tx.find(ProjectMember, { project: access.project.id }, { populate: ['user'] });
        const same = all.find((m) => (m.user?.email ?? m.email)?.toLowerCase() === email);
        if (same) throw new ConflictException(refusal('project.emailTaken', { name: same.user?.displayName ?? same.name }));
      }
      const m = tx.create(ProjectMember, { project: access.project.id, user: null, role: dto.role, name: dto.name.trim(), email });
      this.activity.record(tx, {
        projectId: access.project.id,
        actorId: viewer.id,
        kind: 'member.added',
        subjectType: 'member',
        subjectId: m.id,
        summary: `Added ${m.name} as ${dto.role}.`,
        data: { role: dto.role },
      });
      return m;
    });
    return toMemberResponse(member, access.role);
  }

  /** The owner removes a party; a party named in any terms version stays (the history needs them). */
  async remove(viewer: AuthUser, access: ProjectAccess, memberId: string): Promise<void> {
    await this.em.transactional(async (tx) => {
      const m = await tx.findOne(ProjectMember, { id: memberId, project: access.project.id }, { populate: ['user'] });
      if (!m) throw new NotFoundException(refusal('project.noSuchParty'));
      if (m.role === 'owner') throw new BadRequestException(refusal('project.ownerStays'));
      const inTerms = await tx.count(TermsLine, { member: m.id });
      if (inTerms) throw new ConflictException(refusal('project.partyInTerms', { name: m.user?.displayName ?? m.name }));
      this.activity.record(tx, {
        projectId: access.project.id,
        actorId: viewer.id,
        kind: 'member.removed',
        subjectType: 'member',
        subjectId: m.id,
        summary: serverWordsFor('en')('text.memberRemoved', { name: m.user?.displayName ?? m.name, role: label(serverWordsFor('en'), 'role', m.role) }),
        data: { role: m.role },
      });
      tx.remove(m);
    });
  }
}
