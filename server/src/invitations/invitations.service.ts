import { BadRequestException, ConflictException, GoneException, Inject, Injectable, NotFoundException } from '@nestjs/common';
import type { ConfigType } from '@nestjs/config';
import { EntityManager } from '@mikro-orm/postgresql';
import { LockMode } from '@mikro-orm/core';
import { DEFAULT_LANGUAGE, type AcceptInvitationResponse, type InvitationPreview, type InvitationResponse } from '@broodsilk/shared';
import { appConfig } from '../config/app.config';
import type { AuthUser } from '../common/auth-user';
import { MailOutbox } from '../mail/mail-outbox.service';
import { accountMail } from '../mail/account-mail';
import { User } from '../users/user.entity';
import { ActivityService } from '../activity/activity.service';
import type { ProjectAccess } from '../projects/project-access.service';
import { ProjectMember } from '../projects/project-member.entity';
import { Invitation } from './invitation.entity';
import { hashInvitationToken, INVITATION_DAYS, newInvitationToken } from './invitation-token';
import { invitationProblem, toInvitationPreview, toInvitationResponse } from './invitations.mapper';
import type { CreateInvitationDto } from './dto/create-invitation.dto';
import { Clock } from '../common/clock';
import { fieldRefusal, refusal, term } from '../common/refusal';

const INVALID_LINK = refusal('invitation.invalidLink');

@Injectable()
export class InvitationsService {
  constructor(
    private readonly em: EntityManager,
    private readonly clock: Clock,
    private readonly outbox: MailOutbox,
    private readonly activity: ActivityService,
    @Inject(appConfig.KEY) private readonly app: ConfigType<typeof appConfig>,
  ) {}

  /** Sends a single-use link; an open invitation to the same address in this project stops working. */
  async create(viewer: AuthUser, access: ProjectAccess, dto: CreateInvitationDto): Promise<InvitationResponse> {
    const email = dto.email.trim().toLowerCase();
    const { token, hash } = newInvitationToken();
    const invitation = await this.em.transactional(async (tx) => {
      const members = await tx.find(ProjectMember, { project: access.project.id }, { populate: ['user'] });
      if (members.some((m) => m.user?.email.toLowerCase() === email)) throw new ConflictException(refusal('invitation.alreadyMemberEmail'));
      let member: ProjectMember | null = null;
      if (dto.memberId) {
        member = members.find((m) => m.id === dto.memberId) ?? null;
        if (!member) throw new BadRequestException({ ...refusal('project.noSuchParty'), details: [fieldRefusal('memberId', 'project.noSuchParty')] });
        if (member.user)
          throw new BadRequestException({
            ...refusal('invitation.partyHasAccount', { name: member.user.displayName }),
            details: [fieldRefusal('memberId', 'invitation.partyHasAccountField')],
          });
        if (member.role !== dto.role)
          throw new BadRequestException({
            ...refusal('invitation.roleMismatch', { name: member.name, role: term(`refusal.projectRole.${member.role}`) }),
            details: [fieldRefusal('role', 'invitation.roleMismatchField', { name: member.name, role: term(`refusal.projectRole.${member.role}`) })],
          });
      }
      await tx.nativeUpdate(Invitation, { project: access.project.id, email, acceptedAt: null, replacedAt: null }, { replacedAt: this.clock.now() });
      const inviter = await tx.findOneOrFail(User, viewer.id);
      const invitation = tx.create(Invitation, {
        project: access.project,
        email,
        role: dto.role,
        member,
        tokenHash: hash,
        invitedBy: inviter,
        expiresAt: new Date(this.clock.now().getTime() + INVITATION_DAYS * 86_400_000),
      });
      this.activity.record(tx, {
        projectId: access.project.id,
        actorId: viewer.id,
        kind: 'invitation.sent',
        subjectType: 'invitation',
        subjectId: invitation.id,
        summary: `Invited ${email} as ${dto.role}.`,
        data: { email, role: dto.role },
      });
      await tx.flush();
      // Goes out after commit from the mail queue; a refused invitation sends nothing.
      const link = `${this.app.publicUrl}/invitations/${token}`;
      // In the invitee's language when the address has an account; English otherwise (the server has no other clue to it).
      const invitee = await tx.findOne(User, { email }, { fields: ['language'] });
      await this.outbox.enqueue(
        tx,
        accountMail({ email, displayName: null, language: invitee?.language ?? DEFAULT_LANGUAGE }, (t) => {
          const about = { inviter: inviter.displayName, project: access.project.title };
          return {
            subject: t('mail.invitation.subject', about),
            paragraphs: [
              t('mail.invitation.body', { ...about, role: t(`mail.invitation.role.${dto.role}`) }),
              t('mail.invitation.open', { count: INVITATION_DAYS }),
              link,
              t('mail.invitation.after'),
            ],
          };
        }),
      );
      return invitation;
    });
    return toInvitationResponse(invitation);
  }

  private async byToken(token: string, em: EntityManager, lock = false): Promise<Invitation> {
    const found = await em.findOne(
      Invitation,
      { tokenHash: hashInvitationToken(token) },
      {
        populate: ['project', 'invitedBy', 'member'],
        ...(lock ? { lockMode: LockMode.PESSIMISTIC_WRITE } : {}),
      },
    );
    if (!found) throw new NotFoundException(INVALID_LINK);
    return found;
  }

  async preview(token: string): Promise<InvitationPreview> {
    return toInvitationPreview(await this.byToken(token, this.em), this.clock.now());
  }

  /**
   * Joins the signed-in user to the project with the invitation's role; the link then stops
   * working. A link is a bearer secret that may be forwarded or intercepted, so an account with
   * another address than the invited one only asks to join, and the owner approves it.
   */
  async accept(viewer: AuthUser, token: string): Promise<AcceptInvitationResponse> {
    return this.em.transactional(async (tx) => {
      const inv = await this.byToken(token, tx, true);
      const problem = invitationProblem(inv, this.clock.now());
      if (problem) throw new GoneException(problem);
      return this.acceptAs(tx, inv, await tx.findOneOrFail(User, viewer.id));
    });
  }

  /**
   * Accepts the invitation whose link led to a registration, once that account has confirmed its
   * address (inside the confirmation's transaction `tx`); a link that no longer works gives its
   * reason instead, and the account stays as it is.
   */
  async acceptAfterConfirmation(tx: EntityManager, invitationId: string, user: User): Promise<AcceptInvitationResponse | { problem: string }> {
    const inv = await tx.findOne(Invitation, { id: invitationId }, { populate: ['project', 'invitedBy', 'member'], lockMode: LockMode.PESSIMISTIC_WRITE });
    if (!inv) return { problem: INVALID_LINK.message };
    const problem = invitationProblem(inv, this.clock.now());
    if (problem) return { problem: problem.message };
    try {
      return await this.acceptAs(tx, inv, user);
    } catch (e) {
      if (e instanceof ConflictException) return { problem: e.message };
      throw e;
    }
  }

  private async acceptAs(tx: EntityManager, inv: Invitation, user: User): Promise<AcceptInvitationResponse> {
    if (user.email.toLowerCase() === inv.email) return this.join(tx, inv, user);
    await this.assertNotMember(tx, inv, user);
    inv.claimedBy = user;
    inv.claimedAt = this.clock.now();
    this.activity.record(tx, {
      projectId: inv.project.id,
      actorId: user.id,
      kind: 'invitation.claimed',
      subjectType: 'invitation',
      subjectId: inv.id,
      summary: `${user.displayName} (${user.email}) opened the invitation sent to ${inv.email} and waits for the owner's approval.`,
      data: { invitationId: inv.id, email: inv.email, claimedByEmail: user.email },
    });
    return { projectId: inv.project.id, role: inv.role, status: 'awaiting-owner' as const };
  }

  /** The owner lets the account that opened the invitation from another address join. */
  async approveClaim(viewer: AuthUser, access: ProjectAccess, invitationId: string): Promise<AcceptInvitationResponse> {
    return this.em.transactional(async (tx) => {
      const inv = await tx.findOne(
        Invitation,
        { id: invitationId, project: access.project.id },
        { populate: ['project', 'member', 'claimedBy'], lockMode: LockMode.PESSIMISTIC_WRITE },
      );
      if (!inv) throw new NotFoundException(refusal('invitation.noSuchInvitation'));
      const problem = invitationProblem(inv, this.clock.now());
      if (problem) throw new GoneException(problem);
      if (!inv.claimedBy) throw new ConflictException(refusal('invitation.nobodyAsked'));
      return this.join(tx, inv, inv.claimedBy, viewer.id);
    });
  }

  private async assertNotMember(tx: EntityManager, inv: Invitation, user: User): Promise<void> {
    if (await tx.count(ProjectMember, { project: inv.project.id, user: user.id })) {
      throw new ConflictException(refusal('invitation.alreadyMember'));
    }
  }

  private async join(tx: EntityManager, inv: Invitation, user: User, actorId = user.id): Promise<AcceptInvitationResponse> {
    await this.assertNotMember(tx, inv, user);
    const projectId = inv.project.id;
    let member: ProjectMember;
    if (inv.member) {
      if (inv.member.user) throw new ConflictException(refusal('invitation.partyLinked'));
      member = inv.member;
      member.user = user;
      member.role = inv.role;
    } else {
      member = tx.create(ProjectMember, { project: projectId, user, role: inv.role, name: user.displayName, email: user.email });
    }
    inv.acceptedAt = this.clock.now();
    inv.acceptedBy = user;
    this.activity.record(tx, {
      projectId,
      actorId,
      kind: 'member.joined',
      subjectType: 'member',
      subjectId: member.id,
      summary: `${user.displayName} joined as ${inv.role}.`,
      data: { role: inv.role, invitationId: inv.id },
    });
    return { projectId, role: inv.role, status: 'joined' };
  }
}
