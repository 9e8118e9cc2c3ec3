import { BadRequestException, ConflictException, ForbiddenException, Injectable, NotFoundException } from '@nestjs/common';
import { EntityManager } from '@mikro-orm/postgresql';
import {
  computeShares,
  DEFAULT_HAND_OVER_STAGE,
  type FailureClause,
  type FieldError,
  type TermsListResponse,
  type TermsVersionResponse,
} from '@broodsilk/shared';
import type { AuthUser } from '../common/auth-user';
import { badRequest, fieldError } from '../common/field-errors';
import { User } from '../users/user.entity';
import { ActivityService } from '../activity/activity.service';
import type { ProjectAccess } from './project-access.service';
import { ProjectMember } from './project-member.entity';
import { TermsVersion } from './terms-version.entity';
import { TermsLine } from './terms-line.entity';
import { TermsAcceptance } from './terms-acceptance.entity';
import { acceptanceFacts, termsStatuses } from './terms-status';
import { toTermsVersionResponse } from './terms.mapper';
import type { ProposeTermsDto } from './dto/propose-terms.dto';
import type { AcceptTermsDto } from './dto/accept-terms.dto';
import { fieldRefusal, refusal, term } from '../common/refusal';

const POPULATE = ['createdBy', 'lines.member.user', 'acceptances.member.user', 'acceptances.recordedBy'] as const;

// ISO 4217 codes as the runtime's ICU data knows them (CLDR); a typo like "EUO" is refused.
const CURRENCIES = new Set(Intl.supportedValuesOf('currency'));

@Injectable()
export class TermsService {
  constructor(
    private readonly em: EntityManager,
    private readonly activity: ActivityService,
  ) {}

  private async versions(projectId: string, em: EntityManager = this.em): Promise<TermsVersion[]> {
    return em.find(TermsVersion, { project: projectId }, { populate: POPULATE, orderBy: { number: 'asc' } });
  }

  private statuses(versions: TermsVersion[]) {
    return termsStatuses(versions.map(acceptanceFacts));
  }

  async list(access: ProjectAccess): Promise<TermsListResponse> {
    const versions = await this.versions(access.project.id);
    const { inForce, status } = this.statuses(versions);
    return { inForce, versions: versions.map((v) => toTermsVersionResponse(v, status.get(v.number)!)).reverse() };
  }

  /** The version in force with its lines (for the account), or null when none is accepted yet. */
  async inForce(projectId: string, em: EntityManager = this.em): Promise<TermsVersion | null> {
    const versions = await this.versions(projectId, em);
    const { inForce } = this.statuses(versions);
    return versions.find((v) => v.number === inForce) ?? null;
  }

  async inForceClause(projectId: string): Promise<FailureClause | null> {
    return (await this.inForce(projectId))?.failureClause ?? null;
  }

  private validate(dto: ProposeTermsDto, parties: ProjectMember[]): FieldError[] {
    const errors: FieldError[] = [];
    const byId = new Map(parties.map((m) => [m.id, m]));
    const seen = new Set<string>();
    dto.lines.forEach((l, i) => {
      if (!byId.has(l.memberId)) errors.push(fieldRefusal(`lines.${i}.memberId`, 'terms.lineNobody'));
      else if (seen.has(l.memberId)) errors.push(fieldRefusal(`lines.${i}.memberId`, 'terms.listedTwice', { name: byId.get(l.memberId)!.name }));
      seen.add(l.memberId);
    });
    const missing = parties.filter((m) => !seen.has(m.id));
    if (missing.length) errors.push(fieldRefusal('lines', 'terms.partiesMissing', { names: missing.map((m) => m.user?.displayName ?? m.name).join(', ') }));
    if (dto.lines.reduce((s, l) => s + l.weight, 0) <= 0) errors.push(fieldRefusal('lines', 'terms.noWeight'));
    const picks = new Map<number, number>();
    dto.lines.forEach((l, i) => {
      if (picks.has(l.pickOrder)) errors.push(fieldRefusal(`lines.${i}.pickOrder`, 'terms.pickTwice', { pick: l.pickOrder }));
      picks.set(l.pickOrder, i);
    });
    if (!CURRENCIES.has(dto.currency)) errors.push(fieldRefusal('currency', 'terms.notCurrency', { currency: dto.currency }));
    if (!errors.length) {
      // The share rule has its own input checks; run it once so terms it would refuse never get stored.
      try {
        computeShares(
          0,
          dto.lines.map((l) => ({ partyId: l.memberId, weight: l.weight, fixedCount: l.fixedCount ?? 0, pickOrder: l.pickOrder })),
        );
      } catch (e) {
        errors.push({ field: 'lines', message: e instanceof Error ? e.message : String(e) });
      }
    }
    return errors;
  }

  /** The owner proposes a new version; they accept it by proposing, every partner party still has to. */
  async propose(viewer: AuthUser, access: ProjectAccess, dto: ProposeTermsDto): Promise<TermsVersionResponse> {
    const number = await this.em.transactional(async (tx) => {
      const parties = await tx.find(
        ProjectMember,
        { project: access.project.id, role: { $in: ['owner', 'partner'] } },
        { populate: ['user'], orderBy: { createdAt: 'asc' } },
      );
      const errors = this.validate(dto, parties);
      if (errors.length) throw badRequest(errors);
      const last = await tx.findOne(TermsVersion, { project: access.project.id }, { orderBy: { number: 'desc' } });
      const me = tx.getReference(User, viewer.id);
      const v = tx.create(TermsVersion, {
        project: access.project.id,
        number: (last?.number ?? 0) + 1,
        createdBy: me,
        pricePerSpiderlingMinor: dto.pricePerSpiderlingMinor,
        currency: dto.currency,
        failureClause: dto.failureClause,
        handOverStage: dto.handOverStage ?? DEFAULT_HAND_OVER_STAGE,
        shippingPaidBy: dto.shippingPaidBy,
        note: dto.note ?? null,
      });
      for (const l of dto.lines)
        tx.create(TermsLine, { version: v, member: l.memberId, weight: l.weight, fixedCount: l.fixedCount ?? 0, pickOrder: l.pickOrder });
      tx.create(TermsAcceptance, { version: v, member: access.member, recordedBy: me, note: 'Proposed these terms.' });
      const waiting = parties.filter((m) => m.role === 'partner').length;
      this.activity.record(tx, {
        projectId: access.project.id,
        actorId: viewer.id,
        kind: 'terms.proposed',
        subjectType: 'terms-version',
        subjectId: v.id,
        audience: 'partners',
        summary: waiting
          ? `Proposed terms version ${v.number}; waiting for ${waiting} partner${waiting === 1 ? '' : 's'} to accept.`
          : `Set terms version ${v.number}.`,
        data: { number: v.number },
      });
      return v.number;
    });
    return this.one(access.project.id, number);
  }

  private async one(projectId: string, number: number): Promise<TermsVersionResponse> {
    const versions = await this.versions(projectId);
    const { status } = this.statuses(versions);
    const v = versions.find((x) => x.number === number);
    if (!v) throw new NotFoundException(refusal('terms.noSuchVersion', { number }));
    return toTermsVersionResponse(v, status.get(number)!);
  }

  /**
   * A partner accepts a version for themselves. The owner may record the acceptance of an outside
   * party (no account, so they cannot sign in) on their behalf, with a note of how they agreed.
   */
  async accept(viewer: AuthUser, access: ProjectAccess, number: number, dto: AcceptTermsDto): Promise<TermsVersionResponse> {
    await this.em.transactional(async (tx) => {
      const versions = await this.versions(access.project.id, tx);
      const v = versions.find((x) => x.number === number);
      if (!v) throw new NotFoundException(refusal('terms.noSuchVersion', { number }));
      const before = this.statuses(versions);
      if (before.status.get(number) !== 'proposed') {
        throw new ConflictException(refusal('terms.nothingToAccept', { number, status: term(`refusal.termsStatus.${before.status.get(number)}`) }));
      }
      let party: ProjectMember;
      const onBehalf = dto.memberId !== undefined && dto.memberId !== access.member.id;
      if (onBehalf) {
        if (access.role !== 'owner') throw new ForbiddenException(refusal('terms.onlyOwnerOnBehalf'));
        const line = [...v.lines].find((l) => l.member.id === dto.memberId);
        if (!line) throw fieldError('memberId', refusal('terms.partyNotInVersion', { number }));
        if (line.member.user) throw fieldError('memberId', refusal('terms.acceptsThemselves', { name: line.member.user.displayName }));
        if (!dto.note?.trim()) throw fieldError('note', refusal('terms.howAgreed'));
        party = line.member;
      } else {
        const line = [...v.lines].find((l) => l.member.id === access.member.id);
        if (!line) throw new BadRequestException(refusal('terms.youNotParty', { number }));
        party = line.member;
      }
      if ([...v.acceptances].some((a) => a.member.id === party.id)) {
        throw new ConflictException(refusal('terms.alreadyAccepted', { name: party.user?.displayName ?? party.name, number }));
      }
      const acceptance = tx.create(TermsAcceptance, {
        version: v,
        member: party,
        recordedBy: tx.getReference(User, viewer.id),
        onBehalf,
        note: dto.note ?? null,
      });
      v.acceptances.add(acceptance);
      const who = party.user?.displayName ?? party.name;
      this.activity.record(tx, {
        projectId: access.project.id,
        actorId: viewer.id,
        kind: 'terms.accepted',
        subjectType: 'terms-version',
        subjectId: v.id,
        audience: 'partners',
        summary: onBehalf ? `Recorded that ${who} accepted terms version ${number} (on their behalf).` : `${who} accepted terms version ${number}.`,
        data: { number, memberId: party.id, onBehalf },
      });
      if (this.statuses(versions).inForce === number) {
        this.activity.record(tx, {
          projectId: access.project.id,
          actorId: viewer.id,
          kind: 'terms.in-force',
          subjectType: 'terms-version',
          subjectId: v.id,
          audience: 'partners',
          summary: `Terms version ${number} is now in force.`,
          data: { number },
        });
      }
    });
    return this.one(access.project.id, number);
  }
}
