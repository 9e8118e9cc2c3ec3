import { Controller, Delete, Get, Header, HttpCode, Param, Post, StreamableFile } from '@nestjs/common';
import type { ProgressLinkResponse, ProgressView } from '@broodsilk/shared';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import { Public } from '../common/decorators/public.decorator';
import type { AuthUser } from '../common/auth-user';
import { PerAddressLimit } from '../common/per-user-limit/per-user-limit';
import { CurrentProject, ProjectRoles } from '../projects/project-roles.decorator';
import type { ProjectAccess } from '../projects/project-access.service';
import { ProgressLinksService } from './progress-links.service';
import { RecordIdPipe } from '../common/pipes/record-id.pipe';

/** Reads of progress pages and their photos per network address per 15 minutes (a page shows a few photos). */
export const PROGRESS_READS = { what: 'progressReads', limit: 600, windowMinutes: 15 } as const;

@Controller('projects/:projectId/members/:memberId/progress-links')
export class MemberProgressLinksController {
  constructor(private readonly links: ProgressLinksService) {}

  @Post()
  @ProjectRoles('owner')
  issue(
    @CurrentUser() user: AuthUser,
    @CurrentProject() access: ProjectAccess,
    @Param('memberId', RecordIdPipe) memberId: string,
  ): Promise<ProgressLinkResponse> {
    return this.links.issueFor(access, memberId, user);
  }

  @Delete()
  @HttpCode(204)
  @ProjectRoles('owner')
  revoke(@CurrentUser() user: AuthUser, @CurrentProject() access: ProjectAccess, @Param('memberId', RecordIdPipe) memberId: string): Promise<void> {
    return this.links.revokeFor(access, memberId, user);
  }
}

/** The outside party's page: no account, the token in the address is the secret. */
@Public()
@Controller('progress')
export class ProgressController {
  constructor(private readonly links: ProgressLinksService) {}

  @Get(':token')
  @Header('Cache-Control', 'private, no-store')
  @PerAddressLimit(PROGRESS_READS)
  view(@Param('token') token: string): Promise<ProgressView> {
    return this.links.view(token);
  }

  @Get(':token/photos/:photoId')
  @Header('Cache-Control', 'private, no-store')
  @PerAddressLimit(PROGRESS_READS)
  photo(@Param('token') token: string, @Param('photoId', RecordIdPipe) photoId: string): Promise<StreamableFile> {
    return this.links.photo(token, photoId, 'full');
  }

  @Get(':token/photos/:photoId/thumb')
  @Header('Cache-Control', 'private, no-store')
  @PerAddressLimit(PROGRESS_READS)
  thumb(@Param('token') token: string, @Param('photoId', RecordIdPipe) photoId: string): Promise<StreamableFile> {
    return this.links.photo(token, photoId, 'thumb');
  }
}
