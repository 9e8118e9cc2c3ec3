import { Controller, Get } from '@nestjs/common';
import type { ActivityEventResponse } from '@broodsilk/shared';
import { AnyProjectMember, CurrentProject } from '../projects/project-roles.decorator';
import type { ProjectAccess } from '../projects/project-access.service';
import { ActivityService } from './activity.service';

@Controller('projects/:projectId/activity')
export class ActivityController {
  constructor(private readonly activity: ActivityService) {}

  @Get()
  @AnyProjectMember()
  timeline(@CurrentProject() access: ProjectAccess): Promise<ActivityEventResponse[]> {
    return this.activity.timeline(access.project.id, access.role);
  }
}
