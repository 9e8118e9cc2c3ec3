import { Body, Controller, Get, HttpCode, Param, Post } from '@nestjs/common';
import type { AcceptInvitationResponse, InvitationPreview, InvitationResponse } from '@broodsilk/shared';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import { Public } from '../common/decorators/public.decorator';
import { CurrentProject, ProjectRoles } from '../projects/project-roles.decorator';
import type { AuthUser } from '../common/auth-user';
import type { ProjectAccess } from '../projects/project-access.service';
import { PerUserLimit } from '../common/per-user-limit/per-user-limit';
import { InvitationsService } from './invitations.service';
import { CreateInvitationDto } from './dto/create-invitation.dto';
import { RecordIdPipe } from '../common/pipes/record-id.pipe';

/** Invitations sent per keeper per hour; each one e-mails an outside address. */
export const INVITATIONS_PER_HOUR = 30;

@Controller('projects/:projectId/invitations')
export class ProjectInvitationsController {
  constructor(private readonly invitations: InvitationsService) {}

  @Post()
  @ProjectRoles('owner')
  @PerUserLimit({ what: 'invitations', limit: INVITATIONS_PER_HOUR, windowMinutes: 60 })
  create(@CurrentUser() user: AuthUser, @CurrentProject() access: ProjectAccess, @Body() dto: CreateInvitationDto): Promise<InvitationResponse> {
    return this.invitations.create(user, access, dto);
  }

  @Post(':invitationId/approve')
  @HttpCode(200)
  @ProjectRoles('owner')
  approve(
    @CurrentUser() user: AuthUser,
    @CurrentProject() access: ProjectAccess,
    @Param('invitationId', RecordIdPipe) invitationId: string,
  ): Promise<AcceptInvitationResponse> {
    return this.invitations.approveClaim(user, access, invitationId);
  }
}

@Controller('invitations')
export class InvitationsController {
  constructor(private readonly invitations: InvitationsService) {}

  @Get(':token')
  @Public()
  preview(@Param('token') token: string): Promise<InvitationPreview> {
    return this.invitations.preview(token);
  }

  @Post(':token/accept')
  @HttpCode(200)
  accept(@CurrentUser() user: AuthUser, @Param('token') token: string): Promise<AcceptInvitationResponse> {
    return this.invitations.accept(user, token);
  }
}
