import { Controller, Get } from '@nestjs/common';
import type { SharesResponse } from '@broodsilk/shared';
import { CurrentProject, ProjectRoles } from '../projects/project-roles.decorator';
import type { ProjectAccess } from '../projects/project-access.service';
import { SharesService } from './shares.service';

@Controller('projects/:projectId/shares')
export class SharesController {
  constructor(private readonly shares: SharesService) {}

  @Get()
  @ProjectRoles('owner', 'partner')
  get(@CurrentProject() a: ProjectAccess): Promise<SharesResponse> {
    return this.shares.shares(a);
  }
}
