import { Body, Controller, HttpCode, Param, Post } from '@nestjs/common';
import type { FailureNoticePreview } from '@broodsilk/shared';
import { CurrentProject, ProjectFrom, ProjectRoles } from '../projects/project-roles.decorator';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import type { AuthUser } from '../common/auth-user';
import type { ProjectAccess } from '../projects/project-access.service';
import { PartnerUpdates } from './partner-updates.service';
import { FailureNoticePreviewDto } from './dto/failure-notice-preview.dto';
import { RecordIdPipe } from '../common/pipes/record-id.pipe';

/** The keeper sees what the partners will read before recording a sac as failed (nothing is written). */
@Controller('sacs')
export class FailureNoticeController {
  constructor(private readonly updates: PartnerUpdates) {}

  @Post(':id/failure-notice-preview')
  @HttpCode(200)
  @ProjectRoles('owner')
  @ProjectFrom('sac')
  preview(
    @CurrentProject() a: ProjectAccess,
    @CurrentUser() user: AuthUser,
    @Param('id', RecordIdPipe) id: string,
    @Body() dto: FailureNoticePreviewDto,
  ): Promise<FailureNoticePreview> {
    return this.updates.failurePreview(a, user, id, dto);
  }
}
